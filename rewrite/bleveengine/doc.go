// Package bleveengine stores a catalog in an on-disk bleve index and
// answers the planner's questions about it: it implements rewrite.Engine
// (counts and top-k searches over engine-neutral plans) and
// rewrite.Catalog (the colours the catalog carries, and the values a
// field takes among the products a plan matches).
//
// Build writes the index into a temporary directory beside the target and
// renames it into place only when every product is in, so a failed or
// interrupted build never leaves a half-built index where a good one was.
package bleveengine
