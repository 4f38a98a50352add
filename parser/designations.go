package parser

import (
	"errors"
	"fmt"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"github.com/bojanz/currency"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/spec"
	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser/internal/grammar"
)

// specConstraint wraps a standard designation. A designation of no
// dimensions (a pipe schedule) has none, nil, as its JSON reads back.
func specConstraint(start, end int, d spec.Designation, evidence string) Constraint {
	for k, v := range d.Dimensions {
		d.Dimensions[k] = tidy(v)
	}
	if len(d.Dimensions) == 0 {
		d.Dimensions = nil
	}
	return Constraint{Kind: KindSpec, Start: start, End: end, Evidence: join(evidence, d.Source),
		Spec: &Spec{System: string(d.System), Designation: d.Code, Dimensions: d.Dimensions, Attributes: d.Attributes, Standard: d.Source}}
}

// noPitch notes that the metric thread starting at start was typed with
// no pitch.
func (p *tagger) noPitch(start int) {
	if p.barePitch == nil {
		p.barePitch = map[int]bool{}
	}
	p.barePitch[start] = true
}

// finePitch reads a metric thread typed with no pitch as its fine
// threads when the query asks for a fine thread ("m8 fine thread
// bolt"): a bare M8 is the coarse M8x1.25, which the shopper said is
// not wanted (common practice: M8 alone means coarse, ISO 261 lists the
// fine pitches). The spec becomes the fine threads, any of which will
// do (Spec.Also), still hard.
func (p *tagger) finePitch() {
	fine := slices.ContainsFunc(p.res.Constraints, func(c Constraint) bool {
		return c.Kind == KindSilhouette && c.Name == "fine thread" && !c.Excluded
	})
	if !fine {
		return
	}
	for i := range p.res.Constraints {
		c := &p.res.Constraints[i]
		if c.Spec == nil || c.Spec.System != string(spec.MetricThread) || !p.barePitch[c.Start] {
			continue
		}
		ds, err := spec.MetricFineThreads(c.Spec.Dimensions["major_diameter"])
		if err != nil || len(ds) == 0 {
			continue
		}
		f := specConstraint(c.Start, c.End, ds[0], "ISO metric thread")
		for _, d := range ds[1:] {
			f.Spec.Also = append(f.Spec.Also, d.Code)
		}
		f.Text, f.Strictness, f.Excluded = c.Text, c.Strictness, c.Excluded
		f.Evidence = join(c.Evidence, "fine thread asked, so ISO 261's fine pitches, not the coarse one a bare size means")
		*c = f
	}
}

// tyre tags "225/45R17".
func (p *tagger) tyre(u *unit) {
	t := u.item.Tyre
	w, err1 := strconv.Atoi(t.Width)
	a, err2 := strconv.Atoi(t.Aspect)
	rim, err3 := strconv.ParseFloat(t.Rim, 64)
	if err1 != nil || err2 != nil || err3 != nil {
		p.errorf(u.start, u.end, "cannot read %q as a tyre size", p.q[u.start:u.end])
		return
	}
	d, err := spec.TyreSize(w, a, constructionLetter(t.Construction), rim)
	if err != nil {
		p.errorf(u.start, u.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Evidence: "looks like a tyre size but is not one"})
		return
	}
	if t.Load != "" {
		if li, err := strconv.Atoi(t.Load); err != nil || li < 50 || li > 150 {
			p.errorf(u.start, u.end, "load index %s is outside 50..150", t.Load)
		} else {
			d.Code += " " + t.Load + strings.ToUpper(t.Speed)
			d.Attributes["load_index"] = t.Load
			d.Attributes["speed_symbol"] = strings.ToUpper(t.Speed)
		}
	}
	if t.Construction == "zr" || t.Construction == "rf" {
		d.Attributes["construction_written"] = strings.ToUpper(t.Construction)
	}
	p.add(specConstraint(u.start, u.end, d, "ISO metric tyre size"))
}

// tyres reports whether the query is about tyres: its category, or a
// tyre size read before.
func (p *tagger) tyres() bool {
	if p.category == "tyres" {
		return true
	}
	for _, c := range p.res.Constraints {
		if c.Spec != nil && c.Spec.System == "tyre" {
			return true
		}
	}
	return false
}

// spacedTyre reads a tyre size typed as three bare numbers on tyres,
// "tire 225 65 17": the section width in mm, the aspect ratio and the
// rim in inches, as the sidewall's 225/65R17 gives them. The tyre is read
// as radial, which nearly every car tyre sold is (common practice), and
// the evidence says so. q is the first number, at unit k; it returns
// the extra units used, or 0.
func (p *tagger) spacedTyre(k int, q quantity) int {
	if p.category != "tyres" || q.hasUnit || !q.num.integer || k+2 >= len(p.units) {
		return 0
	}
	nums := []int{int(q.num.value)}
	for _, v := range p.units[k+1 : k+3] {
		if v.kind != uItem || !v.spaceBefore || !p.bareOrUnit(&v, "") {
			return 0
		}
		n, err := strconv.Atoi(v.item.Value.From.Dims.Parts[0].Num.Whole)
		if err != nil {
			return 0
		}
		nums = append(nums, n)
	}
	w, a, rim := nums[0], nums[1], nums[2]
	if w%5 != 0 || a%5 != 0 {
		return 0
	}
	d, err := spec.TyreSize(w, a, 'R', float64(rim))
	if err != nil {
		return 0
	}
	end := p.units[k+2].end
	p.add(specConstraint(p.units[k].start, end, d, "ISO metric tyre size typed as three numbers, read as radial"))
	return 2
}

