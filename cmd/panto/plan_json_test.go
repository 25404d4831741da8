package main

import (
	"bytes"
	"encoding/json"
	"testing"

	"panto/geom"
	"panto/pantograph"
)

// plate is a 20 × 10 mm plate with two pins and a pocket, planned at 10:1 with a Ø4 stylus
// for a Ø0.5 cutter (δ = 0.5, derived).
func plate(t *testing.T) pantograph.Plan {
	t.Helper()
	outer, _ := geom.Rect(geom.V(0, 0), geom.V(20, 10), 0)
	seat, _ := geom.Rect(geom.V(8, 3), geom.V(4, 4), 0.5)
	part := pantograph.Part{Name: "plate", Stock: pantograph.Stock{Material: "brass", Thickness: 1},
		Profile: pantograph.Feature{Kind: pantograph.KindProfile, Region: geom.NewRegion(outer)},
		Features: []pantograph.Feature{
			{Name: "pins", Kind: pantograph.KindHoles, Diameter: 0.8, Depth: pantograph.Depth{Through: true},
				Centers: []geom.Vec{geom.V(3, 5), geom.V(17, 5)}},
			{Name: "seat", Kind: pantograph.KindPocket, Region: geom.NewRegion(seat), Depth: pantograph.Depth{MM: 0.3}},
		}}
	p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: 10, Cutter: 0.5, Stylus: 4}, nil)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

func TestEncode(t *testing.T) {
	var buf bytes.Buffer
	if err := writePlanJSON(&buf, plate(t), nil); err != nil {
		t.Fatal(err)
	}
	var got map[string]any
	if err := json.Unmarshal(buf.Bytes(), &got); err != nil {
		t.Fatalf("%v\n%s", err, buf.String())
	}
	for _, key := range []string{"ratio", "mirror", "datum", "template", "features", "order", "steps", "warnings", "done"} {
		if _, ok := got[key]; !ok {
			t.Errorf("key %q missing from\n%s", key, buf.String())
		}
	}
	fs := got["features"].([]any)
	seat := fs[2].(map[string]any)
	// derived: the pocket is 0.3 deep, traced, shrunk by δ = 0.5 on the 40 × 40 template.
	if seat["depth"] != 0.3 || seat["through"] != false || seat["compensation"] != 0.5 || seat["template_area"] == nil {
		t.Errorf("seat got %v", seat)
	}
	pins := fs[1].(map[string]any)
	// derived: seats at 10 × centre, the nearer to the datum (0, 0) first.
	seats := pins["seats"].([]any)
	if pins["cutter"] != nil || len(seats) != 2 || seats[0].([]any)[0] != 30.0 {
		t.Errorf("pins got %v", pins)
	}
}

func TestEncodeIsDeterministic(t *testing.T) {
	var a, b bytes.Buffer
	p := plate(t)
	if err := writePlanJSON(&a, p, nil); err != nil {
		t.Fatal(err)
	}
	if err := writePlanJSON(&b, p, nil); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(a.Bytes(), b.Bytes()) {
		t.Fatal("two encodings of one plan differ")
	}
}
