// Package pantograph is panto's trade knowledge: the part a machinist wants to make, its
// features, and the checks that say whether it is well formed and what a cutter meets in it.
//
// # Units and frame
//
// Everything in a Part is in millimetres, whatever units the drawing was made in: readers
// convert inches (× 25.4) at the boundary. The part frame is the drawing's own frame, +Y up;
// Part.Datum is the point of that frame the dials are zeroed on.
//
// # The part model
//
// A Part has one profile (the outside edge, cut through the stock) and any number of features.
// Each Feature has a kind:
//
//   - profile, cutout, pocket, slot: an area of the plane, Feature.Region;
//   - holes: drilled holes of one diameter, Feature.Centers and Feature.Diameter;
//   - groove: an engraved line along Feature.Path, Feature.Width wide (0: as wide as the cutter
//     chosen when the template is planned).
//
// A slot is the stadium a round cutter of width Width leaves when fed along its centreline
// (geom.Capsule). Feature.Depth is either through the stock or a depth in millimetres; the
// profile and cut-outs are always through.
//
// # Checks
//
// Check looks at a Part and returns Problems: errors make the part unfit to cut (a bad size,
// an outline that crosses itself, a feature outside the profile, holes overlapping, a pocket
// deeper than the stock, a depth missing); warnings say what will come out weak or odd (a wall
// thinner than Options.MinWall). Summarize adds what the cutter meets: size, area, the smallest
// inside corner radius and the narrowest gap.
//
// Nothing in this package prints or exits; callers decide what to show.
package pantograph