// flotationRim matches what follows a flotation size's width, stuck to
// it: the construction and the rim, and a light truck's "lt" ("r20",
// "r17lt").
var flotationRim = regexp.MustCompile(`^([rdb])(\d{2}(\.5)?)(lt)?$`)

// flotationTyre reads a flotation tyre size at unit k, "33x12.50r20":
// the overall diameter by the section width in inches, then the
// construction and the rim, as light truck and off-road tyres are sized
// (spec.FlotationTyreSize), on tyres or with no product type. The
// dimension was two unitless parts and the rest a hard part number that
// nothing matched. It returns the extra units used, and whether it read
// one.
func (p *tagger) flotationTyre(k int) (int, bool) {
	if p.category != "tyres" && p.head != nil || k+1 >= len(p.units) {
		return 0, false
	}
	n, v := p.bareParts(&p.units[k]), &p.units[k+1]
	if len(n) != 2 || v.kind != uItem || v.spaceBefore || v.item.Code == nil {
		return 0, false
	}
	m := flotationRim.FindStringSubmatch(strings.ToLower(p.q[v.start:v.end]))
	if m == nil {
		return 0, false
	}
	rim, err := strconv.ParseFloat(m[2], 64)
	if err != nil {
		return 0, false
	}
	d, err := spec.FlotationTyreSize(n[0].value, n[1].value, m[1][0], rim)
	if err != nil {
		return 0, false
	}
	p.add(specConstraint(p.units[k].start, v.end, d, "flotation tyre size: diameter by width in inches, then construction and rim"))
	return 1, true
}

// vesaPattern reads a screen's mounting pattern, the hole spacing in mm
// a wall mount must match (the VESA mounting interface standard, from
// memory): "vesa 400x400" with the word at unit w before the pattern at
// unit k, or "400x400 vesa" with it after. It is a hard phrase, written
// "vesa 400x400" as titles write it, since a mount of another pattern
// does not fit; start is where the span begins. It returns the extra
// units used, and whether it read one.
func (p *tagger) vesaPattern(k, w, start int) (int, bool) {
	if k < 0 || w < 0 || k >= len(p.units) || w >= len(p.units) || p.units[w].kind != uWord || p.units[w].text != "vesa" || p.units[k].kind != uItem {
		return 0, false
	}
	nums := p.bareParts(&p.units[k])
	if len(nums) != 2 || !nums[0].integer || !nums[1].integer || nums[0].value < 50 || nums[0].value > 1000 || nums[1].value < 50 || nums[1].value > 1000 {
		return 0, false
	}
	end := max(p.units[k].end, p.units[w].end)
	p.add(Constraint{Kind: KindKeyword, Start: start, End: end, Name: "vesa " + nums[0].decimal + "x" + nums[1].decimal, Strictness: Hard,
		Evidence: "a VESA mounting pattern, the hole spacing in mm a mount must match, matched in the product's words"})
	return 1, true
}

// loadVersions are the words that mark a tyre built for a higher load
// at the same size: XL, extra load, reinforced (common practice).
var loadVersions = map[string]bool{"xl": true, "extra load": true, "reinforced": true}

// loadVersion tags "xl", "extra load" or "reinforced" on a tyre at unit
// k as a hard keyword, not a clothing size: a standard-load tyre is no
// substitute, and the marking is in the product's words. -1 when it is
// none.
func (p *tagger) loadVersion(k int) int {
	u := &p.units[k]
	if !p.tyres() {
		return -1
	}
	used, end := 0, u.end
	if k+1 < len(p.units) && p.units[k+1].kind == uWord && loadVersions[u.text+" "+p.units[k+1].text] {
		used, end = 1, p.units[k+1].end
	} else if !loadVersions[u.text] {
		return -1
	}
	p.add(Constraint{Kind: KindKeyword, Start: u.start, End: end, Name: strings.ToLower(p.q[u.start:end]), Strictness: Hard,
		Evidence: "a tyre's load version, not a clothing size: a standard-load tyre is no substitute"})
	return used
}

// serviceDescription is a tyre's load index and speed symbol written
// alone, "91v", "94w" (ISO 4000-1 speed symbols L to Y).
var serviceDescription = regexp.MustCompile(`^(\d{2,3})([lmnpqrstuhvwy])$`)

// serviceAlone tags a tyre's service description at unit k, written
// apart from its size ("tyres 91v"), as a hard keyword, not a voltage:
// a lower load index or speed symbol is no substitute. False when it is
// none.
func (p *tagger) serviceAlone(k int) bool {
	u := &p.units[k]
	m := serviceDescription.FindStringSubmatch(strings.ToLower(p.q[u.start:u.end]))
	if m == nil || !p.tyres() {
		return false
	}
	if li, err := strconv.Atoi(m[1]); err != nil || li < 50 || li > 150 {
		return false
	}
	p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: m[1] + m[2], Strictness: Hard,
		Evidence: "a tyre's load index " + m[1] + " and speed symbol " + strings.ToUpper(m[2]) + " (ISO 4000-1), not a voltage"})
	return true
}

