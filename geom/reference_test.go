//go:build reference

package geom

import (
	"fmt"
	"math"
	"math/rand"
	"testing"

	"panto/internal/geosref"
)

// These tests check geom's exact offsets and booleans against GEOS, an independent polygon
// engine, on seeded random regions with arcs, and on polygons made from them (for which GEOS
// gets exactly geom's input). Run them with `go test -tags reference ./geom` on a machine with
// libgeos-dev.
//
// GEOS works on polygons, so each input is first flattened: every arc becomes chords whose
// ends lie on the arc and which stray at most refChordTol from it. GEOS then approximates the
// round joins of a buffer by chords too. Neither is exact, so the tests compare areas within a
// bound derived below from the geometry of both approximations, and count result polygons.
//
// # The bound for an offset by d (s = |d|/100, t = refChordTol, q = refQuadSegs)
//
//  1. Joins. At a corner of the flattened input that turns by θ toward the offset's side (left
//     for d > 0, right for d < 0: the region's interior is on the left of every contour), the
//     exact offset is a circular arc of radius |d| and angle θ about the corner. GEOS draws it as
//     n equal chords inscribed in that circle, n = round(θ/φ) with φ = π/(2q) (one chord when
//     that rounds to 0). Each chord of angle θ/n cuts off a circular segment of area
//     d²/2·(θ/n − sin(θ/n)), and nothing else differs at the join. Taking n = max(1, ⌊θ/φ⌋)
//     gives the fewest chords and so the largest loss: joinLoss = Σ n·d²/2·(θ/n − sin(θ/n)).
//     The segments lie outside GEOS's region for d > 0 (GEOS is smaller) and inside its holes'
//     complement for d < 0 (GEOS is larger); where joins overlap or are trimmed the difference
//     is only smaller.
//  2. Flattening. Every point of the flattened boundary is within t of the exact boundary and
//     the other way round, so every point of either result's boundary is within t of the
//     other's: the two results differ by at most a band of width t along their boundaries,
//     area ≤ t·(P_ours + P_GEOS). Either sign.
//  3. GEOS's input simplification. Before buffering, GEOS drops a corner that bends away from
//     the growth (a right turn for d > 0, a left turn for d < 0) when it lies within s of the
//     chord past it and within s of the kept corner before it (the second condition is what
//     geosref's TestBufferKeepsShallowDentWithLongEdges pins down). So GEOS redraws such a
//     stretch with chords no longer than ℓ = 2s + c, c the longest edge there. On an arc of
//     radius ρ and angle θ bending that way, each such chord (angle ψ = 2·asin(ℓ/2ρ), capped
//     at θ) fills a circular segment ρ²/2·(ψ − sin ψ); the result's boundary, no longer than
//     the stretch since it bends away from the growth, moves by at most the chord's sagitta,
//     at most twice the segment's area over its length: simplify = Σ 2·⌈θ/ψ⌉·ρ²/2·(ψ − sin ψ).
//     A sharp corner dropped this way has an edge before it shorter than s and adds at most
//     twice its triangle with its neighbours. The change always makes GEOS's input larger for
//     d > 0 (GEOS larger) and smaller for d < 0 (GEOS smaller).
//  4. Nearly straight corners. GEOS joins the offsets at a corner turning by θ toward the
//     offset's side with no join at all when their ends are within |d|/1000, i.e. θ < 1/1000;
//     the next offset edge then starts |d|θ away from where it should, which moves at most a
//     triangle of |d|θ·len/2, len the edge's length. Either sign.
//  5. Rounding: 1e-9 of the area, far above float64 noise on a few thousand vertices (about
//     1e-13 relative) and far below anything the other terms or a real error produce.
//
// So, with ε = flattening + nearly-straight + rounding:
// for d > 0, −(simplify + ε) ≤ ours − GEOS ≤ joinLoss + ε;
// for d < 0, −(joinLoss + ε) ≤ ours − GEOS ≤ simplify + ε.
// The one-sided halves are the sharper check: ours may not be smaller than GEOS for d > 0
// beyond what flattening and simplification explain, nor larger for d < 0.
//
// # The bound for a union, difference or intersection
//
// The result of a boolean operation on flattened inputs differs from the exact result only
// where an input differs from its flattening, i.e. inside the circular segments between each
// arc and its chords: |ours − GEOS| ≤ Σ over both operands' arcs of those segments' areas,
// plus rounding as above.

