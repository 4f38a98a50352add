package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"math"
	"os"
	"slices"
	"strings"
	"text/tabwriter"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

const colourUsage = `usage:
  whittle colour [--json] [--nearest N] [--lexicon DIR] COLOUR
                                  describe a colour and its nearest named colours
  whittle colour [--json] [--lexicon DIR] COLOUR COLOUR
                                  the distance between two colours (ΔE00 and ΔE76)
  whittle colour --catalog FILE [--within D] [--category C] [--policy FILE] [--json] [--lexicon DIR] COLOUR
                                  the catalog's colours near COLOUR, nearest first

COLOUR is a name ("dusty rose", "light sage"), a hex value (#c0a0a0),
rgb(192, 160, 160) or L,a,b ("65.1,14.2,5.3"). Quote names of several words.

flags:
`

// nearJSON is one named colour near another.
type nearJSON struct {
	Name     string   `json:"name"`
	Hex      string   `json:"hex"`
	Families []string `json:"families"`
	DeltaE   float64  `json:"delta_e00"`
	Products int      `json:"products,omitempty"`
}

// near describes a palette match.
func near(m colour.Match) nearJSON {
	rgb, _ := m.Lab.RGB()
	var fams []string
	for _, f := range colour.FamiliesOf(m.Lab) {
		fams = append(fams, string(f))
	}
	return nearJSON{Name: m.Name, Hex: rgb.Hex(), Families: fams, DeltaE: round2(m.DeltaE), Products: m.Count}
}

func colourCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("colour", flag.ContinueOnError)
	fs.SetOutput(stderr)
	asJSON := fs.Bool("json", false, "write JSON instead of text")
	catalogFile := fs.String("catalog", "", "catalog file (JSON Lines) whose colours to search")
	within := fs.Float64("within", 0, "ΔE00 tolerance for --catalog (default: the policy's for --category)")
	category := fs.String("category", "", "category whose policy tolerance --catalog uses: "+strings.Join(lexicon.Categories(), ", "))
	nearest := fs.Int("nearest", 5, "how many nearest named colours to show")
	lexDir := fs.String("lexicon", "", "directory of .wlx files replacing the built-in ones")
	policyFile := fs.String("policy", "", "policy file laid over the built-in policy (for the category's tolerance)")
	fs.Usage = func() {
		fmt.Fprint(stderr, colourUsage)
		fs.PrintDefaults()
	}
	colours, code, ok := parseFlags(fs, args, -1)
	if !ok {
		return code
	}
	switch {
	case len(colours) == 0:
		return usageError(fs, "give a COLOUR to describe, or two to compare")
	case len(colours) > 2:
		return usageError(fs, "takes one colour or two, not %d; quote a name of several words: whittle colour \"dusty rose\"", len(colours))
	case *catalogFile != "" && len(colours) != 1:
		return usageError(fs, "--catalog takes one colour, not %d", len(colours))
	}
	for _, f := range []string{"within", "category", "policy"} {
		if !onlyWith(fs, f, "catalog") {
			return 2
		}
	}
	if !apart(fs, "nearest", "catalog") || !checkNeeds(fs, need{"within", *within >= 0, "0 or more"}, need{"nearest", *nearest >= 0, "0 or more"}) {
		return 2
	}
	if !checkCategory("colour", *category, stderr) {
		return 2
	}
	lex, ok := loadLexicon("colour", *lexDir, stderr)
	if !ok {
		return 2
	}
	opts := parser.Options{Lexicon: lex}
	var readings []*parser.ColourReading
	for _, a := range colours {
		r, err := parser.ReadColour(a, opts)
		if err != nil {
			fmt.Fprintf(stderr, "whittle colour: %v\n", err)
			return 1
		}
		readings = append(readings, r)
	}
	out := newPrinter(stdout, *asJSON)
	switch {
	case len(readings) == 2:
		a, b := readings[0], readings[1]
		out.pair(a, b, colour.DeltaE2000(a.LabValue(), b.LabValue()), colour.DeltaE76(a.LabValue(), b.LabValue()))
	case *catalogFile != "":
		f, err := os.Open(*catalogFile)
		if err != nil {
			fmt.Fprintf(stderr, "whittle colour: %v\n", err)
			return 1
		}
		defer f.Close()
		v, err := catalog.ReadColours(f, lex)
		if err != nil {
			fmt.Fprintf(stderr, "whittle colour: %s: %v\n", *catalogFile, err)
			return 1
		}
		tol := *within
		if tol == 0 {
			pol, ok := loadPolicy("colour", *policyFile, lex, stderr)
			if !ok {
				return 2
			}
			tol = pol.For(*category, "", lex).ColourTolerance
		}
		var found []nearJSON
		for _, m := range v.Palette().Within(readings[0].LabValue(), tol) {
			found = append(found, near(m))
		}
		out.catalog(readings[0], tol, found, v)
	default:
		var found []nearJSON
		for _, m := range lex.ColourPalette().Nearest(readings[0].LabValue(), *nearest) {
			found = append(found, near(m))
		}
		out.one(readings[0], found)
	}
	return out.done(stderr)
}

func round2(x float64) float64 { return math.Round(x*100) / 100 }

// printer writes colour results as text or JSON.
type printer struct {
	w      io.Writer
	asJSON bool
	err    error
}