// lampBase matches lamp base codes (IEC 60061, from memory): Edison
// screw bases (e10 to e40), bayonets (b15, b22), bi-pin and twist-lock
// bases (g4, g9, gu5.3, gu10, gu24). A bulb of another base does not fit
// the socket.
var lampBase = regexp.MustCompile(`^(e(10|11|12|14|17|26|27|39|40)|b(15|22)|g(4|9)|gu(5\.3|10|24))$`)

// lampShape matches bulb shape codes (ANSI C79 and common practice, from
// memory): a19, a21, a60, br30, br40, par20 to par38, mr11, mr16, g25.
var lampShape = regexp.MustCompile(`^(a(19|21|60)|br(30|40)|par(16|20|30|38)|mr(11|16)|g25)$`)

// lighting reports whether a query is about bulbs: its head is a light
// bulb or a type under one, or no product type names another category.
func (p *tagger) lighting() bool {
	if p.head == nil {
		return p.category == "" || p.category == "electrical"
	}
	return p.headUnder("light bulb")
}

// headUnder reports whether the head product type is the product type
// name or one under it.
func (p *tagger) headUnder(name string) bool {
	if p.head == nil {
		return false
	}
	for _, e := range p.lex.Lineage(p.head) {
		if e.Name == name {
			return true
		}
	}
	return false
}

// scheduleCode matches a pipe schedule written as one code: "sch40",
// "sch-80", "schedule40", "sch10s".
var scheduleCode = regexp.MustCompile(`^sch(?:edule)?-?(\d+s?)$`)

// piped reports whether the query's product is a pipe, a pipe fitting
// or conduit, which are sold by schedule, or the query names no product
// type.
func (p *tagger) piped() bool {
	return p.head == nil || p.headUnder("pipe") || p.headUnder("pipe fitting") || p.headUnder("conduit")
}

// scheduleAfter reads "sch 40", "sch. 80" or "schedule 40" at word unit
// k, on a pipe (piped), as the pipe's wall schedule, hard. It returns
// the extra units used, or 0 when there is none.
func (p *tagger) scheduleAfter(k int) int {
	u := &p.units[k]
	j := k + 1
	if j < len(p.units) && p.units[j].kind == uSym && p.units[j].tok.Value == "." && !p.units[j].spaceBefore {
		j++
	}
	if j >= len(p.units) || p.units[j].kind != uItem || !p.piped() {
		return 0
	}
	v := &p.units[j]
	val := v.item.Value
	if val == nil || val.To != nil || val.Post != "" || val.From.Dims == nil || len(val.From.Dims.Parts) != 1 {
		return 0
	}
	q := val.From.Dims.Parts[0]
	n := q.Num
	if n.Only != nil || q.Mark != "" || q.Currency != "" || q.Label != "" {
		return 0
	}
	number, end := n.Whole, v.end
	switch {
	case strings.EqualFold(q.Unit, "s") && n.Frac == nil:
		number += "s" // "sch 10s", read as seconds
	case q.Unit != "" && n.Frac == nil:
		return 0
	case n.Frac != nil:
		end = n.Pos.Offset + len(n.Whole) // "sch 40 1/2 in": the fraction is a size
	}
	d, ok := spec.PipeSchedule(number)
	if !ok {
		return 0
	}
	p.add(specConstraint(u.start, end, d, "a pipe's wall schedule"))
	if n.Frac != nil {
		p.fractionAfterSchedule(n.Frac, q.Unit, v.end)
	}
	return j - k
}

// fractionAfterSchedule tags the fraction the grammar joined to a
// schedule number as a mixed number ("sch 40 1/2 in"), up to end: the
// pipe's size, in its unit if one was typed.
func (p *tagger) fractionAfterSchedule(f *grammar.Frac, unit string, end int) {
	num, err := parseNum(&grammar.Num{Pos: f.Pos, EndPos: f.EndPos, Only: f})
	if err != nil {
		p.res.Errors = append(p.res.Errors, err)
		return
	}
	q := quantity{num: num, start: f.Pos.Offset, end: end}
	if unit != "" {
		q.unit, q.hasUnit = units.Lookup(unit, p.opts.Volume)
	}
	if !q.hasUnit {
		p.bare(q.start, end, q)
		return
	}
	p.add(p.measure(q.start, end, q, "", nil, nil, q.unit))
}

// gradeCode matches the grades standards give products, written as one
// code (from memory): network cable categories of TIA-568 (cat5e, cat6,
// cat6a, cat7, cat8), memory generations (ddr3 to ddr5), USB and HDMI
// versions (usb3, usb3.2, hdmi1.4, hdmi2.0, hdmi2.1), Wi-Fi generations (wifi6, wifi6e,
// wifi7), PCI Express generations (pcie3 to pcie5), an air filter's
// MERV rating (merv1 to merv16, ASHRAE 52.2). They are what a
// product is, not a maker's part number.
var gradeCode = regexp.MustCompile(`^(cat(5e|6a?|7|8)|ddr[345]|usb[234](\.\d)?|hdmi(1\.4|2(\.[01])?)|wifi[67]e?|pcie[345]|merv([1-9]|1[0-6]))$`)

