// Package pdffont makes a finished PDF's embedded TrueType fonts the same on every run.
//
// The font library that writes the subset fonts stamps the clock into each font's head table
// ("modified"), inside a compressed stream, so the same drawing would give different bytes each
// second. Fix rewrites those fonts with "modified" set equal to "created", keeps their
// checksums valid, and rebuilds the PDF's cross-reference table around the new streams.
package pdffont
