package catalog

// The demo catalog is the stock of Hollowmere General, an invented general
// store. Its brands are the invented names of lexicon/data/brands.wlx, its
// colour names are marketing names coined here, and its model codes and part
// numbers are made up; none of them is a real shop, brand, person or product.
//
// Product types, materials, patterns and silhouettes are canonical names of
// the default lexicon, so that whittle's parser reads the catalog's words the
// way it reads queries. Measures are written in the units of the product
// type's slots (product_types.wlx) with sizes a shop typically stocks
// (common practice, from memory). Standard designations come from the
// standards' own tables: nominal lumber from PS 20, wire gauges from AWG
// (ASTM B258), metric threads at the ISO 261 coarse pitch, ISO 216 paper,
// IEC 60086 batteries and ISO metric tyre sizes. Prices are plausible
// ranges from memory, in US dollars.
//
// Everything is drawn from one PCG stream (math/rand/v2) seeded by the
// caller, with integer arithmetic only, so the output is the same on every
// run and platform.

import (
	"math/rand/v2"
	"strconv"
	"strings"
)

// Demo returns n products of an invented general store, the same for the same n and seed.
//
// The store, Hollowmere General, has one department for each category of
// the default lexicon (apparel, footwear, accessories, home, furniture,
// lumber, hardware, electrical, camera, tyres, office, batteries,
// electronics, paint, kitchen), each with several of the lexicon's product
// types. Every product has an ID ("HG-000001", numbered from 1), a title, a
// description, a brand, a price in USD and a stock flag (about 8% are out of
// stock); the other fields are filled where they suit the product type:
// colour (the store's own colour names with a hex value, or a plain lexicon
// colour without one), pattern, material, silhouette, audience, sizes,
// measures, standard designations, compatible models and part numbers.
//
// Products are drawn one after another from a single stream, so
// Demo(m, seed) is the first m products of Demo(n, seed) for m <= n.
// Measures and designations added to a kind after the catalog was
// first drawn (a bulb's colour temperature, a pipe's schedule) come from
// a second stream, drawn only for the products of such kinds, so adding
// one leaves every other product, and every other attribute of those
// products, as it was.
// n <= 0 gives an empty catalog.
func Demo(n int, seed uint64) []Product {
	if n <= 0 {
		return nil
	}
	r := rand.New(rand.NewPCG(seed, demoStream))
	later := rand.New(rand.NewPCG(seed, demoLaterStream))
	out := make([]Product, n)
	for i := range out {
		out[i] = demoProduct(r, later, i+1)
	}
	return out
}

// demoStream and demoLaterStream are the second word of the PCG state of
// the two streams; any two fixed values will do.
const (
	demoStream      = 0x486f6c6c6f776d65 // "Hollowme"
	demoLaterStream = 0x6c61746572000000 // "later"
)

// demoShopColour is one of the store's own colour names with its sRGB value.
type demoShopColour struct {
	name, hex string
}

