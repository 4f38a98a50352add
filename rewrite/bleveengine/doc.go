// Package bleveengine stores a catalog in an on-disk bleve index and
// answers the planner's questions about it: it implements rewrite.Engine
// (counts and top-k searches over engine-neutral plans) and
// rewrite.Catalog (the colours the catalog carries, and the values a
// field takes among the products a plan matches).
//
// Engine.Rescue rescues a query and shows its hits; with
// RescueOptions.Explore it may show one product of the plan one step
// looser than the rescue's among them, marked in the report, so that
// signals can reach products the rescue's own plan would never show.
//
// Build writes the index into a temporary directory beside the target and
// renames it into place only when every product is in, so a failed or
// interrupted build never leaves a half-built index where a good one was.
// It replaces only an empty directory or an index it wrote: anything else
// at the target is refused with a *TargetError (errors.Is ErrNotIndex)
// and left as it was.
package bleveengine
