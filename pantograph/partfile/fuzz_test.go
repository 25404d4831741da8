package partfile

import (
	"os"
	"path/filepath"
	"testing"

	"panto/pantograph"
)

// FuzzReadPart feeds the reader random bytes, seeded with the samples and the broken files: it
// must return a part or an error, never panic, and a part it returns must survive the checks.
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
			if _, ok := err.(*Error); !ok {
				t.Fatalf("got error of type %T, want *partfile.Error: %v", err, err)
			}
			return
		}
		if p.Profile.Kind != pantograph.KindProfile {
			t.Fatalf("part without a profile came back: %+v", p)
		}
		pantograph.Summarize(p, pantograph.DefaultOptions())
	})
}
