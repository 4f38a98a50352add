package reference

import (
	"strings"
	"testing"
)

// Every table must name its source in its first line, and have rows.
func TestEveryTableNamesItsSource(t *testing.T) {
	for _, name := range []string{
		"awg_wire_diameters.tsv", "ciede2000_sharma2005.tsv", "css_named_colours.tsv",
		"iec60086_batteries.tsv", "iso216_paper_sizes.tsv", "lumber_ps20_sizes.tsv",
		"threads_metric_iso261_262.tsv", "threads_unified_asme_b1_1.tsv",
		"tyre_size_examples.tsv", "unit_conversions.tsv",
	} {
		tb, err := Read(name)
		if err != nil {
			t.Fatal(err)
		}
		if len(tb.Source) == 0 || !strings.HasPrefix(tb.Source[0], "source:") {
			t.Errorf("%s: first line is not a source line", name)
		}
		if len(tb.Rows) == 0 {
			t.Errorf("%s: no rows", name)
		}
	}
}

func TestFloat(t *testing.T) {
	r := Row{"a": "25.4", "b": "x"}
	if v, err := r.Float("a"); err != nil || v != 25.4 {
		t.Errorf("Float(a) = %v, %v", v, err)
	}
	if _, err := r.Float("b"); err == nil {
		t.Error("Float(b) gave no error for a non-number")
	}
}

func TestReadMissing(t *testing.T) {
	if _, err := Read("no_such_table.tsv"); err == nil {
		t.Error("Read of a missing table gave no error")
	}
}