// cardGrade matches the speed classes of SD memory cards (the SD
// Association's video classes v6 to v90 and UHS classes u1 and u3, from
// memory), read as grades on a memory card only: elsewhere "v30" may be
// a model.
var cardGrade = regexp.MustCompile(`^(v(6|10|30|60|90)|u[13])$`)

// fNumber is a lens's aperture written as one code: "f2", "f1.8".
var fNumber = regexp.MustCompile(`^f(\d{1,2}(?:\.\d)?)$`)

// aperture tags a lens's f-number between start and end ("f1.8",
// "f/1.8", "f 2.8") as one firm phrase, written as lens titles write it,
// "f/1.8": not a part number, nor a stray f and a number.
func (p *tagger) aperture(start, end int, number string) {
	p.add(Constraint{Kind: KindKeyword, Start: start, End: end, Name: "f/" + number, Strictness: Firm,
		Evidence: "a lens's aperture, its f-number, matched in the product's words"})
}

// apertureAt reads "f/1.8" and "f 2.8" at word unit k, the f apart from
// its number; it returns the extra units used, or -1.
func (p *tagger) apertureAt(k int) int {
	u := &p.units[k]
	if u.text != "f" || p.category != "" && p.category != "camera" {
		return -1
	}
	j := k + 1
	if j < len(p.units) && p.units[j].kind == uSym && p.q[p.units[j].start:p.units[j].end] == "/" {
		j++
	}
	if j >= len(p.units) || p.units[j].kind != uItem || !p.bareNumber(&p.units[j]) {
		return -1
	}
	v := &p.units[j]
	n := strings.TrimSpace(p.q[v.start:v.end])
	if fNumber.MatchString("f" + n) {
		p.aperture(u.start, v.end, n)
		return j - k
	}
	return -1
}

// codeUnit tags the code at unit k; it returns the extra units used.
func (p *tagger) codeUnit(k int) int {
	u := &p.units[k]
	if n, ok := p.spacedThread(k); ok {
		return n
	}
	p.code(u.start, u)
	return 0
}

// maxPitch is the coarsest pitch of ISO 261 in M2..M24, M24's 3 mm:
// after a metric thread's x, a larger number is no pitch but the
// fastener's length.
const maxPitch = 3

