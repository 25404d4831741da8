package cad

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// addSeeds adds every testdata drawing with the extension ext to the fuzz corpus.
func addSeeds(f *testing.F, ext string) {
	paths, _ := filepath.Glob(filepath.Join("../../testdata/drawings", "*"+ext))
	for _, p := range paths {
		if src, err := os.ReadFile(p); err == nil {
			f.Add(src)
		}
	}
}

// checkFuzzResult fails unless a read either succeeded with a valid profile or failed with a
// drawing error naming the file.
func checkFuzzResult(t *testing.T, name string, err error) {
	if err == nil {
		return
	}
	var de *Error
	if !errors.As(err, &de) {
		t.Fatalf("got %T %v, want a *cad.Error", err, err)
	}
	if !strings.HasPrefix(de.Error(), name) || de.Msg == "" {
		t.Fatalf("error %q does not name the file or says nothing", de.Error())
	}
}

func FuzzReadDXF(f *testing.F) {
	addSeeds(f, ".dxf")
	f.Add([]byte(dxfDoc(4, "", square("0", 0, 0, 10)...)))
	f.Add([]byte(dxfDoc(4, ent("BLOCK", 2, "B", 10, 0, 20, 0)+ent("CIRCLE", 10, 0, 20, 0, 40, 1)+ent("ENDBLK"),
		ent("INSERT", 2, "B", 70, 1000000, 71, 1000000, 44, 1, 45, 1))))
	f.Add([]byte(dxfDoc(4, "", ent("SPLINE", 71, 15, 40, 0, 10, 1, 20, 1))))
	f.Add([]byte(dxfDoc(4, "", ent("ELLIPSE", 10, 0, 20, 0, 11, 1e300, 21, 0, 40, 1e-300))))
	f.Fuzz(func(t *testing.T, src []byte) {
		_, _, err := Read("f.dxf", src, Options{})
		checkFuzzResult(t, "f.dxf", err)
	})
}

func FuzzReadSVG(f *testing.F) {
	addSeeds(f, ".svg")
	f.Add([]byte(svgDoc(`width="10mm" height="10mm" viewBox="0 0 10 10"`, `<rect width="10" height="10" rx="2"/>`)))
	f.Add([]byte(svgDoc("", `<path d="M0 0 C0 10 10 10 10 0 S0 -10 0 0 Z m 1 1 a 1e300 1 45 1 1 1 1 z"/>`)))
	f.Add([]byte(svgDoc("", `<g transform="scale(1e-300) rotate(45)"><circle r="1e300"/></g>`)))
	f.Fuzz(func(t *testing.T, src []byte) {
		_, _, err := Read("f.svg", src, Options{})
		checkFuzzResult(t, "f.svg", err)
	})
}
