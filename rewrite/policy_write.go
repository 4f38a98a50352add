package rewrite

import (
	"fmt"
	"io"
	"maps"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/parser"
)

// WriteTOML writes p in whittle's policy layout: [defaults], each
// [category.NAME] and [product_type."NAME"] in name order, then
// [signals]. ParsePolicy reads back the same settings. Comments and
// warnings are not written; a single-request Tuning is not part of a
// policy file and is left out.
func (p *Policy) WriteTOML(w io.Writer) error {
	pw := &policyWriter{w: w}
	pw.level("defaults", p.Defaults)
	for _, c := range slices.Sorted(maps.Keys(p.Categories)) {
		pw.level("category."+c, p.Categories[c])
	}
	for _, t := range slices.Sorted(maps.Keys(p.ProductTypes)) {
		pw.level("product_type."+strconv.Quote(t), p.ProductTypes[t])
	}
	pw.signals(p.signals)
	return pw.err
}

type policyWriter struct {
	w       io.Writer
	err     error
	started bool
}

func (pw *policyWriter) printf(format string, args ...any) {
	if pw.err == nil {
		_, pw.err = fmt.Fprintf(pw.w, format, args...)
	}
}

// table starts a table, with a blank line before every one but the first.
func (pw *policyWriter) table(name string) {
	if pw.started {
		pw.printf("\n")
	}
	pw.started = true
	pw.printf("[%s]\n", name)
}

func number(v float64) string {
	s := strconv.FormatFloat(v, 'f', -1, 64)
	if !strings.ContainsAny(s, ".eE") {
		s += ".0"
	}
	return s
}

func (pw *policyWriter) level(name string, s Settings) {
	if s.MinResults != nil || s.ColourTolerance != nil || s.MeasureTolerance != nil || s.PriceStretch != nil {
		pw.table(name)
		if s.MinResults != nil {
			pw.printf("min_results = %d\n", *s.MinResults)
		}
		for _, f := range []struct {
			key string
			v   *float64
		}{{"colour_tolerance", s.ColourTolerance}, {"measure_tolerance", s.MeasureTolerance}, {"price_stretch", s.PriceStretch}} {
			if f.v != nil {
				pw.printf("%s = %s\n", f.key, number(*f.v))
			}
		}
	}
	if len(s.Strictness) > 0 {
		pw.table(name + ".strictness")
		for _, k := range parser.AllKinds() {
			if v, ok := s.Strictness[k]; ok {
				pw.printf("%s = %q\n", k, v)
			}
		}
	}
	if len(s.Dimensions) > 0 {
		pw.table(name + ".dimensions")
		for _, d := range slices.Sorted(maps.Keys(s.Dimensions)) {
			pw.printf("%s = %q\n", d, s.Dimensions[d])
		}
	}
	if len(s.StandardSizes) > 0 {
		pw.table(name + ".standard_sizes")
		for _, d := range slices.Sorted(maps.Keys(s.StandardSizes)) {
			var qs []string
			for _, v := range s.StandardSizes[d] {
				qs = append(qs, strconv.Quote(v))
			}
			pw.printf("%s = [%s]\n", d, strings.Join(qs, ", "))
		}
	}
}

func (pw *policyWriter) signals(s SignalSettings) {
	if s.PositionBias != nil || s.EstimateBias != nil || s.JoinWindow != nil || s.MinSearches != nil || s.KeepShare != nil {
		pw.table("signals")
		if s.PositionBias != nil {
			pw.printf("position_bias = %s\n", number(*s.PositionBias))
		}
		if s.EstimateBias != nil {
			pw.printf("estimate_position_bias = %t\n", *s.EstimateBias)
		}
		if s.JoinWindow != nil {
			pw.printf("join_window = %q\n", s.JoinWindow.String())
		}
		if s.MinSearches != nil {
			pw.printf("min_searches = %d\n", *s.MinSearches)
		}
		if s.KeepShare != nil {
			pw.printf("keep_share = %s\n", number(*s.KeepShare))
		}
	}
	fields := s.Weights.fields()
	if slices.ContainsFunc(fields, func(f weightField) bool { return *f.v != nil }) {
		pw.table("signals.weights")
		for _, f := range fields {
			if *f.v != nil {
				pw.printf("%s = %s\n", f.name, number(**f.v))
			}
		}
	}
}
