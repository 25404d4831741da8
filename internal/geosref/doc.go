//go:build reference

// Package geosref is a small cgo binding to the GEOS C library, used only by panto's
// reference tests and benchmarks to check geom's exact results against an independent,
// widely used polygon engine.
//
// It speaks plain float64 coordinates so that it need not import geom: geom's own tests
// import it, and an import the other way would be a cycle. Every file carries the build tag
// "reference", so an ordinary `go test ./...` needs neither cgo nor GEOS; the reference run
// is `go test -tags reference ./...` on a machine with libgeos-dev installed.
//
// Each call opens its own GEOS context with the reentrant (_r) API and frees everything it
// made before returning, so calls are safe from several goroutines at once.
package geosref