func newPrinter(w io.Writer, asJSON bool) *printer { return &printer{w: w, asJSON: asJSON} }

func (p *printer) json(v any) {
	b, err := json.MarshalIndent(v, "", "  ")
	if err == nil {
		_, err = fmt.Fprintf(p.w, "%s\n", b)
	}
	p.err = err
}

func (p *printer) done(stderr io.Writer) int {
	if p.err != nil {
		fmt.Fprintf(stderr, "whittle colour: %v\n", p.err)
		return 1
	}
	return 0
}

func describe(r *parser.ColourReading) string {
	name := r.Name
	if name == "" {
		name = r.Input
	}
	if r.Inferred {
		name += " (modifier applied)"
	}
	return name
}

func (p *printer) header(tw io.Writer, r *parser.ColourReading) {
	fmt.Fprintf(tw, "colour\t%s\n", describe(r))
	fmt.Fprintf(tw, "hex\t%s\n", r.Hex)
	fmt.Fprintf(tw, "Lab\t%.2f  %.2f  %.2f\n", r.Colour.Lab[0], r.Colour.Lab[1], r.Colour.Lab[2])
	fmt.Fprintf(tw, "LCh\t%.2f  %.2f  %.1f°\n", r.LCh[0], r.LCh[1], r.LCh[2])
	fmt.Fprintf(tw, "families\t%s\n", strings.Join(r.Families, ", "))
}

func (p *printer) one(r *parser.ColourReading, near []nearJSON) {
	if p.asJSON {
		p.json(struct {
			*parser.ColourReading
			Nearest []nearJSON `json:"nearest"`
		}{r, near})
		return
	}
	tw := tabwriter.NewWriter(p.w, 0, 0, 2, ' ', 0)
	p.header(tw, r)
	fmt.Fprintf(tw, "\nnearest named colours\tΔE00\thex\n")
	for _, n := range near {
		fmt.Fprintf(tw, "  %s\t%.2f\t%s\n", n.Name, n.DeltaE, n.Hex)
	}
	p.err = tw.Flush()
}

func (p *printer) pair(a, b *parser.ColourReading, de00, de76 float64) {
	if p.asJSON {
		p.json(struct {
			A      *parser.ColourReading `json:"a"`
			B      *parser.ColourReading `json:"b"`
			DE2000 float64               `json:"delta_e00"`
			DE76   float64               `json:"delta_e76"`
		}{a, b, round4(de00), round4(de76)})
		return
	}
	tw := tabwriter.NewWriter(p.w, 0, 0, 2, ' ', 0)
	for _, r := range []*parser.ColourReading{a, b} {
		fmt.Fprintf(tw, "%s\t%s\tLab %.2f  %.2f  %.2f\n", describe(r), r.Hex, r.Colour.Lab[0], r.Colour.Lab[1], r.Colour.Lab[2])
	}
	fmt.Fprintf(tw, "\nΔE00\t%.4f\n", de00)
	fmt.Fprintf(tw, "ΔE76\t%.4f\n", de76)
	p.err = tw.Flush()
}

func round4(x float64) float64 { return math.Round(x*1e4) / 1e4 }

func (p *printer) catalog(r *parser.ColourReading, tol float64, near []nearJSON, v *catalog.Vocabulary) {
	if near == nil {
		near = []nearJSON{}
	}
	if p.asJSON {
		p.json(struct {
			Query    *parser.ColourReading `json:"query"`
			Within   float64               `json:"within"`
			Colours  []nearJSON            `json:"colours"`
			Products int                   `json:"products_read"`
			Unplaced map[string]int        `json:"unplaced"`
		}{r, tol, near, v.Products, v.Unplaced})
		return
	}
	tw := tabwriter.NewWriter(p.w, 0, 0, 2, ' ', 0)
	p.header(tw, r)
	fmt.Fprintf(tw, "\ncatalog colours within ΔE00 %g (%d products read, %d colour names)\n", tol, v.Products, len(v.Colours))
	if len(near) == 0 {
		fmt.Fprintf(tw, "  none\n")
	} else {
		fmt.Fprintf(tw, "  name\tΔE00\thex\tfamilies\tproducts\n")
	}
	for _, n := range near {
		fmt.Fprintf(tw, "  %s\t%.2f\t%s\t%s\t%d\n", n.Name, n.DeltaE, n.Hex, strings.Join(n.Families, ", "), n.Products)
	}
	if len(v.Unplaced) > 0 {
		fmt.Fprintf(tw, "\n%d colour names have no value and are not in the lexicon\n", len(v.Unplaced))
	}
	p.err = tw.Flush()
}

// parseInterspersed parses flags wherever they stand among the other
// arguments ("whittle colour sage --json"), and returns the others; after
// "--" everything is an argument.
func parseInterspersed(fs *flag.FlagSet, args []string) ([]string, error) {
	var tail []string
	if i := slices.Index(args, "--"); i >= 0 {
		args, tail = args[:i], args[i+1:]
	}
	var rest []string
	for {
		if err := fs.Parse(args); err != nil {
			return nil, err
		}
		if fs.NArg() == 0 {
			return append(rest, tail...), nil
		}
		rest = append(rest, fs.Arg(0))
		args = fs.Args()[1:]
	}
}
