package signals

import "time"

// Engagement is one interaction joined to the search that showed its
// product.
type Engagement struct {
	Type Type      `json:"type"`
	Time time.Time `json:"time"`
	// Rank is the product's position in the search's Shown, from 1.
	Rank int `json:"rank"`
}

// Joined is one search event with the interactions joined to it.
type Joined struct {
	Search      Event        `json:"search"`
	Engagements []Engagement `json:"engagements"`
}

// Session is the searches of one session, in time order, once the
// session has closed (no event for it within the join window).
type Session struct {
	ID       string   `json:"id"`
	Searches []Joined `json:"searches"`
}