// refChordTol is how far, in mm, the chords handed to GEOS may stray from the arcs they
// replace: fine enough that the flattening term is a few thousandths of a mm², coarse enough
// that a random region stays at a few thousand vertices (a 3 mm hole gets about 1200).
const refChordTol = 1e-5

// refQuadSegs is how many chords GEOS draws per quarter circle of a round join; the join loss
// falls as 1/q², and 64 brings it to about 3e-3 mm² per quarter turn at d = 8.
const refQuadSegs = 64

// refRegionCount is how many seeded random regions each reference test checks.
const refRegionCount = 200

// toGEOS flattens r for GEOS.
func toGEOS(r Region, tol float64) geosref.Polygon {
	rings := flatRings(r, tol)
	p := geosref.Polygon{Outer: pairs(rings[0])}
	for _, h := range rings[1:] {
		p.Holes = append(p.Holes, pairs(h))
	}
	return p
}

// toGEOSAll flattens every region of rs.
func toGEOSAll(rs []Region, tol float64) []geosref.Polygon {
	ps := make([]geosref.Polygon, len(rs))
	for i, r := range rs {
		ps[i] = toGEOS(r, tol)
	}
	return ps
}

// flatRings returns r's contours flattened, outer first, oriented with the interior on the left.
func flatRings(r Region, tol float64) [][]Vec {
	r = r.Normalize()
	var rings [][]Vec
	for _, c := range r.Contours() {
		rings = append(rings, c.Flatten(tol))
	}
	return rings
}

func pairs(pts []Vec) [][2]float64 {
	out := make([][2]float64, len(pts))
	for i, p := range pts {
		out[i] = [2]float64{p.X, p.Y}
	}
	return out
}

// ringTurn returns the signed turn at corner i of ring (counter-clockwise positive), and the
// lengths of the edges before and after it.
func ringTurn(ring []Vec, i int) (turn, in, out float64) {
	n := len(ring)
	a, b, c := ring[(i+n-1)%n], ring[i], ring[(i+1)%n]
	u, v := b.Sub(a), c.Sub(b)
	return math.Atan2(u.Cross(v), u.Dot(v)), u.Len(), v.Len()
}

// offsetBound holds the terms of the bound derived at the top of this file.
type offsetBound struct {
	joinLoss, flat, simplify, straight, rounding float64
}

// limits returns the least and greatest allowed value of ours − GEOS for offset d.
func (b offsetBound) limits(d float64) (lo, hi float64) {
	eps := b.flat + b.straight + b.rounding
	if d > 0 {
		return -(b.simplify + eps), b.joinLoss + eps
	}
	return -(b.joinLoss + eps), b.simplify + eps
}

func (b offsetBound) String() string {
	return fmt.Sprintf("joins %.3g, flattening %.3g, simplification %.3g, straight corners %.3g, rounding %.3g",
		b.joinLoss, b.flat, b.simplify, b.straight, b.rounding)
}

// boundFor works out the terms for offsetting r by d, given both results' perimeters and area.
func boundFor(r Region, d, pOurs, pGEOS, area float64) offsetBound {
	b := offsetBound{
		flat:     refChordTol * (pOurs + pGEOS),
		simplify: simplifyArcs(r, d),
		rounding: 1e-9 * math.Max(area, 1),
	}
	phi := math.Pi / 2 / refQuadSegs
	for _, ring := range flatRings(r, refChordTol) {
		for i := range ring {
			turn, _, out := ringTurn(ring, i)
			if turn*d > 0 {
				th := math.Abs(turn)
				n := math.Max(1, math.Floor(th/phi))
				b.joinLoss += n * d * d / 2 * (th/n - math.Sin(th/n))
				if th < 1.1e-3 {
					b.straight += math.Abs(d) * th * out / 2
				}
			}
		}
		b.simplify += simplifyCorners(ring, d)
	}
	return b
}

