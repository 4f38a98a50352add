package svgchart

import (
	"encoding/xml"
	"io"
	"math"
	"strings"
	"testing"
)

// wellFormed checks that s parses as XML, as inline SVG must.
func wellFormed(t *testing.T, s string) {
	t.Helper()
	d := xml.NewDecoder(strings.NewReader(s))
	for {
		_, err := d.Token()
		if err == io.EOF {
			return
		}
		if err != nil {
			t.Fatalf("not well-formed XML: %v\n%s", err, s)
		}
	}
}

func TestHBars(t *testing.T) {
	s := string(HBars("a <b> & c", []Bar{{"one", 2, "2"}, {"two", 1, "1"}, {"none", 0, "0"}}))
	wellFormed(t, s)
	// Bars are scaled to the largest: 640-220-90 = 330 px for the
	// largest, half that for half the value.
	for _, want := range []string{`width="330.0"`, `width="165.0"`, `width="0.0"`, "a &lt;b&gt; &amp; c"} {
		if !strings.Contains(s, want) {
			t.Errorf("chart lacks %q:\n%s", want, s)
		}
	}
}

func TestColumns(t *testing.T) {
	nan := math.NaN()
	s := string(Columns("ratio", "ΔE00", []Point{{"0", 1, 0.9, 1.1}, {"1", nan, nan, nan}, {"2", 0.5, nan, nan}}, 0.8, "keep share"))
	wellFormed(t, s)
	if got := strings.Count(s, "<rect"); got != 2 {
		t.Errorf("%d bars, want 2 (the NaN column draws none)", got)
	}
	if got := strings.Count(s, `class="w"`); got != 1 {
		t.Errorf("%d whiskers, want 1", got)
	}
	if !strings.Contains(s, `class="r"`) || !strings.Contains(s, "keep share") {
		t.Errorf("no rule at the keep share:\n%s", s)
	}
}
