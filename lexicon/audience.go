package lexicon

import "slices"

// audienceServes lists, for an audience, the other audiences whose
// products are made for its shoppers too: a kids' product is for boys
// and girls alike, so a shopper after boys' pajamas is served by kids'
// pajamas, and one after kids' pajamas by boys' and girls' (common
// practice in shop departments). Adults' and unisex products are not
// listed: a unisex hoodie is cut to an adult's size, and a shop files
// it apart on purpose.
var audienceServes = map[string][]string{
	"kids":  {"boys", "girls"},
	"boys":  {"kids"},
	"girls": {"kids"},
}

// AudienceServes returns the audiences whose products serve shoppers of
// audience a, a first: "boys" gives boys and kids. A name that is none
// of the canonical audiences gives itself alone.
func AudienceServes(a string) []string {
	return append([]string{a}, slices.Clone(audienceServes[a])...)
}