// simplifyCorners is term 3 of the bound for the corners of one flattened ring: twice the
// largest triangle that dropping corner v can add, taken over every corner p0 that GEOS may
// have kept before it (within s of v) with p2 the corner after v.
func simplifyCorners(ring []Vec, d float64) float64 {
	s := math.Abs(d) / 100
	n := len(ring)
	var sum float64
	for j, v := range ring {
		p2 := ring[(j+1)%n]
		best := 0.0
		for k := 1; k < n-1; k++ {
			p0 := ring[(j-k+n)%n]
			if p0.Dist(v) >= s {
				break
			}
			cross := v.Sub(p0).Cross(p2.Sub(v))
			if cross*d >= 0 || Line(p0, p2).DistanceTo(v) >= s {
				continue // bends toward the growth, or too deep to drop
			}
			best = math.Max(best, math.Abs(cross)/2)
		}
		sum += 2 * best
	}
	return sum
}

// simplifyArcs is term 3 of the bound for the arcs of r that bend away from an offset by d.
func simplifyArcs(r Region, d float64) float64 {
	s := math.Abs(d) / 100
	var sum float64
	for _, c := range r.Normalize().Contours() {
		for _, seg := range c {
			if !seg.IsArc() || seg.Sweep*d > 0 {
				continue
			}
			rho, th := seg.Radius(), math.Abs(seg.Sweep)
			n := float64(chordCount(rho, seg.Sweep, refChordTol))
			c := 2 * rho * math.Sin(th/n/2)
			psi := math.Min(th, 2*math.Asin(math.Min(1, (2*s+c)/(2*rho))))
			sum += 2 * math.Ceil(th/psi-1e-9) * rho * rho / 2 * (psi - math.Sin(psi))
		}
	}
	return sum
}

// flatLoss returns the area between every arc of rs and its chords at tolerance tol: how much
// flattening changes each region, whichever way.
func flatLoss(rs []Region, tol float64) float64 {
	var sum float64
	for _, r := range rs {
		for _, c := range r.Contours() {
			for _, seg := range c {
				if !seg.IsArc() {
					continue
				}
				rho, th := seg.Radius(), math.Abs(seg.Sweep)
				n := float64(chordCount(rho, seg.Sweep, tol))
				sum += n * rho * rho / 2 * (th/n - math.Sin(th/n))
			}
		}
	}
	return sum
}

// areaOf returns the total area and perimeter of rs.
func areaOf(rs []Region) (area, perimeter float64) {
	for _, r := range rs {
		area += r.Area()
		perimeter += r.Perimeter()
	}
	return area, perimeter
}

// pieceCounts counts the polygons and holes of a result whose area exceeds sliver: pieces
// smaller than the area bound may exist on one side and not the other without either being
// wrong, as where a neck is within rounding of pinching off.
func pieceCounts(ours []Region, theirs []geosref.Polygon, sliver float64) (ourParts, ourHoles, theirParts, theirHoles int) {
	for _, r := range ours {
		if r.Area() > sliver {
			ourParts++
		}
		for _, h := range r.Holes {
			if math.Abs(h.Area()) > sliver {
				ourHoles++
			}
		}
	}
	for _, p := range theirs {
		if geosref.Area([]geosref.Polygon{p}) > sliver {
			theirParts++
		}
		for _, h := range p.Holes {
			if geosref.Area([]geosref.Polygon{{Outer: h}}) > sliver {
				theirHoles++
			}
		}
	}
	return ourParts, ourHoles, theirParts, theirHoles
}

// validInGEOS reports the first region of rs that GEOS does not accept as a valid polygon once
// flattened: contours of ours that cross or overlap.
func validInGEOS(rs []Region) error {
	for i, r := range rs {
		if err := geosref.Validate(toGEOS(r, refChordTol)); err != nil {
			return fmt.Errorf("result region %d: %w", i, err)
		}
	}
	return nil
}

