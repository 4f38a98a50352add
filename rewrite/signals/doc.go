// Package signals reads and joins a shop's signals log: the searches
// whittle answered and what shoppers did with the products shown.
//
// A signals log is JSON Lines, one event a line, in a layout of
// whittle's own (below). A search event records a session id, a time,
// the query, the relaxations whittle applied (none for an exact match)
// and the product ids shown, in order. An interaction event records a
// session id, a time, a product id and its type: impression, click,
// add_to_cart or purchase. Events may arrive out of order and in
// several files.
//
// Nothing here reads or infers anything about a shopper beyond the
// session id that groups the events.
//
// # The layout
//
// Every line is a JSON object with:
//
//   - type: search, impression, click, add_to_cart or purchase;
//   - session: a non-blank id;
//   - time: when it happened, RFC 3339 ("2025-03-14T09:26:53Z", or with
//     a fraction of a second and an offset).
//
// A search has a non-blank query and may have a category, relaxations
// (a list of objects with op, one of widen, replace or drop, kind, one
// of parser.AllKinds(), and text), shown (the product ids shown, best
// first, none twice), explored (rank, the place from 1 in shown of the
// one relaxed alternative shown, and the relaxations it came from) and
// shuffled (true when the order shown was randomised). An interaction
// has a non-blank product and none of the fields of a search.
//
//	{"type":"search","session":"v-17","time":"2025-03-14T09:00:00Z","query":"red scarf","shown":["SC-1","SC-2"]}
//	{"type":"click","session":"v-17","time":"2025-03-14T09:00:40Z","product":"SC-2"}
//
// Reading is strict: a field of no event, or of another type of event
// (even empty), a field given twice, a name in other capitals, text that
// is not UTF-8, and a line longer than MaxLine are refused, each with a
// *LineError naming the file, the line and the field; reading goes on
// with the next line. null counts as a field left out. Writer writes
// this layout, and refuses what Read would.
//
// # Joining
//
// Read yields one file's events, Merge several files' in time order,
// and Join groups them by session and joins each interaction to the
// search that showed its product; see Join for the rules.
package signals
