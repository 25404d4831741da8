package main

import (
	"encoding/json"
	"math"
	"testing"
)

// TestPlanDatumFlag moves the datum of the inch calibration coupon and checks where the seats
// land on the template: seat = R × (hole − datum), with the datum given in the part's inches.
func TestPlanDatumFlag(t *testing.T) {
	const coupon = "../../samples/calibration-coupon.toml"
	tests := []struct {
		name  string
		datum []string
		// derived: the 1/16 drill hole sits at (0.25, 0.75) in; at 4:1 its seat is
		// 4 × 25.4 × ((0.25, 0.75) − datum) mm.
		want [2]float64
	}{
		{"file's datum", nil, [2]float64{0, 0}},
		{"lower left corner", []string{"--datum", "0,0"}, [2]float64{25.4, 76.2}},
		{"centre", []string{"--datum", "1,0.5"}, [2]float64{-76.2, 25.4}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			args := append([]string{"plan", coupon, "--ratio", "4", "--cutter", "0.5", "--json"}, tc.datum...)
			code, out, errOut := runPanto(args...)
			if code != exitOK {
				t.Fatalf("exit code %d; stderr:\n%s", code, errOut)
			}
			var p struct {
				Features []struct {
					Name  string       `json:"name"`
					Seats [][2]float64 `json:"seats"`
				} `json:"features"`
			}
			if err := json.Unmarshal([]byte(out), &p); err != nil {
				t.Fatal(err)
			}
			for _, f := range p.Features {
				if f.Name != "1/16 drill" {
					continue
				}
				if len(f.Seats) != 1 {
					t.Fatalf("seats: got %v, want one", f.Seats)
				}
				if math.Abs(f.Seats[0][0]-tc.want[0]) > 1e-6 || math.Abs(f.Seats[0][1]-tc.want[1]) > 1e-6 {
					t.Errorf("seat: got %v, want %v", f.Seats[0], tc.want)
				}
				return
			}
			t.Fatal("no feature named 1/16 drill")
		})
	}
}

func TestPlanDatumFlagErrors(t *testing.T) {
	for _, args := range [][]string{{"--datum", "1"}, {"--datum", "1,2,3"}, {"--datum", "a,b"}} {
		code, _, errOut := runPanto(append([]string{"plan", "../../samples/pump-port-plate.toml", "--ratio", "4", "--cutter", "0.5"}, args...)...)
		if code != exitUsage {
			t.Errorf("%v: exit code got %d, want %d; stderr:\n%s", args, code, exitUsage, errOut)
		}
	}
}