// refPolygonTol is the chord tolerance, mm, at which TestReferenceOffset also turns each random
// region into a polygon of its own: coarse enough that arcs become runs of corners turning by a
// few degrees, nearly straight, which is where offsets are easiest to get wrong; GEOS then gets
// exactly the same input as geom.
const refPolygonTol = 0.01

// polygonal returns r with every contour replaced by chords within refPolygonTol.
func polygonal(r Region) Region {
	p := NewRegion(r.Outer.FlattenContour(refPolygonTol))
	for _, h := range r.Holes {
		p.Holes = append(p.Holes, h.FlattenContour(refPolygonTol))
	}
	return p.Normalize()
}

func TestReferenceOffset(t *testing.T) {
	for _, tc := range []struct {
		name   string
		region func(seed int64) Region
	}{
		{"curved", func(seed int64) Region { return randomRegion(rand.New(rand.NewSource(seed))) }},
		{"polygonal", func(seed int64) Region {
			return polygonal(randomRegion(rand.New(rand.NewSource(seed))))
		}},
	} {
		// Offsets, mm: small enough to keep every feature, large enough to close every hole
		// (holes are 1 to 3 mm across the narrow way) or to split spiky outlines and merge
		// holes with each other and with the outside.
		for _, d := range []float64{8, 3, 0.7, -0.7, -3, -8} {
			t.Run(fmt.Sprintf("%s/d=%g", tc.name, d), func(t *testing.T) {
				fates, widest, used := 0, 0.0, 0.0
				for seed := int64(1); seed <= refRegionCount; seed++ {
					r := tc.region(seed)
					res := r.Offset(d)
					if len(res.Vanished)+len(res.Split)+len(res.Merged) > 0 {
						fates++
					}
					lo, hi, diff := checkOffsetAgainstGEOS(t, seed, r, d, res)
					widest = math.Max(widest, hi-lo)
					used = math.Max(used, math.Max(diff/hi, diff/lo))
				}
				t.Logf("%d regions, %d with a contour that vanished, split or merged; "+
					"widest bound %.3g mm²; at most %.0f%% of a bound used",
					refRegionCount, fates, widest, 100*used)
			})
		}
	}
}

// checkOffsetAgainstGEOS compares one offset with GEOS's buffer of the flattened region, and
// returns the limits on ours − GEOS and the difference itself.
func checkOffsetAgainstGEOS(t *testing.T, seed int64, r Region, d float64, res OffsetResult) (lo, hi, diff float64) {
	t.Helper()
	theirs, err := geosref.Buffer(toGEOS(r, refChordTol), d, refQuadSegs)
	if err != nil {
		t.Fatalf("seed %d, d %g: GEOS: %v", seed, d, err)
	}
	ours, pOurs := areaOf(res.Regions)
	geos := geosref.Area(theirs)
	b := boundFor(r, d, pOurs, geosref.Perimeter(theirs), math.Max(ours, geos))
	lo, hi = b.limits(d)
	if diff = ours - geos; math.IsNaN(diff) || diff < lo || diff > hi {
		t.Errorf("seed %d, d %g: area got %.9g, GEOS %.9g: difference %.3g, want within [%.3g, %.3g] (%v)",
			seed, d, ours, geos, diff, lo, hi, b)
	}
	op, oh, gp, gh := pieceCounts(res.Regions, theirs, hi-lo)
	if op != gp || oh != gh {
		t.Errorf("seed %d, d %g: got %d regions with %d holes, GEOS %d with %d (vanished %v, split %v, merged %v)",
			seed, d, op, oh, gp, gh, res.Vanished, res.Split, res.Merged)
	}
	if err := validInGEOS(res.Regions); err != nil {
		t.Errorf("seed %d, d %g: %v", seed, d, err)
	}
	return lo, hi, diff
}

// randomPair returns two seeded random regions, the second moved so that they overlap in
// part, or now and then not at all.
func shiftedPair(seed int64) (Region, Region) {
	rng := rand.New(rand.NewSource(seed))
	a := randomRegion(rng)
	b := randomRegion(rng)
	shift := Polar(Vec{}, 70*rng.Float64(), 2*math.Pi*rng.Float64())
	return a, b.Transform(Translate(shift))
}

