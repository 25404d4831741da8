// Package reftool is test support for the reference checks (build tag `reference`) that run
// outside tools from Debian's packages: GEOS, admesh, ezdxf, qpdf, pdftotext, rsvg-convert.
package reftool

import (
	"os"
	"testing"
)

// Missing skips a reference check whose outside tool is not installed, but fails it under CI,
// whose script installs every such tool: there a skip would hide a broken install.
func Missing(t testing.TB, why string) {
	t.Helper()
	if os.Getenv("CI") != "" {
		t.Fatal(why)
	}
	t.Skip(why)
}
