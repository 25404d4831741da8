// Package geom is panto's exact two-dimensional geometry: points, line and circular-arc
// segments, closed contours, regions with holes, and the operations the rest of panto builds on
// (area, containment, transforms, flattening, signed offset, union and difference, and measures
// of how large a round tool can be to reach every part of a region), and closed triangle meshes
// of solids stepped up from those regions.
//
// geom knows nothing of machining; it imports only the standard library.
//
// # Units
//
// Coordinates are plain float64 numbers. The rest of panto always passes millimetres, so every
// tolerance below is written in millimetres.
//
// # Segments
//
// A Segment is a straight line or a circular arc, in one canonical form: start point A, end
// point B, and for arcs the Center and the signed Sweep in radians (positive counter-clockwise,
// negative clockwise, 0 < |Sweep| ≤ 2π). A line has Sweep == 0 and its Center is unused. The
// radius of an arc is |A − Center|; B lies on the same circle at angle(A) + Sweep. A full
// circle is one arc with A == B and |Sweep| == 2π; Segment.IsFullCircle tells one by its ends
// (within pointTol, on an arc of more than half a turn), and sweeps are compared with a whole
// turn within fullTurnTol (1e-12 rad, which moves an end by pointTol on a radius of a metre).
// The end points are stored, not recomputed, so contours join exactly where their author joined
// them; Center is kept because offsetting an arc keeps its centre and only changes its radius.
//
// # Contours and regions
//
// A Contour is a closed chain of segments: each segment ends where the next one starts, and
// the last ends where the first starts. A Region is one outer contour and any number of holes.
// After NewRegion (or Normalize) the outer contour runs counter-clockwise and every hole runs
// clockwise, so the region's interior always lies to the left of the direction of travel. A
// positive offset grows a region (the outer contour moves out, holes shrink); a negative
// offset shrinks it. Points exactly on the boundary count as inside for Contains.
//
// # Tolerances
//
// Two points are equal when they are within pointTol (1e-9 mm) of each other: float64 carries
// about 16 significant digits, so on parts up to a metre across this sits six orders of
// magnitude above rounding noise and eight below anything a machinist can measure. Flattening
// arcs to polylines takes the chord tolerance as an argument; DefaultChordTolerance (1 µm) keeps
// the error at the part below a micrometre for any reduction ratio of 1 or more. Offsets treat
// segments shorter than pointTol as absent, arcs whose radius shrinks to pointTol or below as
// vanished, and pieces of the result shorter than pointTol are dropped and their neighbours
// joined. Where offsets and booleans cut contours at their crossings, crossing points computed
// from different pairs of segments are merged within snapTol (1e-7 mm), since crossings of
// nearly tangent curves lose about half the float64 digits; pieces then share end points
// exactly. A piece of an offset is kept when it lies at least |d| − 1e-9 mm from the input.
//
// # Meshes
//
// A Mesh is the surface of a solid: triangles over shared points, each listing its corners
// counter-clockwise as seen from outside, so that (b − a) × (c − a) is the outward normal and
// Volume (the divergence theorem) is positive. Mesh.Check accepts a mesh only when it is closed
// and consistently oriented, every directed edge used by exactly one triangle and its reverse
// by exactly one other, and when no triangle has less than minTriangleArea (1e-9 mm², about
// what float32 STL coordinates resolve on a part 300 mm across).
//
// Triangulate cuts a ring and its holes into triangles whose corners are input points only.
// It cuts no ear less than earMinHeight (1e-4 mm, about twice the spacing of float32 numbers
// near 1000) high over its longest side, nor of less than four times minTriangleArea: a
// flatter triangle could turn over once its corners are rounded to float32 in a file. When no
// corner qualifies, the ring is split along a diagonal; points on runs too nearly straight for
// any ear are covered afterwards by fans across the sliver they leave, and only as a last
// resort by ears of any height.
//
// StepSolid builds a stepped solid from nested Terraces. The root stands on the base height;
// each child lies strictly inside its parent and apart from its siblings, and a vertical wall
// joins it to its parent: up for a raised level, down for a sunk one, down to the base for an
// Open one (which then has a hole in the bottom face), or a cone falling from the parent's
// height to a point for a Cone. Each level's flat face is its outline less its children's.
// Every outline is flattened once, and that one ring of points serves the face around it, its
// own face and the wall between, so the faces share points exactly and the mesh closes without
// repair. Extrude is the simplest case: one level with its holes open.
//
// Bad input is reported as an error from Validate naming the contour and segment index; geom
// panics only when one of its own invariants is broken.
package geom
