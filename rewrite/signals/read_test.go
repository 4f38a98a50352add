package signals

import (
	"bytes"
	"errors"
	"io"
	"strings"
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite/catalog"
)

// at is a time on the invented test day.
func at(hms string) time.Time {
	t, err := time.Parse(time.RFC3339, "2025-03-14T"+hms+"Z")
	if err != nil {
		panic(err)
	}
	return t
}

// read collects what Read yields for log.
func read(t *testing.T, log, file string) ([]Event, []error) {
	t.Helper()
	var evs []Event
	var errs []error
	for e, err := range Read(strings.NewReader(log), file) {
		if err != nil {
			errs = append(errs, err)
			continue
		}
		evs = append(evs, e)
	}
	return evs, errs
}

// The search and click every bad line of TestReadBadLines sits between.
const (
	goodSearch = `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"red scarf","shown":["SC-1","SC-2"]}`
	goodClick  = `{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}`
)

func TestReadGood(t *testing.T) {
	for _, tc := range []struct {
		name, line string
		want       Event
		reason     string
	}{
		{"search", goodSearch,
			Event{Type: Search, Session: "s1", Time: at("09:00:00"), Query: "red scarf", Shown: []string{"SC-1", "SC-2"}},
			"the least a search that showed something has"},
		{"search that found nothing", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"red scarf"}`,
			Event{Type: Search, Session: "s1", Time: at("09:00:00"), Query: "red scarf"},
			"shown is left out when nothing was found"},
		{"empty lists", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":[],"relaxations":[]}`,
			Event{Type: Search, Session: "s1", Time: at("09:00:00"), Query: "q"},
			"an empty list reads as none, as the writer leaves it out"},
		{"every search field", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00.25+01:00","query":"mustard rain jacket","category":"apparel",` +
			`"relaxations":[{"op":"widen","kind":"colour","text":"mustard"}],"shown":["RJ-1","RJ-2"],` +
			`"explored":{"rank":2,"relaxations":[{"op":"drop","kind":"product_type"}]},"shuffled":true}`,
			Event{Type: Search, Session: "s1", Time: time.Date(2025, 3, 14, 8, 0, 0, 250e6, time.UTC), Query: "mustard rain jacket", Category: "apparel",
				Relaxations: []Relaxed{{Op: "widen", Kind: "colour", Text: "mustard"}}, Shown: []string{"RJ-1", "RJ-2"},
				Explored: &Explored{Rank: 2, Relaxations: []Relaxed{{Op: "drop", Kind: "product_type"}}}, Shuffled: true},
			"an offset and a fraction of a second are RFC 3339 (section 5.6); 09:00:00.25+01:00 is 08:00:00.25 UTC"},
		{"click", goodClick, Event{Type: Click, Session: "s1", Time: at("09:00:10"), Product: "SC-2"}, "an interaction names its product"},
		{"purchase, fields in another order", `{"product":"SC-2","time":"2025-03-14T09:05:00Z","session":"s1","type":"purchase"}`,
			Event{Type: Purchase, Session: "s1", Time: at("09:05:00"), Product: "SC-2"}, "a JSON object's members have no order (RFC 8259, section 4)"},
		{"escapes", `{"type":"add_to_cart","session":"s\u0031","time":"2025-03-14T09:05:00Z","product":"SC-\u00e9\"1"}`,
			Event{Type: AddToCart, Session: "s1", Time: at("09:05:00"), Product: "SC-é\"1"}, "JSON escapes are read (RFC 8259, section 7)"},
		{"null search fields on an impression", `{"type":"impression","session":"s1","time":"2025-03-14T09:05:00Z","product":"SC-2","query":null,"shown":null}`,
			Event{Type: Impression, Session: "s1", Time: at("09:05:00"), Product: "SC-2"}, "null counts as left out"},
		{"spaces around", "  \t" + goodClick + " \r", Event{Type: Click, Session: "s1", Time: at("09:00:10"), Product: "SC-2"}, "white space around a line, and a CR of a CRLF line break, are not part of it"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			evs, errs := read(t, tc.line, "good.jsonl")
			if len(errs) > 0 {
				t.Fatalf("%v (%s)", errs, tc.reason)
			}
			tc.want.File, tc.want.Line = "good.jsonl", 1
			if diff := cmp.Diff([]Event{tc.want}, evs); diff != "" {
				t.Errorf("(-want +got) (%s):\n%s", tc.reason, diff)
			}
		})
	}
}

