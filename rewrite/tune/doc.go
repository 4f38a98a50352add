// Package tune learns strictness and tolerances from shoppers' signals:
// when a rescued search that widened the colour still leads to
// purchases, colour is firm in that category; when dropping the size
// leads to nothing, size must be hard.
//
// A Tuner reads joined sessions (see package signals). For every
// product shown it weighs what the shopper did with it by the policy's
// [signals] weights and by the inverse of the chance that the shopper
// looked at its rank, (1/rank)^η (Joachims, Swaminathan and Schnabel,
// 2017). It compares the products shown by relaxed searches with those
// shown by exact matches in the same category, by kind and operator and
// by how far a colour (ΔE00) or a measure strayed, each with a bootstrap
// interval and the number of searches behind it. From these it
// recommends a strictness per category and kind and a colour and
// measure tolerance per category, as a policy file and a diff against
// the current one; it applies nothing itself.
//
// It also lists alias candidates: a search that found nothing, followed
// in the same session by a purchase of a product another search found,
// suggests that the first query's unknown words name what was bought.
// They are for a person to review, never added to the lexicon.
//
// Signals only cover what the current system showed: a product never
// shown can never earn engagement. Exploration (see bleveengine's
// RescueOptions) shows a relaxed alternative now and then so that tune
// sees what would otherwise never be shown. Nothing here reads or infers
// anything about a shopper beyond the session id.
package tune