// demoShopColours are Hollowmere General's colour names, invented here. Each
// hex is chosen, from memory, to lie close to the common colour word noted
// beside it (that word's value in lexicon/data/colours.wlx), so that a
// shopper's colour word finds a shop colour near it.
var demoShopColours = []demoShopColour{
	{"morning fog", "#8fa6b2"},  // dusty blue
	{"ember", "#c8553d"},        // vermilion
	{"glacier", "#8ecae6"},      // sky blue
	{"peat", "#614731"},         // dark brown, walnut brown
	{"harvest gold", "#dfaa0a"}, // mustard
	{"cinder", "#3a3f44"},       // charcoal, anthracite
	{"tidepool", "#2f6f73"},     // petrol blue
	{"lichen", "#a3ad8a"},       // sage
	{"sandbar", "#d8c3a0"},      // biscuit, ecru
	{"juniper", "#3f5e4a"},      // hunter green
	{"deep harbour", "#20365c"}, // dark blue
	{"fireside", "#8c2f39"},     // burgundy, wine
	{"pumice", "#c9c5bd"},       // silver grey
	{"flint", "#5b5e63"},        // iron grey
	{"nightfall", "#1b1c1f"},    // off black
	{"whitecap", "#ece9df"},     // off white, alabaster
	{"oat milk", "#e8dcc4"},     // oatmeal
	{"marmalade", "#d9782d"},    // ochre
	{"clementine", "#f28c28"},   // tangerine
	{"paprika", "#a63a24"},      // rust, auburn
	{"canyon", "#b5563a"},       // sienna
	{"dune", "#c7a77a"},         // tan, camel
	{"bark", "#7a5a40"},         // brown
	{"hearth", "#6b4a3a"},       // coffee
	{"meadow", "#7fa35b"},       // matcha green
	{"evergreen", "#2e5339"},    // hunter green
	{"thicket", "#5a6b3b"},      // dark olive green
	{"seaglass", "#a8d5c5"},     // duck egg blue
	{"lagoon", "#1b8a8f"},       // teal
	{"bluebell", "#6a7fc1"},     // periwinkle blue
	{"dusk", "#5b6f95"},         // dusty blue, storm grey
	{"high tide", "#1f4e9c"},    // cobalt
	{"moorland", "#7d6b7d"},     // grey mauve
	{"bramble", "#5b3256"},      // aubergine
	{"twilight", "#9a8fbf"},     // lilac
	{"rosewater", "#e8b4b0"},    // blush
	{"petal", "#f2b8c6"},        // pink
	{"sorbet", "#ff8a80"},       // salmon
	{"beacon", "#c8102e"},       // cherry red
	{"buttercup", "#f5d547"},    // yellow
	{"beeswax", "#e5a84b"},      // honey
	{"pebble", "#b8b0a2"},       // greige
	{"storm cloud", "#6e7b85"},  // slate grey
	{"inkwell", "#232a3d"},      // ink blue
	{"hoarfrost", "#f7f7f2"},    // white
	{"cider", "#b8732e"},        // caramel
	{"straw", "#e4d096"},        // buff
	{"fjord", "#4d7e9b"},        // steel blue
	{"soot", "#262626"},         // off black
	{"kelp", "#4b5a2a"},         // army green
	{"sunset", "#f97f55"},       // coral
	{"pesto", "#7b7d2a"},        // olive
	{"mistral", "#d9d4ee"},      // lavender
	{"canopy", "#2f7d32"},       // forest green
	{"sunbaked", "#dc735c"},     // terracotta
	{"nightwatch", "#14206e"},   // navy
	{"buttermilk", "#fdf5c9"},   // cream
	{"foxglove", "#b3829f"},     // mauve
	{"driftline", "#8e877c"},    // stone grey
	{"spearmint", "#b0ecd0"},    // mint
	{"papaya", "#ff9966"},       // light orange
}

// demoPlainColours are colour words of the default lexicon that the store
// also uses as they are, without a value of its own.
var demoPlainColours = []string{
	"black", "white", "navy", "charcoal", "grey", "light grey", "olive",
	"burgundy", "cream", "camel", "khaki", "sage", "rust", "teal",
	"forest green", "tan", "brown", "beige", "red", "blue", "pink",
	"mustard", "sky blue", "ivory", "stone grey",
}

// demoWoodFinishes are the lexicon colours of the store's cabinet furniture.
var demoWoodFinishes = []string{"black", "white", "walnut brown", "tan", "grey"}

// Size runs the store sells.
var (
	demoLetterSizes = []string{"xs", "s", "m", "l", "xl", "xxl"}
	demoBedSizes    = []string{"twin", "full", "queen", "king"}
)

// Model codes of the invented devices accessories are made for.
var (
	demoPhones   = []string{"jx-10", "jx-12", "jx-14", "vt-200", "vt-250"}
	demoCameras  = []string{"zk-3", "zk-5", "hm-45", "hm-50"}
	demoLaptops  = []string{"nb-13", "nb-14", "nb-16"}
	demoVacuums  = []string{"vc-400", "vc-420", "rb-9"}
	demoPitchers = []string{"wp-2", "wp-3"}
)

// Where a measure goes in a title.
const (
	demoTitleNone = iota
	demoTitleBefore
	demoTitleAfter
)

// demoGroup is a set of measure dimensions chosen together: a rug's width and
// length, or a battery's size and capacity. The dimension "spec" puts its
// value in Product.Spec instead of Product.Measures. Options are listed
// from smallest to largest; a larger option costs more.
type demoGroup struct {
	dims []string
	opts [][]string
}

