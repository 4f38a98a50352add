// Package signals reads and joins a shop's signals log: the searches
// whittle answered and what shoppers did with the products shown.
//
// A signals log is JSON Lines, one event a line, in a layout of
// whittle's own (see the README). A search event records a session id,
// a time, the query, the relaxations whittle applied (none for an exact
// match) and the product ids shown, in order. An interaction event
// records a session id, a time, a product id and its type: impression,
// click, add_to_cart or purchase. Events may arrive out of order and in
// several files.
//
// Nothing here reads or infers anything about a shopper beyond the
// session id that groups the events.
package signals