func TestReadBadLines(t *testing.T) {
	for _, tc := range []struct {
		name, line, field, msg, reason string
	}{
		{"not JSON", `type=search`, "", "not a JSON object", "a line is a JSON object"},
		{"a list", `["search"]`, "", "not a JSON object", "a line is a JSON object"},
		{"cut short", `{"type":"search","session":"s1"`, "", "not a JSON object: unexpected EOF", "the object must end on its line"},
		{"two objects", goodClick + goodClick, "", "text after the end of the object", "one event a line"},
		{"unknown field", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2","user":"u1"}`, "",
			`unknown field "user"; an event has type, session, time, query, category, relaxations, shown, explored, shuffled and product`, "strict: a field of no event is refused, naming those there are"},
		{"field in capitals", `{"TYPE":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "", `unknown field "TYPE"`, "names are matched as written"},
		{"field twice", `{"type":"click","type":"search","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "type", "given twice",
			"RFC 8259 (section 4) says names SHOULD be unique; a line that gives one twice is ambiguous"},
		{"not UTF-8", "{\"type\":\"click\",\"session\":\"s\xff\",\"time\":\"2025-03-14T09:00:10Z\",\"product\":\"SC-2\"}", "session", "invalid UTF-8",
			"JSON text exchanged between systems is UTF-8 (RFC 8259, section 8.1)"},
		{"no type", `{"session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "type", "missing", "every event has a type"},
		{"unknown type", `{"type":"view","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "type",
			`"view" is not an event type (search, impression, click, add_to_cart or purchase)`, "the five types only"},
		{"type not a string", `{"type":3,"session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "type", "want a string, not a JSON number", "a type is a string"},
		{"no session", `{"type":"click","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "session", "missing", "events are grouped by session"},
		{"blank session", `{"type":"click","session":"  ","time":"2025-03-14T09:00:10Z","product":"SC-2"}`, "session", "blank", "a blank id groups nothing"},
		{"no time", `{"type":"click","session":"s1","product":"SC-2"}`, "time", "missing", "events are joined by time"},
		{"time without offset", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10","product":"SC-2"}`, "time", "not an RFC 3339 time",
			"RFC 3339 (section 5.6) requires the offset (Z or ±hh:mm)"},
		{"time with a space", `{"type":"click","session":"s1","time":"2025-03-14 09:00:10Z","product":"SC-2"}`, "time", "not an RFC 3339 time",
			"RFC 3339's grammar (section 5.6) has T between date and time; the note allowing a space is not the grammar"},
		{"hour 24 offset", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10+24:00","product":"SC-2"}`, "time", "offset from UTC by a day or more",
			"time-numoffset's hour is time-hour, 00 to 23 (RFC 3339, section 5.6)"},
		{"the zero time", `{"type":"click","session":"s1","time":"0001-01-01T00:00:00Z","product":"SC-2"}`, "time", "the zero time", "the zero time is an unset time, not when anything happened"},
		{"time a number", `{"type":"click","session":"s1","time":1741942810,"product":"SC-2"}`, "time", "want a string, not a JSON number", "a time is an RFC 3339 string, not seconds"},
		{"search without query", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","shown":["SC-1"]}`, "query", "missing", "a search has a query"},
		{"blank query", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":" "}`, "query", "blank", "a blank query is no search"},
		{"unknown category", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","category":"shoes"}`, "category",
			`unknown category "shoes"`, "a category is one of the lexicon's, as everywhere else"},
		{"search with product", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","product":"SC-1"}`, "product",
			"belongs to interactions", "a search lists its products in shown"},
		{"unknown op", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","relaxations":[{"op":"widen","kind":"colour"},{"op":"loosen","kind":"colour"}]}`,
			"relaxations", `relaxation 2: op "loosen" is not widen, replace or drop`, "whittle's three operators only"},
		{"unknown kind", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","relaxations":[{"op":"drop","kind":"hue"}]}`,
			"relaxations", `relaxation 1: kind "hue" is not a kind whittle reads`, "the kinds of parser.AllKinds() only"},
		{"unknown relaxation field", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","relaxations":[{"op":"drop","kind":"colour","cost":2}]}`,
			"relaxations", `relaxation 1: unknown field "cost"; a relaxation has op, kind and text`, "strict in nested objects too"},
		{"relaxation op not a string", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","relaxations":[{"op":1,"kind":"colour"}]}`,
			"relaxations", "relaxation 1: op: want a string, not a JSON number", "the relaxation and its field are named"},
		{"shown not a list", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":"SC-1"}`, "shown", "want a list, not a JSON string", "shown is a list"},
		{"shown id a number", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1",2]}`, "shown", "product 2: want a string, not a JSON number",
			"the product is named by its place"},
		{"blank shown id", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1",""]}`, "shown", "product 2 is a blank id", "a blank id names no product"},
		{"shown twice", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1","SC-2","SC-1"]}`, "shown",
			`"SC-1" is shown twice, at 1 and 3`, "a product has one rank on a page"},
		{"explored rank past shown", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1"],"explored":{"rank":2,"relaxations":[{"op":"drop","kind":"colour"}]}}`,
			"explored.rank", "2 is not a rank among the 1 products shown", "the explored product is one of those shown"},
		{"explored rank 0", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1"],"explored":{"rank":0,"relaxations":[{"op":"drop","kind":"colour"}]}}`,
			"explored.rank", "0 is not a rank", "ranks count from 1"},
		{"explored rank a fraction", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1"],"explored":{"rank":1.5}}`,
			"explored.rank", "want a whole number, not 1.5", "a rank is whole"},
		{"explored without relaxations", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1"],"explored":{"rank":1}}`,
			"explored.relaxations", "missing or empty", "an explored product comes from a relaxed plan"},
		{"explored unknown field", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1"],"explored":{"rank":1,"plan":"x"}}`,
			"explored", `unknown field "plan"; explored has rank and relaxations`, "strict in explored"},
		{"shuffled a string", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shuffled":"yes"}`, "shuffled", "want true or false, not a JSON string", "shuffled is a boolean"},
		{"click without product", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z"}`, "product", "missing", "an interaction names its product"},
		{"click with query", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2","query":"red scarf"}`, "query", "belongs to search events, not to click",
			"an interaction carries no search fields"},
		{"click with empty shown", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2","shown":[]}`, "shown", "belongs to search events",
			"a search field is refused on an interaction even when empty"},
		{"purchase with shuffled false", `{"type":"purchase","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2","shuffled":false}`, "shuffled", "belongs to search events",
			"even when false"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			log := goodSearch + "\n" + tc.line + "\n" + goodClick + "\n"
			evs, errs := read(t, log, "day1.jsonl")
			if len(errs) != 1 {
				t.Fatalf("errors %v, want one (%s)", errs, tc.reason)
			}
			var le *LineError
			if !errors.As(errs[0], &le) {
				t.Fatalf("%v (%T), want a *LineError", errs[0], errs[0])
			}
			if le.File != "day1.jsonl" || le.Line != 2 || le.Field != tc.field || !strings.Contains(le.Msg, tc.msg) {
				t.Errorf("got file %q line %d field %q msg %q, want day1.jsonl line 2 field %q and a message with %q (%s)", le.File, le.Line, le.Field, le.Msg, tc.field, tc.msg, tc.reason)
			}
			var cle *catalog.LineError
			if !errors.As(errs[0], &cle) || cle.Line != 2 {
				t.Errorf("errors.As finds no catalog.LineError on line 2 in %v", errs[0])
			}
			if !strings.HasPrefix(errs[0].Error(), "day1.jsonl: line 2: ") {
				t.Errorf("error renders as %q, want it to begin with the file and line", errs[0])
			}
			if len(evs) != 2 || evs[1].Line != 3 {
				t.Errorf("events %+v, want the search and click around the bad line: reading goes on after it", evs)
			}
		})
	}
}

func TestReadBlankLinesAndNumbers(t *testing.T) {
	log := "\n" + goodSearch + "\n   \n\t\r\n" + goodClick + "\n\n"
	evs, errs := read(t, log, "")
	if len(errs) > 0 {
		t.Fatal(errs)
	}
	var lines []int
	for _, e := range evs {
		lines = append(lines, e.Line)
	}
	// Lines 1, 3, 4 and 6 are blank; they are skipped but counted.
	if diff := cmp.Diff([]int{2, 5}, lines); diff != "" {
		t.Errorf("lines (-want +got):\n%s", diff)
	}
}

func TestReadNoFinalLineBreak(t *testing.T) {
	evs, errs := read(t, goodSearch+"\n"+goodClick, "")
	if len(errs) > 0 || len(evs) != 2 || evs[1].Line != 2 {
		t.Errorf("got %+v %v, want the last line read without its line break", evs, errs)
	}
}

func TestReadEmpty(t *testing.T) {
	for _, tc := range []struct{ name, log, reason string }{
		{"nothing", "", "an empty file has no events"},
		{"blank lines", "\n\n  \n", "blank lines only"},
	} {
		evs, errs := read(t, tc.log, "")
		if len(evs) > 0 || len(errs) > 0 {
			t.Errorf("%s: got %v %v, want nothing (%s)", tc.name, evs, errs, tc.reason)
		}
	}
}

func TestReadLongLine(t *testing.T) {
	long := `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"` + strings.Repeat("a", MaxLine) + `"}`
	log := goodSearch + "\n" + long + "\n" + goodClick + "\n"
	evs, errs := read(t, log, "big.jsonl")
	if len(errs) != 1 || errs[0].Error() != "big.jsonl: line 2: longer than 1048576 bytes" {
		t.Fatalf("errors %v, want one for line 2", errs)
	}
	if len(evs) != 2 || evs[1].Line != 3 {
		t.Errorf("events %+v, want lines 1 and 3: reading goes on past the long line", evs)
	}
	// A line of exactly MaxLine bytes is read.
	q := strings.Repeat("b", MaxLine-len(`{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":""}`))
	exact := `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"` + q + `"}`
	if len(exact) != MaxLine {
		t.Fatalf("test line is %d bytes", len(exact))
	}
	evs, errs = read(t, exact+"\n"+goodClick, "")
	if len(errs) > 0 || len(evs) != 2 || evs[0].Query != q {
		t.Errorf("a line of MaxLine bytes: got %d events, errors %v", len(evs), errs)
	}
}

// failing reads its text, then fails.
type failing struct {
	r   io.Reader
	err error
}

func (f *failing) Read(p []byte) (int, error) {
	n, err := f.r.Read(p)
	if err == io.EOF {
		return n, f.err
	}
	return n, err
}

func TestReadIOError(t *testing.T) {
	disk := errors.New("disk gone")
	var got []error
	n := 0
	for _, err := range Read(&failing{strings.NewReader(goodSearch + "\n" + goodClick + "\n"), disk}, "x.jsonl") {
		if err != nil {
			got = append(got, err)
		} else {
			n++
		}
	}
	if n != 2 || len(got) != 1 || !errors.Is(got[0], disk) {
		t.Errorf("got %d events and errors %v, want 2 and the reader's error, last", n, got)
	}
}

func TestReadStopsWhenAsked(t *testing.T) {
	n := 0
	for range Read(strings.NewReader(goodSearch+"\n"+goodClick+"\n"), "") {
		n++
		break
	}
	if n != 1 {
		t.Errorf("read %d after a break", n)
	}
}

func TestWriteRoundTrip(t *testing.T) {
	evs, errs := read(t, strings.Join([]string{goodSearch, goodClick,
		`{"type":"search","session":"s2","time":"2025-03-14T09:00:00.123456789-05:30","query":"oak desk 120 cm","category":"furniture",` +
			`"relaxations":[{"op":"replace","kind":"material","text":"oak"}],"shown":["D-1","D-2","D-3"],` +
			`"explored":{"rank":3,"relaxations":[{"op":"drop","kind":"measure","text":"120 cm"}]},"shuffled":true}`,
		`{"type":"impression","session":"s2","time":"2025-03-14T14:31:00Z","product":"D-3 <&>"}`,
	}, "\n"), "in.jsonl")
	if len(errs) > 0 {
		t.Fatal(errs)
	}
	var buf bytes.Buffer
	w := NewWriter(&buf)
	for _, e := range evs {
		if err := w.Write(e); err != nil {
			t.Fatal(err)
		}
	}
	back, errs := read(t, buf.String(), "in.jsonl")
	if len(errs) > 0 {
		t.Fatalf("%v in\n%s", errs, buf.String())
	}
	if diff := cmp.Diff(evs, back); diff != "" {
		t.Errorf("read back (-wrote +read):\n%s", diff)
	}
	if n := strings.Count(buf.String(), "\n"); n != len(evs) {
		t.Errorf("%d lines for %d events", n, len(evs))
	}
}

func TestWriteOneLineEach(t *testing.T) {
	var calls []string
	w := NewWriter(writerFunc(func(p []byte) (int, error) {
		calls = append(calls, string(p))
		return len(p), nil
	}))
	e := Event{Type: Click, Session: "s1", Time: at("09:00:10"), Product: "SC-2", File: "x", Line: 9}
	if err := w.Write(e); err != nil {
		t.Fatal(err)
	}
	want := []string{`{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2"}` + "\n"}
	if diff := cmp.Diff(want, calls); diff != "" {
		t.Errorf("one Write call with the line, File and Line left out (-want +got):\n%s", diff)
	}
}

type writerFunc func([]byte) (int, error)

func (f writerFunc) Write(p []byte) (int, error) { return f(p) }

func TestWriteRefuses(t *testing.T) {
	search := Event{Type: Search, Session: "s1", Time: at("09:00:00"), Query: "q", Shown: []string{"A", "B"}}
	click := Event{Type: Click, Session: "s1", Time: at("09:00:10"), Product: "A"}
	for _, tc := range []struct {
		name   string
		edit   func(*Event)
		base   Event
		msg    string
		reason string
	}{
		{"no type", func(e *Event) { e.Type = "" }, click, "type: missing", "Read refuses it"},
		{"no time", func(e *Event) { e.Time = time.Time{} }, click, "time: missing", "an unset time would be written as year 1"},
		{"year past 9999", func(e *Event) { e.Time = time.Date(10000, 1, 1, 0, 0, 0, 0, time.UTC) }, click, "time: year 10000", "RFC 3339's date-fullyear is four digits (section 5.6)"},
		{"click with a query", func(e *Event) { e.Query = "q" }, click, "query: belongs to search events", "Read refuses it"},
		{"search with a product", func(e *Event) { e.Product = "A" }, search, "product: belongs to interactions", "Read refuses it"},
		{"shown twice", func(e *Event) { e.Shown = []string{"A", "A"} }, search, "shown: \"A\" is shown twice", "Read refuses it"},
		{"not UTF-8", func(e *Event) { e.Query = "q\xff" }, search, "query: not valid UTF-8", "JSON would write U+FFFD and read back another query"},
		{"explored past shown", func(e *Event) { e.Explored = &Explored{Rank: 3, Relaxations: []Relaxed{{Op: "drop", Kind: "colour"}}} }, search, "explored.rank", "Read refuses it"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			e := tc.base
			tc.edit(&e)
			var buf bytes.Buffer
			err := NewWriter(&buf).Write(e)
			if err == nil || !strings.Contains(err.Error(), tc.msg) {
				t.Errorf("error %v, want one with %q (%s)", err, tc.msg, tc.reason)
			}
			if buf.Len() > 0 {
				t.Errorf("wrote %q", buf.String())
			}
		})
	}
}

func TestReadTwiceInNested(t *testing.T) {
	for _, tc := range []struct{ name, line, field, msg, reason string }{
		{"in a relaxation", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","relaxations":[{"op":"drop","kind":"colour","op":"widen"}]}`,
			"relaxations", "relaxation 1: op: given twice", "names are unique within each object (RFC 8259, section 4), nested ones too"},
		{"in explored", `{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["A"],"explored":{"rank":1,"rank":1,"relaxations":[{"op":"drop","kind":"colour"}]}}`,
			"explored.rank", "given twice", "the same in explored"},
		{"a null field twice", `{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2","query":null,"query":null}`,
			"query", "given twice", "null is a value given too"},
	} {
		_, errs := read(t, tc.line, "")
		var le *LineError
		if len(errs) != 1 || !errors.As(errs[0], &le) || le.Field != tc.field || le.Msg != tc.msg {
			t.Errorf("%s: errors %v, want field %q: %q (%s)", tc.name, errs, tc.field, tc.msg, tc.reason)
		}
	}
}