// demoKind is one product type the store stocks and how its products vary.
type demoKind struct {
	name        string
	lo, hi      int // price range in cents
	materials   []string
	patterns    []string
	silhouettes []string
	audiences   []string // nil: the department's
	colours     []string // plain lexicon colours; used alone unless shop
	shop        bool     // takes the store's colour names
	noColour    bool
	groups      []demoGroup
	later       []demoGroup // measures and designations added later, from the second stream
	specs       []string    // one is chosen, smallest first
	beds        bool        // sold in bed sizes
	compat      []string    // models it fits
	title       int         // where the first group's values go in the title
}

// stock starts a kind: its product type and price range in cents. The
// methods below set its other fields and return it, so that each kind is
// written on one line.
func stock(name string, lo, hi int) *demoKind { return &demoKind{name: name, lo: lo, hi: hi} }

func (k *demoKind) mat(s ...string) *demoKind   { k.materials = s; return k }
func (k *demoKind) pat(s ...string) *demoKind   { k.patterns = s; return k }
func (k *demoKind) sil(s ...string) *demoKind   { k.silhouettes = s; return k }
func (k *demoKind) aud(s ...string) *demoKind   { k.audiences = s; return k }
func (k *demoKind) plain(s ...string) *demoKind { k.colours = s; return k }
func (k *demoKind) colourless() *demoKind       { k.noColour = true; return k }
func (k *demoKind) spec(s ...string) *demoKind  { k.specs = s; return k }
func (k *demoKind) fits(s []string) *demoKind   { k.compat = s; return k }
func (k *demoKind) bedSized() *demoKind         { k.beds = true; return k }
func (k *demoKind) titled(where int) *demoKind  { k.title = where; return k }
func (k *demoKind) shopColoured() *demoKind     { k.shop = true; return k }
func (k *demoKind) m(dim string, values ...string) *demoKind {
	g := demoGroup{dims: []string{dim}}
	for _, v := range values {
		g.opts = append(g.opts, []string{v})
	}
	k.groups = append(k.groups, g)
	return k
}

// mLater adds a measure as m does (or, for the dimension "spec", a
// standard designation), drawn from the second stream (see Demo): for
// what is added to a kind after its products were first drawn.
func (k *demoKind) mLater(dim string, values ...string) *demoKind {
	k.later = append(k.later, demoGroup{dims: []string{dim}})
	g := &k.later[len(k.later)-1]
	for _, v := range values {
		g.opts = append(g.opts, []string{v})
	}
	return k
}

// dims adds a group of several dimensions, named space-separated, with
// options whose values are separated by "|".
func (k *demoKind) dims(names string, opts ...string) *demoKind {
	g := demoGroup{dims: strings.Fields(names)}
	for _, o := range opts {
		g.opts = append(g.opts, strings.Split(o, "|"))
	}
	k.groups = append(k.groups, g)
	return k
}

// demoDept is one aisle of the store: a lexicon category with its brands.
type demoDept struct {
	category string
	weight   int // share of the catalog
	brands   []string
	// parts are the prefixes of the department's part numbers; nil when
	// its products carry none.
	parts  []string
	blurbs []string
	// colourDefault: every kind takes the shop's colours unless it says
	// otherwise; otherwise kinds are colourless unless they say.
	colourDefault bool
	audiences     []string
	kinds         []*demoKind
}

var demoAudiences = []string{"women", "men", "kids", "unisex"}

// demoDepts is built once; it is never changed after.
var demoDepts = buildDemoDepts()

func buildDemoDepts() []*demoDept {
	return []*demoDept{
		demoApparel(),
		demoFootwear(),
		demoAccessories(),
		demoHome(),
		demoFurniture(),
		demoLumber(),
		demoHardware(),
		demoElectrical(),
		demoCamera(),
		demoTyres(),
		demoOffice(),
		demoBatteries(),
		demoElectronics(),
		demoPaint(),
		demoKitchen(),
	}
}

// demoPassengerTyres are common passenger car sizes, smallest rim first
// (common practice, from memory).
var demoPassengerTyres = []string{
	"175/65R14", "185/65R15", "195/65R15", "205/55R16", "215/60R16",
	"225/45R17", "225/65R17", "235/55R18", "245/40R18",
}

// demoDeptTotal is the sum of the departments' weights.
var demoDeptTotal = func() int {
	n := 0
	for _, d := range demoDepts {
		n += d.weight
	}
	return n
}()

// demoPick returns one of s, or "" when s is empty.
func demoPick(r *rand.Rand, s []string) string {
	if len(s) == 0 {
		return ""
	}
	return s[r.IntN(len(s))]
}

