package signals

import (
	"slices"
	"time"

	"github.com/whittle-search/whittle/parser"
)

// Type is what an event records.
type Type string

// The event types. The interactions are ordered by what they cost the
// shopper, from an impression (the product was on screen) to a purchase.
const (
	Search     Type = "search"
	Impression Type = "impression"
	Click      Type = "click"
	AddToCart  Type = "add_to_cart"
	Purchase   Type = "purchase"
)

// interactions are the interaction types, cheapest first.
var interactions = []Type{Impression, Click, AddToCart, Purchase}

// Interactions returns the interaction types, cheapest first, in a slice
// of the caller's own.
func Interactions() []Type { return slices.Clone(interactions) }

// Relaxed is one relaxation whittle applied to a search, named as in the
// JSON contract of `whittle search` (its chosen.relaxations).
type Relaxed struct {
	// Op is widen, replace or drop.
	Op string `json:"op"`
	// Kind is the kind of the constraint relaxed (colour, size...).
	Kind parser.Kind `json:"kind"`
	// Text is the constraint as the shopper typed it ("mustard").
	Text string `json:"text,omitempty"`
}

// Explored marks the one relaxed alternative shown among a search's
// results by exploration: the product at Rank (from 1) of Shown was not
// among what the search's own plan found, and came from the plan with
// Relaxations applied on top of the search's own.
type Explored struct {
	Rank        int       `json:"rank"`
	Relaxations []Relaxed `json:"relaxations"`
}

// Event is one line of a signals log.
type Event struct {
	Type    Type      `json:"type"`
	Session string    `json:"session"`
	Time    time.Time `json:"time"`

	// Query, Category, Relaxations, Shown, Explored and Shuffled belong
	// to search events.
	Query string `json:"query,omitempty"`
	// Category is the shop's category for the search, or "" when whittle
	// should read it from the query.
	Category string `json:"category,omitempty"`
	// Relaxations are what whittle applied; none for an exact match.
	Relaxations []Relaxed `json:"relaxations,omitempty"`
	// Shown are the product ids shown, best first; none when the search
	// found nothing.
	Shown []string `json:"shown,omitempty"`
	// Explored is set when one of Shown is a relaxed alternative.
	Explored *Explored `json:"explored,omitempty"`
	// Shuffled says the shown order was randomised, so that position
	// bias can be measured from this search.
	Shuffled bool `json:"shuffled,omitempty"`

	// Product belongs to interaction events.
	Product string `json:"product,omitempty"`

	// File and Line say where the event was read, for messages.
	File string `json:"-"`
	Line int    `json:"-"`
}