// unionOurs and unionGEOS unite two operands, in the form the other two operations take.
func unionOurs(a, b []Region) []Region { return Union(append(a, b...)...) }

func unionGEOS(a, b []geosref.Polygon) ([]geosref.Polygon, error) {
	return geosref.Union(append(a, b...)...)
}

func TestReferenceBooleans(t *testing.T) {
	ops := []struct {
		name string
		ours func(a, b []Region) []Region
		geos func(a, b []geosref.Polygon) ([]geosref.Polygon, error)
	}{
		{"union", unionOurs, unionGEOS},
		{"difference", Difference, geosref.Difference},
		{"intersection", Intersection, geosref.Intersection},
	}
	shapes := []struct {
		name string
		pair func(seed int64) (Region, Region)
	}{
		{"curved", shiftedPair},
		// On polygons GEOS gets exactly geom's input and the bound is rounding alone.
		{"polygonal", func(seed int64) (Region, Region) {
			a, b := shiftedPair(seed)
			return polygonal(a), polygonal(b)
		}},
	}
	for _, sh := range shapes {
		for _, op := range ops {
			t.Run(sh.name+"/"+op.name, func(t *testing.T) {
				widest, used := 0.0, 0.0
				for seed := int64(1); seed <= refRegionCount; seed++ {
					a, b := sh.pair(seed)
					bound, diff := checkBooleanAgainstGEOS(t, seed, []Region{a}, []Region{b}, op.ours, op.geos)
					widest = math.Max(widest, bound)
					used = math.Max(used, math.Abs(diff)/bound)
				}
				t.Logf("%d pairs; widest bound %.3g mm²; at most %.0f%% of a bound used",
					refRegionCount, widest, 100*used)
			})
		}
	}
}

// checkBooleanAgainstGEOS compares one boolean operation with GEOS's on the flattened operands,
// and returns the bound on |ours − GEOS| and the difference itself.
func checkBooleanAgainstGEOS(t *testing.T, seed int64, ra, rb []Region,
	ours func(a, b []Region) []Region,
	geos func(a, b []geosref.Polygon) ([]geosref.Polygon, error)) (bound, diff float64) {
	t.Helper()
	res := ours(ra, rb)
	theirs, err := geos(toGEOSAll(ra, refChordTol), toGEOSAll(rb, refChordTol))
	if err != nil {
		t.Fatalf("seed %d: GEOS: %v", seed, err)
	}
	area, _ := areaOf(res)
	gArea := geosref.Area(theirs)
	bound = flatLoss(ra, refChordTol) + flatLoss(rb, refChordTol) + 1e-9*math.Max(area, 1)
	if diff = area - gArea; math.IsNaN(diff) || math.Abs(diff) > bound {
		t.Errorf("seed %d: area got %.9g, GEOS %.9g: difference %.3g, want at most %.3g",
			seed, area, gArea, diff, bound)
	}
	op, oh, gp, gh := pieceCounts(res, theirs, 2*bound)
	if op != gp || oh != gh {
		t.Errorf("seed %d: got %d regions with %d holes, GEOS %d with %d", seed, op, oh, gp, gh)
	}
	if err := validInGEOS(res); err != nil {
		t.Errorf("seed %d: %v", seed, err)
	}
	return bound, diff
}

// TestReferenceDenseOutline checks one offset and one union of outlines with thousands of short,
// jittered edges, as a traced drawing has, where an offset join overlaps many neighbours.
func TestReferenceDenseOutline(t *testing.T) {
	const n = 3000 // vertices per outline; GEOS needs a fraction of a second here
	r := benchStar(1, Vec{}, n, 20)
	for _, d := range []float64{0.5, -0.5} {
		t.Run(fmt.Sprintf("offset d=%g", d), func(t *testing.T) {
			checkOffsetAgainstGEOS(t, 1, r, d, r.Offset(d))
		})
	}
	t.Run("union", func(t *testing.T) {
		other := benchStar(2, V(6, 2), n, 20)
		checkBooleanAgainstGEOS(t, 1, []Region{r}, []Region{other}, unionOurs, unionGEOS)
	})
}
