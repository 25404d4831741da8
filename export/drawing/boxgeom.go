package drawing

import "panto/geom"

// polyMeetsBox reports whether the line through pts (closed when asked) touches box b.
func polyMeetsBox(pts []geom.Vec, closed bool, b geom.Box) bool {
	for i := 1; i < len(pts); i++ {
		if b.MeetsSegment(pts[i-1], pts[i]) {
			return true
		}
	}
	return closed && len(pts) > 2 && b.MeetsSegment(pts[len(pts)-1], pts[0])
}
