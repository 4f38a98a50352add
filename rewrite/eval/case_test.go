package eval

import (
	"testing"

	"github.com/whittle-search/whittle/parser"
)

func TestSatisfies(t *testing.T) {
	ps := tiny(t)
	for _, tc := range []struct {
		name, reason, id string
		attr             Attr
		want             bool
	}{
		{name: "size carried", id: "SK-2", attr: Attr{Kind: parser.KindSize, Value: "xl"}, want: true,
			reason: "SK-2 comes in l and xl"},
		{name: "size not carried", id: "SK-1", attr: Attr{Kind: parser.KindSize, Value: "xl"}, want: false,
			reason: "SK-1 comes in s and m only"},
		{name: "size case", id: "SK-2", attr: Attr{Kind: parser.KindSize, Value: "XL"}, want: true,
			reason: "a size is the same in either case"},
		{name: "type", id: "LN-1", attr: Attr{Kind: parser.KindProductType, Value: "prime lens"}, want: true,
			reason: "LN-1 is a prime lens"},
		{name: "type is not its parent", id: "LN-1", attr: Attr{Kind: parser.KindProductType, Value: "lens"}, want: false,
			reason: "the type is compared by name: a prime lens is not listed as a lens"},
		{name: "colour by the shop's name", id: "SK-2", attr: Attr{Kind: parser.KindColour, Value: "morning fog"}, want: true,
			reason: "SK-2's colour is named morning fog"},
		{name: "a near colour is not the colour", id: "SK-2", attr: Attr{Kind: parser.KindColour, Value: "dusty blue"}, want: false,
			reason: "the shop does not call it dusty blue, however near"},
		{name: "compatible model", id: "LN-1", attr: Attr{Kind: parser.KindCompatibility, Value: "ZK-3"}, want: true,
			reason: "LN-1 fits zk-3; codes ignore case"},
		{name: "other model", id: "LN-1", attr: Attr{Kind: parser.KindCompatibility, Value: "zk-5"}, want: false,
			reason: "LN-1 fits zk-3 only"},
		{name: "measure in its unit", id: "LN-1", attr: Attr{Kind: parser.KindMeasure, Dimension: "focal_length", Value: "50 mm"}, want: true,
			reason: "LN-1 is 50 mm"},
		{name: "measure in another unit", id: "RG-1", attr: Attr{Kind: parser.KindMeasure, Dimension: "length", Value: "96 in"}, want: true,
			reason: "8 ft = 96 in: 1 ft = 12 in exactly (NIST SP 811, appendix B)"},
		{name: "measure of another dimension", id: "RG-1", attr: Attr{Kind: parser.KindMeasure, Dimension: "width", Value: "8 ft"}, want: false,
			reason: "the rug is 5 ft wide; 8 ft is its length"},
		{name: "measure slightly off", id: "LN-1", attr: Attr{Kind: parser.KindMeasure, Dimension: "focal_length", Value: "52 mm"}, want: false,
			reason: "52 mm is not 50 mm"},
		{name: "pattern", id: "RG-1", attr: Attr{Kind: parser.KindPattern, Value: "persian"}, want: true,
			reason: "RG-1 is persian"},
		{name: "material", id: "SW-1", attr: Attr{Kind: parser.KindMaterial, Value: "wool"}, want: true,
			reason: "SW-1 is wool"},
		{name: "audience", id: "SW-1", attr: Attr{Kind: parser.KindAudience, Value: "women"}, want: false,
			reason: "SW-1 names no audience"},
		{name: "keyword in the title", id: "SW-1", attr: Attr{Kind: parser.KindKeyword, Value: "quillet"}, want: true,
			reason: "Quillet is a word of SW-1's title"},
		{name: "keyword nowhere", id: "SW-1", attr: Attr{Kind: parser.KindKeyword, Value: "sturdy"}, want: false,
			reason: "no word of SW-1 is sturdy"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := Satisfies(product(t, ps, tc.id), tc.attr); got != tc.want {
				t.Errorf("%s: Satisfies(%s, %+v) = %v, want %v", tc.reason, tc.id, tc.attr, got, tc.want)
			}
		})
	}
}

// A spec designation is the same in any case and spacing.
func TestSameCode(t *testing.T) {
	for _, tc := range []struct {
		name, a, b, reason string
		want               bool
	}{
		{name: "case", a: "14 AWG", b: "14 awg", want: true, reason: "AWG is written either way (ASTM B258 writes AWG)"},
		{name: "space", a: "14awg", b: "14 awg", want: true, reason: "a shopper may leave the space out"},
		{name: "other gauge", a: "12 awg", b: "14 awg", want: false, reason: "12 and 14 AWG are different wires"},
		{name: "thread", a: "M8x1.25", b: "m8x1.25", want: true, reason: "ISO 261 writes M8x1.25; the index lower-cases it"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := sameCode(tc.a, tc.b); got != tc.want {
				t.Errorf("%s: sameCode(%q, %q) = %v, want %v", tc.reason, tc.a, tc.b, got, tc.want)
			}
		})
	}
}

// baseAmount reads catalog measures into base units, by the factors of
// NIST SP 811 appendix B: 1 in = 25.4 mm, 1 ft = 304.8 mm, 1 US fl oz =
// 29.5735295625 mL, 1 lb = 453.59237 g (all exact).
func TestBaseAmount(t *testing.T) {
	for _, tc := range []struct {
		name, in, reason string
		want             float64
		ok               bool
	}{
		{name: "mm", in: "85 mm", want: 85, ok: true, reason: "the millimetre is the base unit of length"},
		{name: "inch", in: "12 in", want: 304.8, ok: true, reason: "12 × 25.4 mm"},
		{name: "foot", in: "8 ft", want: 2438.4, ok: true, reason: "8 × 304.8 mm"},
		{name: "fluid ounce", in: "12 fl oz", want: 354.88235475, ok: true, reason: "12 × 29.5735295625 mL, US customary"},
		{name: "pound", in: "4 lb", want: 1814.36948, ok: true, reason: "4 × 453.59237 g"},
		{name: "range", in: "18-55 mm", ok: false, reason: "a zoom lens's range is no single amount"},
		{name: "no unit", in: "85", ok: false, reason: "a catalog measure has its unit"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, ok := baseAmount(tc.in)
			if ok != tc.ok || ok && (got-tc.want > 1e-6 || tc.want-got > 1e-6) {
				t.Errorf("%s: baseAmount(%q) = %v, %v; want %v, %v", tc.reason, tc.in, got, ok, tc.want, tc.ok)
			}
		})
	}
}