// demoProduct draws product number id from r, and the measures and
// designations its kind gained later from later.
func demoProduct(r, later *rand.Rand, id int) Product {
	w := r.IntN(demoDeptTotal)
	var d *demoDept
	for _, d = range demoDepts {
		if w < d.weight {
			break
		}
		w -= d.weight
	}
	k := d.kinds[r.IntN(len(d.kinds))]

	p := Product{
		ID:          "HG-" + demoPad6(id),
		ProductType: k.name,
		Category:    d.category,
		Brand:       demoPick(r, d.brands),
		Material:    demoPick(r, k.materials),
		Pattern:     demoPick(r, k.patterns),
		Silhouette:  demoPick(r, k.silhouettes),
	}
	if d.audiences != nil {
		aud := k.audiences
		if aud == nil {
			aud = d.audiences
		}
		p.Audience = demoPick(r, aud)
	}
	demoColour(r, d, k, &p)

	// scale is how far up its options the product sits, in thousandths,
	// summed over every choice that has more than one option.
	scale, choices := 0, 0
	var titleMeasure string
	for gi, g := range k.groups {
		oi := r.IntN(len(g.opts))
		if len(g.opts) > 1 {
			scale += oi * 1000 / (len(g.opts) - 1)
			choices++
		}
		for di, dim := range g.dims {
			v := g.opts[oi][di]
			if dim == "spec" {
				p.Spec = append(p.Spec, v)
				continue
			}
			if p.Measures == nil {
				p.Measures = make(map[string]string, 4)
			}
			p.Measures[dim] = v
			if gi == 0 && k.title != demoTitleNone {
				if titleMeasure != "" {
					titleMeasure += " x "
				}
				titleMeasure += v
			}
		}
	}
	if len(k.specs) > 0 {
		si := r.IntN(len(k.specs))
		if len(k.specs) > 1 {
			scale += si * 1000 / (len(k.specs) - 1)
			choices++
		}
		p.Spec = append(p.Spec, k.specs[si])
	}
	if choices == 0 {
		scale = 500
	} else {
		scale /= choices
	}

	switch {
	case d.category == "apparel":
		lo := r.IntN(3)
		hi := lo + 2 + r.IntN(len(demoLetterSizes)-lo-2)
		p.Sizes = append([]string(nil), demoLetterSizes[lo:hi+1]...)
	case d.category == "footwear":
		p.Sizes = demoShoeSizes(r, p.Audience)
	case k.beds:
		lo := r.IntN(2)
		hi := lo + 1 + r.IntN(len(demoBedSizes)-lo-1)
		p.Sizes = append([]string(nil), demoBedSizes[lo:hi+1]...)
	}

	if len(k.compat) > 0 {
		for _, c := range k.compat {
			if r.IntN(2) == 0 {
				p.CompatibleWith = append(p.CompatibleWith, c)
			}
		}
		if len(p.CompatibleWith) == 0 {
			p.CompatibleWith = []string{demoPick(r, k.compat)}
		}
	}
	if d.parts != nil {
		p.PartNumber = demoPick(r, d.parts) + "-" + strconv.Itoa(1000+r.IntN(9000))
	}

	// Price: 60% from where the product sits among its options, 40% at random,
	// in whole dollars, with a shop's usual endings.
	u := r.IntN(1001)
	cents := k.lo + (k.hi-k.lo)*(6*scale+4*u)/10000
	cents = cents/100*100 + demoPriceEndings[r.IntN(len(demoPriceEndings))]
	p.Price = &Price{Amount: strconv.Itoa(cents/100) + "." + demoPad2(cents%100), Currency: "USD"}

	in := r.IntN(100) >= 8
	p.InStock = &in

	p.Title = demoTitle(&p, k, titleMeasure)
	p.Description = demoDescription(r, d, &p)
	for _, g := range k.later {
		// After the title and description, and not part of scale, so the
		// text and the price stay as they were drawn.
		oi := later.IntN(len(g.opts))
		for di, dim := range g.dims {
			if dim == "spec" {
				p.Spec = append(p.Spec, g.opts[oi][di])
				continue
			}
			if p.Measures == nil {
				p.Measures = make(map[string]string, 4)
			}
			p.Measures[dim] = g.opts[oi][di]
		}
	}
	return p
}

// demoPriceEndings are the cents a price ends in.
var demoPriceEndings = []int{0, 49, 95, 99}

