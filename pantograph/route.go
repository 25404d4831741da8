package pantograph

import (
	"math"
	"slices"

	"panto/geom"
)

// This file orders the seats of drilled holes so the copy table travels little between them:
// every move is a chance to miscount a dial turn. The route starts where the stylus already is
// and ends anywhere (an open path). Nearest neighbour gives a fair first route; 2-opt then
// reverses stretches of it while that shortens it. The same is done from the input order, and
// the shorter of the two is kept, so the route is never longer than the order of the file.

// maxTwoOptRounds bounds the improvement passes; each pass is O(n²) and a pass that changes
// nothing ends the search, which on real plates happens within a few passes. The bound only
// guards against rounding making two reversals undo each other forever.
const maxTwoOptRounds = 1000

// twoOptGain is the least shortening, in mm, a reversal must bring to be made: far below any
// distance a dial reads, and above the rounding in a sum of a few lengths.
const twoOptGain = 1e-9

// route returns the indices of pts in a short order to visit them starting from start.
func route(start geom.Vec, pts []geom.Vec) []int {
	if len(pts) == 0 {
		return nil
	}
	given := make([]int, len(pts))
	for i := range given {
		given[i] = i
	}
	a := twoOpt(start, pts, nearestNeighbour(start, pts))
	b := twoOpt(start, pts, given)
	if routeLength(start, pts, b) < routeLength(start, pts, a) {
		return b
	}
	return a
}

// routeLength returns the length of the open path from start through pts in the given order.
func routeLength(start geom.Vec, pts []geom.Vec, order []int) float64 {
	l, at := 0.0, start
	for _, i := range order {
		l += at.Dist(pts[i])
		at = pts[i]
	}
	return l
}

// nearestNeighbour returns the order that always goes next to the nearest point not yet
// visited; ties go to the earlier point.
func nearestNeighbour(start geom.Vec, pts []geom.Vec) []int {
	seen := make([]bool, len(pts))
	order := make([]int, 0, len(pts))
	at := start
	for range pts {
		best := -1
		for i, p := range pts {
			if !seen[i] && (best < 0 || at.Dist(p) < at.Dist(pts[best])) {
				best = i
			}
		}
		seen[best] = true
		order = append(order, best)
		at = pts[best]
	}
	return order
}

// twoOpt improves order in place by reversing stretches order[i..j] while some reversal
// shortens the path, and returns it. Reversing a stretch that runs to the end only changes
// the edge into it, since the path is open.
func twoOpt(start geom.Vec, pts []geom.Vec, order []int) []int {
	order = append([]int(nil), order...)
	at := func(k int) geom.Vec {
		if k < 0 {
			return start
		}
		return pts[order[k]]
	}
	for round := 0; round < maxTwoOptRounds; round++ {
		improved := false
		for i := 0; i < len(order)-1; i++ {
			for j := i + 1; j < len(order); j++ {
				before := at(i - 1).Dist(at(i))
				after := at(i - 1).Dist(at(j))
				if j+1 < len(order) {
					before += at(j).Dist(at(j + 1))
					after += at(i).Dist(at(j + 1))
				}
				if after < before-twoOptGain {
					reverse(order[i : j+1])
					improved = true
				}
			}
		}
		if !improved {
			break
		}
	}
	return order
}

// reverse reverses s in place.
func reverse(s []int) {
	for i, j := 0, len(s)-1; i < j; i, j = i+1, j-1 {
		s[i], s[j] = s[j], s[i]
	}
}

// order fills in the order of work: the datum first; then the drilled holes, smallest drill
// first (common practice, no source: the finest drill goes in while the stock is stiffest),
// each drill's seats on a short route from where the stylus stands; then blind work (pockets,
// blind slots, grooves) while the stock is whole; then the through openings; the profile last,
// so the part stays held by the stock until the end. Lost features are left out. It also sets
// each feature's Number and puts its Seats in working order.
func (p *Plan) order() {
	p.Steps = []Step{{What: StepDatum, Feature: -1}}
	at := geom.Vec{}
	for _, d := range p.drillSizes() {
		at = p.drillSteps(d, at)
	}
	for rank := 2; rank <= maxWorkRank; rank++ {
		for i, f := range p.Features {
			if f.Status == StatusLost || f.Method == Drilled || workRank(f) != rank {
				continue
			}
			what := StepMill
			if f.Method == Engraved {
				what = StepEngrave
			}
			p.Steps = append(p.Steps, Step{What: what, Feature: i})
		}
	}
	p.Order = nil
	for _, st := range p.Steps {
		if st.Feature >= 0 && p.Features[st.Feature].Number == 0 {
			p.Order = append(p.Order, p.Features[st.Feature].Name)
			p.Features[st.Feature].Number = len(p.Order)
		}
	}
}

// maxWorkRank is the rank of the profile, the last work of all.
const maxWorkRank = 6

// workRank places a milled or engraved feature in the order of work (drilling is rank 1).
func workRank(f PlannedFeature) int {
	switch {
	case f.Kind == KindPocket, f.Kind == KindSlot && !f.Depth.Through:
		return 2
	case f.Kind == KindGroove:
		return 3
	case f.Kind == KindSlot:
		return 4
	case f.Kind == KindProfile:
		return maxWorkRank
	}
	return 5 // cut-outs and milled holes
}

// drillSizes returns the diameters of the drills the plan uses, smallest first.
func (p *Plan) drillSizes() []float64 {
	var ds []float64
	for _, f := range p.Features {
		if f.Method == Drilled && !slices.ContainsFunc(ds, func(d float64) bool { return math.Abs(d-f.Drill) <= sizeTol }) {
			ds = append(ds, f.Drill)
		}
	}
	slices.Sort(ds)
	return ds
}

// drillSteps adds the steps that drill every hole of diameter d, visiting the seats of all
// features of that size on one route from at, and returns where the stylus ends.
func (p *Plan) drillSteps(d float64, at geom.Vec) geom.Vec {
	var pts []geom.Vec
	var owner []int
	for i, f := range p.Features {
		if f.Method == Drilled && math.Abs(f.Drill-d) <= sizeTol {
			pts = append(pts, f.Seats...)
			for range f.Seats {
				owner = append(owner, i)
			}
			p.Features[i].Seats = nil
		}
	}
	for _, k := range route(at, pts) {
		i, last := owner[k], len(p.Steps)-1
		if p.Steps[last].What != StepDrill || p.Steps[last].Feature != i {
			p.Steps = append(p.Steps, Step{What: StepDrill, Feature: i, Drill: d})
			last++
		}
		p.Steps[last].Seats = append(p.Steps[last].Seats, pts[k])
		p.Features[i].Seats = append(p.Features[i].Seats, pts[k])
		at = pts[k]
	}
	return at
}
