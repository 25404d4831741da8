package partfile

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"panto/pantograph"
)

// FuzzReadPart feeds the reader random bytes, seeded with the samples and the broken files: it
// must return a part or an error, never panic; a part it returns must survive the checks, and
// a part that passes them, written back with Encode, must read again as the same part.
func FuzzReadPart(f *testing.F) {
	for _, glob := range []string{"../../samples/*.toml", "../../testdata/parts/bad/*.toml"} {
		files, _ := filepath.Glob(glob)
		for _, file := range files {
			if src, err := os.ReadFile(file); err == nil {
				f.Add(src)
			}
		}
	}
	f.Fuzz(func(t *testing.T, src []byte) {
		p, err := Read("fuzz.toml", src)
		if err != nil {
			_, one := err.(*Error)
			_, several := err.(Errors)
			if !one && !several {
				t.Fatalf("got error of type %T, want *partfile.Error or Errors: %v", err, err)
			}
			return
		}
		if p.Profile.Kind != pantograph.KindProfile {
			t.Fatalf("part without a profile came back: %+v", p)
		}
		sum := pantograph.Summarize(p, pantograph.DefaultOptions())
		if pantograph.HasErrors(sum.Problems) {
			return // a bad outline (one that crosses itself) has no direction to keep
		}
		var buf bytes.Buffer
		if err := Encode(&buf, p); err != nil {
			t.Fatalf("a part that reads does not write: %v", err)
		}
		again, err := Read("again.toml", buf.Bytes())
		if err != nil {
			t.Fatalf("the part written does not read back: %v\n%s", err, buf.String())
		}
		samePart(t, again, p)
	})
}