// demoColour gives p a colour as its kind and department allow: one of the
// store's colour names with its hex, or a plain lexicon colour.
func demoColour(r *rand.Rand, d *demoDept, k *demoKind, p *Product) {
	if k.noColour {
		return
	}
	shop := k.shop || (d.colourDefault && k.colours == nil)
	switch {
	case shop:
		if r.IntN(4) == 0 {
			plain := k.colours
			if plain == nil {
				plain = demoPlainColours
			}
			p.Colour = demoPick(r, plain)
			return
		}
		c := demoShopColours[r.IntN(len(demoShopColours))]
		p.Colour, p.ColourHex = c.name, c.hex
	case k.colours != nil:
		p.Colour = demoPick(r, k.colours)
	}
}

// demoShoeSizes returns a run of US shoe sizes for the audience, with half
// sizes for about half the products.
func demoShoeSizes(r *rand.Rand, audience string) []string {
	lo, hi := 5, 13
	switch audience {
	case "women":
		lo, hi = 5, 11
	case "men":
		lo, hi = 7, 13
	case "kids":
		lo, hi = 5, 9
	}
	lo += r.IntN(2)
	step := 2
	if r.IntN(2) == 0 {
		step = 1
	}
	var out []string
	for h := 2 * lo; h <= 2*hi; h += step {
		s := strconv.Itoa(h / 2)
		if h%2 == 1 {
			s += ".5"
		}
		out = append(out, s)
	}
	return out
}

// demoTitle builds "Brand [measure] [pattern] [material] [silhouette]
// [spec] product type [measure]".
func demoTitle(p *Product, k *demoKind, measure string) string {
	var b strings.Builder
	b.WriteString(p.Brand)
	add := func(s string) {
		if s != "" {
			b.WriteByte(' ')
			b.WriteString(s)
		}
	}
	if k.title == demoTitleBefore {
		add(measure)
	}
	if p.Pattern != "solid" {
		add(p.Pattern)
	}
	add(demoDisplay(p.Material))
	add(p.Silhouette)
	for _, s := range p.Spec {
		add(s)
	}
	add(demoDisplay(p.ProductType))
	if k.title == demoTitleAfter {
		add(measure)
	}
	return b.String()
}

// demoDescription writes two or three short sentences about p.
func demoDescription(r *rand.Rand, d *demoDept, p *Product) string {
	var b strings.Builder
	first := demoDisplay(p.ProductType)
	if p.Material != "" {
		first = demoDisplay(p.Material) + " " + first
	}
	b.WriteString(strings.ToUpper(first[:1]))
	b.WriteString(first[1:])
	if p.Colour != "" {
		b.WriteString(" in ")
		b.WriteString(p.Colour)
	}
	b.WriteString(" from ")
	b.WriteString(p.Brand)
	b.WriteString(".")
	if len(p.Sizes) > 1 {
		b.WriteString(" Sizes ")
		b.WriteString(p.Sizes[0])
		b.WriteString(" to ")
		b.WriteString(p.Sizes[len(p.Sizes)-1])
		b.WriteString(".")
	}
	b.WriteByte(' ')
	b.WriteString(demoPick(r, d.blurbs))
	return b.String()
}

// demoAcronyms are the lexicon's lower-case words that a shop prints in
// capitals; whittle's parser reads either case.
var demoAcronyms = map[string]string{
	"tv": "TV", "usb": "USB", "hdmi": "HDMI", "led": "LED", "ssd": "SSD",
	"osb": "OSB", "mdf": "MDF", "gfci": "GFCI", "nd": "ND", "uv": "UV",
	"microsd": "microSD", "pvc": "PVC", "eva": "EVA", "nimh": "NiMH",
}

// demoDisplay writes a lexicon phrase as a shop prints it.
func demoDisplay(phrase string) string {
	if phrase == "" {
		return ""
	}
	words := strings.Fields(phrase)
	changed := false
	for i, w := range words {
		if a, ok := demoAcronyms[w]; ok {
			words[i] = a
			changed = true
		}
	}
	if !changed {
		return phrase
	}
	return strings.Join(words, " ")
}

// demoPad6 writes n with at least six digits.
func demoPad6(n int) string {
	s := strconv.Itoa(n)
	if len(s) < 6 {
		s = "000000"[len(s):] + s
	}
	return s
}

// demoPad2 writes n (0..99) with two digits.
func demoPad2(n int) string {
	if n < 10 {
		return "0" + strconv.Itoa(n)
	}
	return strconv.Itoa(n)
}
