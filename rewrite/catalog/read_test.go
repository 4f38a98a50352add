package catalog

import (
	"errors"
	"strings"
	"testing"
)

// A line of the wrong shape says what the catalog author should write,
// in JSON's words rather than Go's types, after its line and field.
func TestReadErrorsSayWhatToWrite(t *testing.T) {
	for _, tc := range []struct {
		line, field, msg string
	}{
		{`{"id": "a", "title": "x", "price": 59}`, "price", `want an object like {"amount": "59.00", "currency": "USD"}, not a number`},
		{`{"id": "a", "title": "x", "price": {"amount": 59, "currency": "USD"}}`, "price", `want an object like {"amount": "59.00", "currency": "USD"}, not an object whose amount is a number`},
		{`[1, 2]`, "", `want a JSON object for a product, like {"id": "SKU-1", "title": "Linen shirt"}, not an array`},
		{`"a shirt"`, "", "want a JSON object for a product, like {\"id\": \"SKU-1\", \"title\": \"Linen shirt\"}, not a string"},
		{`not json`, "", "not a JSON object: invalid character"},
		{`{"id": 5, "title": "x"}`, "id", "want a string, not a number"},
		{`{"id": "a", "title": "x", "color": ["red"]}`, "color", "want a string, not an array"},
		{`{"id": "a", "title": "x", "sizes": "m"}`, "sizes", `want an array of strings, like ["S", "M", "10"], not a string`},
		{`{"id": "a", "title": "x", "sizes": ["m", 10]}`, "sizes", `want an array of strings, like ["S", "M", "10"], not an array holding a number`},
		{`{"id": "a", "title": "x", "measures": {"width": 74}}`, "measures", `want an object of measures written with their units, like {"width": "74 cm"}, not an object holding a number`},
		{`{"id": "a", "title": "x", "colour_lab": "53 80 67"}`, "colour_lab", "want an array of three numbers [L, a, b], like [53.2, 80.1, 67.2], not a string"},
		{`{"id": "a", "title": "x", "colour_lab": [53, 80]}`, "colour_lab", "want an array of three numbers [L, a, b], like [53.2, 80.1, 67.2], not 2 numbers"},
		{`{"id": "a", "title": "x", "colour_lab": [53, 80, 67, 1]}`, "colour_lab", "want an array of three numbers [L, a, b], like [53.2, 80.1, 67.2], not 4 numbers"},
		{`{"id": "a", "title": "x", "colour_lab": [53, "80", 67]}`, "colour_lab", "want an array of three numbers [L, a, b], like [53.2, 80.1, 67.2], not an array holding a string"},
		{`{"id": "a", "title": "x", "in_stock": "yes"}`, "in_stock", "want true or false, not a string"},
	} {
		_, err := NewReader(strings.NewReader(tc.line), nil).Next()
		var le *LineError
		if !errors.As(err, &le) || le.Line != 1 || le.Field != tc.field || !strings.HasPrefix(le.Msg, tc.msg) {
			t.Errorf("%s: got %v, want line 1 field %q saying %q", tc.line, err, tc.field, tc.msg)
			continue
		}
		for _, goWord := range []string{"Go value", "catalog.", "json.", "map[", "[]string", "float64", "bool"} {
			if strings.Contains(le.Msg, goWord) {
				t.Errorf("%s: %q speaks of Go's types (%s)", tc.line, le.Msg, goWord)
			}
		}
	}
	// The colour vocabulary reads lines alike.
	for _, tc := range []struct{ line, field, msg string }{
		{`[1, 2]`, "", "want a JSON object for a product"},
		{`{"id": "a", "title": 7}`, "title", "want a string, not a number"},
	} {
		_, err := ReadColours(strings.NewReader(tc.line), nil)
		var le *LineError
		if !errors.As(err, &le) || le.Field != tc.field || !strings.HasPrefix(le.Msg, tc.msg) {
			t.Errorf("ReadColours %s: got %v, want field %q saying %q", tc.line, err, tc.field, tc.msg)
		}
	}
}