// spacedThread reads a metric thread at code unit k whose pitch or
// length follows a spaced x: "M8 x 1.0", "M6 x 20", "M8 x 1.25 x 30",
// "M8x1.25 x 30". It returns the extra units used.
func (p *tagger) spacedThread(k int) (int, bool) {
	u := &p.units[k]
	parts := u.item.Code.Parts
	if parts[0] != "m" || !(len(parts) == 2 || len(parts) == 4 && parts[2] == "x") || !p.xThen(k+1) || p.category != "" && p.category != "hardware" {
		return 0, false
	}
	dia, err := strconv.ParseFloat(parts[1], 64)
	nums := p.bareParts(&p.units[k+2])
	if err != nil || len(nums) == 0 {
		return 0, false
	}
	if len(parts) == 4 {
		// The pitch is joined, so what follows the x is the length.
		pitch, err := strconv.ParseFloat(parts[3], 64)
		if err != nil || pitch == 0 || len(nums) != 1 || nums[0].value <= maxPitch {
			return 0, false
		}
		d, err := spec.MetricThreadSize(dia, pitch)
		if err != nil {
			return 0, false
		}
		p.add(specConstraint(u.start, u.end, d, "ISO metric thread"))
		p.threadLength(nums[0])
		return 2, true
	}
	first := nums[0]
	if first.value == 0 {
		p.errorf(u.start, first.end, "%s", zeroPitch)
		return 2, true
	}
	if first.value > maxPitch && len(nums) == 1 {
		// "M6 x 20": the coarse thread and the length.
		d, err := spec.MetricThreadSize(dia, 0)
		if err != nil {
			return 0, false
		}
		p.noPitch(u.start)
		p.add(specConstraint(u.start, u.end, d, "ISO metric thread"))
		p.threadLength(first)
		return 2, true
	}
	d, err := spec.MetricThreadSize(dia, first.value)
	if err != nil {
		if p.category == "hardware" && len(nums) == 1 {
			// "M8 x 1.5": a pitch ISO 261 does not list for M8, as
			// "m8x1.5" is.
			p.errorf(u.start, first.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
			return 2, true
		}
		return 0, false
	}
	p.add(specConstraint(u.start, first.end, d, "ISO metric thread"))
	switch {
	case len(nums) == 2 && nums[1].value > maxPitch:
		p.threadLength(nums[1]) // "M8 x 1.25 x 30"
	case len(nums) == 1 && p.xThen(k+3):
		if more := p.bareParts(&p.units[k+4]); len(more) == 1 && more[0].value > maxPitch {
			p.threadLength(more[0]) // "M8 x 1.25 x 30" read apart
			return 4, true
		}
	}
	return 2, true
}

// xThen reports whether unit k is the word x and a value follows it.
func (p *tagger) xThen(k int) bool {
	return k+1 < len(p.units) && p.units[k].kind == uWord && p.units[k].text == "x" && p.units[k+1].kind == uItem
}

// bareParts are the numbers of value unit v when it is one or two bare
// numbers, "20" or "1.25 x 30", with no unit, mark or currency; else
// nil.
func (p *tagger) bareParts(v *unit) []number {
	it := v.item
	if it.Value == nil || it.Value.To != nil || it.Value.Post != "" || it.Value.From.Dims == nil || len(it.Value.From.Dims.Parts) > 2 {
		return nil
	}
	var out []number
	for _, q := range it.Value.From.Dims.Parts {
		if q.Unit != "" || q.Mark != "" || q.Currency != "" || q.Label != "" {
			return nil
		}
		n, err := parseNum(q.Num)
		if err != nil || n.value < 0 {
			return nil
		}
		out = append(out, n)
	}
	return out
}

// threadLength tags n, after a metric thread and an x, as the fastener's
// length in millimetres: a metric screw or bolt is named by its thread,
// then its length in mm, "M6 x 20" (common practice, as ISO fastener
// standards designate them).
func (p *tagger) threadLength(n number) {
	mm := mustUnit("mm")
	c := p.measure(n.start, n.end, quantity{num: n, unit: mm, hasUnit: true}, "length", nil, nil, mm)
	c.Evidence = "a metric fastener's length in mm, after its thread (M6 x 20)"
	p.add(c)
}

// tyreCode matches tyre sizes written as one code with a service prefix:
// "lt265/70r17", "p215/65r15", "st205/75r15".
var tyreCode = regexp.MustCompile(`^(p|lt|st|t)(\d{3})/(\d{2})(zr|r|d|b|rf)(\d{2}(?:\.5)?)$`)

// code tags a run like "xr-2200", "m8x1.25", "a4", "cr2032" that starts
// at start and ends with unit u.
func (p *tagger) code(start int, u *unit) {
	parts := u.item.Code.Parts
	text := strings.Join(parts, "")
	if start < u.start {
		text = strings.ToLower(p.q[start:u.start]) + text
	}
	if m := tyreCode.FindStringSubmatch(text); m != nil && (p.category == "" || p.category == "tyres") {
		w, _ := strconv.Atoi(m[2])
		a, _ := strconv.Atoi(m[3])
		rim, _ := strconv.ParseFloat(m[5], 64)
		if d, err := spec.TyreSize(w, a, constructionLetter(m[4]), rim); err == nil {
			d.Code = strings.ToUpper(m[1]) + d.Code
			d.Attributes["service_type"] = strings.ToUpper(m[1])
			p.add(specConstraint(start, u.end, d, "ISO metric tyre size with a service type"))
			return
		}
	}
	// Metric thread: m8, m8x1.25, and a length after it: m6x20,
	// m8x1.25x30.
	if parts[0] == "m" && len(parts) >= 2 && (p.category == "" || p.category == "hardware") {
		var length string
		if len(parts) == 6 && parts[2] == "x" && parts[4] == "x" {
			parts, length = parts[:4], parts[5]
		} else if len(parts) == 4 && parts[2] == "x" {
			if v, err := strconv.ParseFloat(parts[3], 64); err == nil && v > maxPitch {
				parts, length = parts[:2], parts[3]
			}
		}
		end := u.end
		if length != "" {
			end -= len(length) + 1
		}
		if p.joinedThread(start, end, parts, length, u) {
			return
		}
	}
	p.otherCode(start, u)
}

// joinedThread tags a metric thread written as one code, parts being
// the thread's ("m", "8", "x", "1.25") and length what follows it after
// an x, or "": the thread spans start to end, the length the rest of u.
// It reports whether it tagged anything, an error included.
func (p *tagger) joinedThread(start, end int, parts []string, length string, u *unit) bool {
	dia, err := strconv.ParseFloat(parts[1], 64)
	pitch := 0.0
	ok := err == nil && (len(parts) == 2 || (len(parts) == 4 && parts[2] == "x"))
	if ok && len(parts) == 4 {
		pitch, err = strconv.ParseFloat(parts[3], 64)
		ok = err == nil
		if ok && pitch == 0 && p.category == "hardware" {
			p.errorf(start, u.end, "%s", zeroPitch)
			return true
		}
		ok = ok && pitch != 0
	}
	if !ok {
		return false
	}
	d, err := spec.MetricThreadSize(dia, pitch)
	if err != nil {
		if p.category == "hardware" {
			p.errorf(start, u.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
			return true
		}
		return false
	}
	if pitch == 0 {
		p.noPitch(start)
	}
	p.add(specConstraint(start, end, d, "ISO metric thread"))
	if length != "" {
		if v, dec, err := parseWhole(length); err == nil && v > 0 {
			p.threadLength(number{value: v, decimal: dec, integer: !strings.Contains(dec, "."), start: end + 1, end: u.end})
		}
	}
	return true
}

// otherCode tags a code that is no metric thread: a lamp base or shape,
// a standard's grade, an aperture, a paper or battery size, or else a
// part number.
func (p *tagger) otherCode(start int, u *unit) {
	parts := u.item.Code.Parts
	text := strings.Join(parts, "")
	if start < u.start {
		text = strings.ToLower(p.q[start:u.start]) + text
	}
	raw := strings.ToLower(p.q[start:u.end])
	if p.lighting() && (lampBase.MatchString(raw) || lampShape.MatchString(raw)) {
		c := Constraint{Kind: KindKeyword, Start: start, End: u.end, Name: raw, Strictness: Firm,
			Evidence: "a bulb's shape, matched in the product's words"}
		if lampBase.MatchString(raw) {
			c.Strictness = Hard
			c.Evidence = "a lamp base, which the socket must take (IEC 60061), matched in the product's words; never dropped"
		}
		p.add(c)
		return
	}
	if m := scheduleCode.FindStringSubmatch(raw); m != nil && p.piped() {
		if d, ok := spec.PipeSchedule(m[1]); ok {
			p.add(specConstraint(start, u.end, d, "a pipe's wall schedule"))
			return
		}
	}
	if gradeCode.MatchString(raw) || cardGrade.MatchString(raw) && p.headUnder("memory card") {
		p.add(Constraint{Kind: KindKeyword, Start: start, End: u.end, Name: raw, Strictness: Firm,
			Evidence: "a grade a standard names (cable category, memory generation, port version, card speed class), matched in the product's words, not a part number"})
		return
	}
	if m := fNumber.FindStringSubmatch(raw); m != nil && (p.category == "" || p.category == "camera") {
		p.aperture(start, u.end, m[1])
		return
	}
	if len(parts) == 2 && (parts[0] == "a" || parts[0] == "b") && (p.category == "" || p.category == "office") {
		if d, ok := spec.PaperSize(text); ok {
			p.add(specConstraint(start, u.end, d, "ISO 216 paper size"))
			return
		}
	}
	if p.category == "" || p.category == "batteries" || p.category == "electronics" {
		if d, ok := spec.BatterySize(text); ok {
			p.add(specConstraint(start, u.end, d, "battery size"))
			return
		}
	}
	p.add(Constraint{Kind: KindPartNumber, Start: start, End: u.end, Code: strings.ToUpper(p.q[start:u.end]),
		Evidence: "letters and digits with no space: a code"})
}

// batteryWord reads the word unit k as a battery size: "aa", "aaa" and
// "pp3" anywhere; "c", "d" and "n" in batteries or before "cell".
func (p *tagger) batteryWord(k int) (spec.Designation, bool) {
	u := &p.units[k]
	if u.kind != uWord || u.entries != nil {
		return spec.Designation{}, false
	}
	switch u.text {
	case "aa", "aaa", "pp3":
	case "c", "d", "n":
		next := ""
		if k+1 < len(p.units) && p.units[k+1].kind == uWord {
			next = p.units[k+1].text
		}
		if p.category != "batteries" && next != "cell" && next != "cells" && next != "battery" && next != "batteries" {
			return spec.Designation{}, false
		}
	default:
		return spec.Designation{}, false
	}
	return spec.BatterySize(u.text)
}

// wireGauge tags "14 awg", "12 gauge", "00 awg" and "14/2": a whole
// number is the gauge, all zeros an aught size ("0" is 1/0, "00" 2/0 up
// to "0000", 4/0: common practice, as ASTM B258 lists them); a fraction
// is gauge over conductors.
func (p *tagger) wireGauge(start, end int, q quantity, n *grammar.Num) (Constraint, bool) {
	gauge, conductors := 0, 0
	switch {
	case q.num.integer:
		gauge = int(q.num.value)
		if raw := p.q[q.num.start:q.num.end]; q.num.value == 0 && strings.Trim(raw, "0") == "" {
			gauge = 1 - len(raw)
		}
	case n.Only != nil && n.Only.Vulgar == "":
		g, err1 := strconv.Atoi(n.Only.Num)
		c, err2 := strconv.Atoi(n.Only.Den)
		if err1 != nil || err2 != nil {
			return Constraint{}, false
		}
		gauge, conductors = g, c
	default:
		return Constraint{}, false
	}
	return p.awg(start, end, gauge, conductors)
}

// awg tags an American Wire Gauge between start and end; an impossible
// gauge is a positioned error.
func (p *tagger) awg(start, end, gauge, conductors int) (Constraint, bool) {
	d, err := spec.WireGauge(gauge, conductors)
	if err != nil {
		p.errorf(start, end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		return Constraint{}, false
	}
	return specConstraint(start, end, d, "American Wire Gauge"), true
}

// gaugeWords follow a gauge number: "awg" always names a wire gauge, the
// others ("12 gauge", "12 ga", and the spellings "gage" and "guage") only
// where wire is sold (wiredCategory).
var gaugeWords = map[string]bool{"awg": true, "gauge": true, "ga": true, "gage": true, "guage": true}

// wiredCategory reports whether the category's goods are sized by wire
// gauge: electrical wire and cable, electronics' cable and speaker
// wire, battery cable.
func (p *tagger) wiredCategory() bool {
	return p.category == "electrical" || p.category == "electronics" || p.category == "batteries"
}

// gaugeWordAfter returns how many units after unit k end at a gauge word
// that belongs to it ("12 gauge", "12-gauge"), or 0.
func (p *tagger) gaugeWordAfter(k int) int {
	if w, _ := p.nextWord(k); w != nil && gaugeWords[w.text] {
		return 1
	}
	if k+2 < len(p.units) && p.units[k+1].kind == uSym && p.q[p.units[k+1].start:p.units[k+1].end] == "-" && !p.units[k+1].spaceBefore &&
		p.units[k+2].kind == uWord && !p.units[k+2].spaceBefore && gaugeWords[p.units[k+2].text] {
		return 2
	}
	return 0
}

// gauge tags the quantity at unit k and the gauge word used units after
// it: an American Wire Gauge after "awg" or where wire is sold, else a
// gauge number of another trade ("16 gauge sheet metal", "22 gauge
// needle", "20 gauge earrings"), which no standard here decodes.
func (p *tagger) gauge(k, used int, q quantity) (Constraint, bool) {
	u, w := &p.units[k], &p.units[k+used]
	if w.text == "awg" || p.wiredCategory() {
		c, ok := p.wireGauge(u.start, w.end, q, u.item.Value.From.Dims.Parts[0].Num)
		if ok && w.text == "guage" {
			c.Evidence = join(c.Evidence, `"guage" read as "gauge"`)
		}
		return c, ok
	}
	if !q.num.integer {
		return Constraint{}, false
	}
	return Constraint{Kind: KindMeasure, Start: u.start, End: w.end,
		Evidence: "a gauge number outside wiring: a wire gauge only for wire and cable, or with awg",
		Measure:  &Measure{Dimension: "gauge", Quantity: "count", Unit: "gauge", BaseUnit: "gauge", Amount: ptr(q.num.value), BaseAmount: ptr(q.num.value)}}, true
}

// aught tags "2/0", "4/0 awg": N over zero, N from 1 to 4, is an aught
// wire gauge (common practice) after a gauge word or where wire is sold;
// anywhere else it is a fraction that divides by zero, an error. It
// returns the extra units used.
func (p *tagger) aught(k, n int) int {
	u := &p.units[k]
	used := p.gaugeWordAfter(k)
	if used == 0 && !p.wiredCategory() {
		p.errorf(u.start, u.end, "%d/0 divides by zero", n)
		return 0
	}
	end := p.units[k+used].end
	if c, ok := p.awg(u.start, end, 1-n, 0); ok {
		c.Evidence = join(c.Evidence, fmt.Sprintf("%d/0 is an aught size", n))
		p.add(c)
	}
	return used
}

// aughtOf returns N when v is written N/0 alone, N from 1 to 4.
func aughtOf(v *grammar.Value) (int, bool) {
	if v.To != nil || v.Post != "" || v.From.Money != nil || v.From.Dims == nil || len(v.From.Dims.Parts) != 1 {
		return 0, false
	}
	q := v.From.Dims.Parts[0]
	f := q.Num.Only
	if f == nil || f.Vulgar != "" || f.Den != "0" || q.Unit != "" || q.Mark != "" || q.Currency != "" {
		return 0, false
	}
	switch f.Num {
	case "1", "2", "3", "4":
		return int(f.Num[0] - '0'), true
	}
	return 0, false
}

// gaugeBefore tags "awg 12": the word awg at unit k before a whole
// number. It returns the extra units used, or -1.
func (p *tagger) gaugeBefore(k int) int {
	u := &p.units[k]
	if u.text != "awg" || k+1 >= len(p.units) || p.units[k+1].kind != uItem || !p.bareNumber(&p.units[k+1]) {
		return -1
	}
	v := &p.units[k+1]
	s, ok := p.readSingle(v.item.Value.From)
	if !ok || !s.parts[0].num.integer {
		return -1
	}
	if c, ok := p.wireGauge(u.start, v.end, s.parts[0], v.item.Value.From.Dims.Parts[0].Num); ok {
		p.add(c)
	}
	return 1
}

// A pitch or a thread count written as zero is badly formed: spec reads
// a zero pitch as "none given", the coarse thread, which a shopper who
// typed "m8x0" or "1/4-0" did not ask for.
const zeroPitch = "a thread's pitch is above zero: write M8 for the coarse pitch, M8x1 for a fine one"

var errZeroTPI = errors.New("a thread has more than 0 threads per inch: write 1/4-20, #10-24")

// unifiedThread tags "1/4-20" (a fraction, a dash, a thread count, no
// spaces) between start and end as a unified inch thread.
func (p *tagger) unifiedThread(start, end int, from *grammar.Single, tpi quantity) (Constraint, bool) {
	if strings.ContainsAny(p.q[start:end], " \t") || from.Dims == nil || len(from.Dims.Parts) != 1 || tpi.hasUnit || !tpi.num.integer {
		return Constraint{}, false
	}
	q := from.Dims.Parts[0]
	fr := q.Num.Only
	if fr == nil || q.Unit != "" || q.Mark != "" {
		return Constraint{}, false
	}
	size := fr.Vulgar
	if size == "" {
		size = fr.Num + "/" + fr.Den
	}
	d, err := spec.UnifiedThreadSize(size, int(tpi.num.value))
	if tpi.num.value == 0 {
		err = errZeroTPI
	}
	if err != nil {
		if p.category == "hardware" {
			p.errorf(start, end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		}
		return Constraint{}, false
	}
	return specConstraint(start, end, d, "unified inch thread"), true
}

// numbered tags what follows "#": a numbered unified thread ("#10-24",
// "#10-24 x 3/4"), or a number size ("#8 x 1-1/2" wood screws, "#10"
// envelopes) with any dimensions after it. It returns the extra units
// used, or -1 when it reads nothing.
func (p *tagger) numbered(start int, v *unit) int {
	val := v.item.Value
	if val == nil || val.Post != "" {
		return -1
	}
	a, ok := p.readSingle(val.From)
	if !ok || a.price || !a.parts[0].num.integer || a.parts[0].hasUnit {
		return -1
	}
	if val.To != nil {
		b, ok := p.readSingle(val.To)
		if !ok || b.price || !b.parts[0].num.integer || b.parts[0].hasUnit || len(a.parts) != 1 {
			return -1
		}
		end := b.parts[0].end
		if len(b.parts) == 1 {
			end = v.end
		}
		if strings.ContainsAny(p.q[start:end], " \t") {
			return -1
		}
		d, err := spec.UnifiedThreadSize("#"+a.parts[0].num.decimal, int(b.parts[0].num.value))
		if b.parts[0].num.value == 0 {
			err = errZeroTPI
		}
		if err != nil {
			// Badly written, and read as nothing else: "#10-7" is no
			// range of lengths. A length after it is still read.
			p.errorf(start, end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
			p.lengths(b, 1, v.end, p.lengthSlot())
			return 0
		}
		p.add(specConstraint(start, end, d, "unified inch thread"))
		p.lengths(b, 1, v.end, p.lengthSlot())
		return 0
	}
	end := a.parts[0].end
	if len(a.parts) == 1 {
		end = v.end
	}
	p.add(Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: "number", Value: "#" + a.parts[0].num.decimal},
		Evidence: "a number size after #"})
	p.lengths(a, 1, v.end, p.lengthSlot())
	return 0
}

// quoted tags a quoted phrase: one hard constraint.
func (p *tagger) quoted(u *unit) {
	q := u.item.Quoted
	innerStart := q.Pos.Offset + firstRuneLen(p.q[q.Pos.Offset:])
	innerEnd := u.end
	if q.Closed {
		innerEnd = u.end - lastRuneLen(p.q[:u.end])
	} else {
		p.errorf(q.Pos.Offset, q.Pos.Offset+firstRuneLen(p.q[q.Pos.Offset:]), "quotation mark is never closed; the phrase runs to the end")
	}
	inner := strings.TrimSpace(p.q[innerStart:innerEnd])
	c := Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Strictness: Hard, Evidence: "quoted phrase"}
	if inner == "" {
		c.Kind, c.Strictness, c.Evidence = KindFiller, Filler, "empty quotation"
		p.add(c)
		return
	}
	ws := lexicon.Words(inner)
	keys := make([]string, len(ws))
	for i, w := range ws {
		keys[i] = p.lex.Key(lexicon.Normalise(w))
	}
	if n, es := p.lex.Match(keys); n == len(keys) {
		if e := pick(es); e != nil && e.Kind != lexicon.Filler {
			c.Kind = kindOf[e.Kind]
			c.Name = e.Name
			switch e.Kind {
			case lexicon.ProductType:
				c.Category, c.Parent = e.Category, e.Parent
			case lexicon.Colour:
				c.Colour = colourOf(e)
			}
			c.Evidence = fmt.Sprintf("quoted phrase; %s lexicon", e.Kind)
		}
	}
	if c.Kind == KindKeyword {
		c.Name = strings.Join(strings.Fields(lexicon.Normalise(inner)), " ")
		p.res.Unrecognised = append(p.res.Unrecognised, c.Name)
	}
	p.add(c)
}

func firstRuneLen(s string) int {
	for i := range s {
		if i > 0 {
			return i
		}
	}
	return len(s)
}

func lastRuneLen(s string) int {
	for i := len(s) - 1; i >= 0; i-- {
		if s[i] < 0x80 || s[i] >= 0xc0 {
			return len(s) - i
		}
	}
	return 0
}

// amountText rounds a decimal amount to the currency's minor unit, with
// decimal arithmetic: "90" in USD is "90.00", "3000" in JPY is "3000".
func amountText(dec, code string) (string, error) {
	if !currency.IsValid(code) {
		return "", fmt.Errorf("%s is not an ISO 4217 currency code", code)
	}
	a, err := currency.NewAmount(dec, code)
	if err != nil {
		var ie currency.InvalidNumberError
		if errors.As(err, &ie) {
			return "", fmt.Errorf("price %s is not a decimal amount", dec)
		}
		return "", err
	}
	return a.Round().Number(), nil
}

// constructionLetter maps the letters written between aspect and rim to
// the construction code: "zr" (a speed-rated radial) and "rf" (run-flat)
// are radials.
func constructionLetter(s string) byte {
	switch s {
	case "zr", "rf":
		return 'R'
	}
	return strings.ToUpper(s)[0]
}
