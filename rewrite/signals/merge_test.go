package signals

import (
	"errors"
	"fmt"
	"iter"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
)

// clickLine is a click at hms in session s, on product p.
func clickLine(s, hms, p string) string {
	return fmt.Sprintf(`{"type":"click","session":%q,"time":"2025-03-14T%sZ","product":%q}`, s, hms, p)
}

// places lists where each event came from, as file:line.
func places(seq iter.Seq2[Event, error]) (got []string, errs []error) {
	for e, err := range seq {
		if err != nil {
			errs = append(errs, err)
			continue
		}
		got = append(got, fmt.Sprintf("%s:%d", e.File, e.Line))
	}
	return got, errs
}

func TestMerge(t *testing.T) {
	a := strings.Join([]string{clickLine("a", "09:00:00", "P1"), clickLine("a", "09:00:05", "P1"), clickLine("a", "09:00:20", "P1")}, "\n")
	b := strings.Join([]string{clickLine("b", "09:00:01", "P1"), clickLine("b", "09:00:05", "P1"), clickLine("b", "09:00:30", "P1")}, "\n")
	c := strings.Join([]string{clickLine("c", "08:59:59", "P1"), clickLine("c", "09:00:06", "P1")}, "\n")
	for _, tc := range []struct {
		name   string
		logs   []iter.Seq2[Event, error]
		want   []string
		reason string
	}{
		{"three files", []iter.Seq2[Event, error]{Read(strings.NewReader(a), "a"), Read(strings.NewReader(b), "b"), Read(strings.NewReader(c), "c")},
			[]string{"c:1", "a:1", "b:1", "a:2", "b:2", "c:2", "a:3", "b:3"},
			"earliest head first; a:2 and b:2 are both at 09:00:05, and a is given first"},
		{"one file", []iter.Seq2[Event, error]{Read(strings.NewReader(a), "a")}, []string{"a:1", "a:2", "a:3"}, "a file alone comes out as it is"},
		{"none", nil, nil, "no files, no events"},
		{"an empty file", []iter.Seq2[Event, error]{Read(strings.NewReader(""), "e"), Read(strings.NewReader(c), "c")}, []string{"c:1", "c:2"}, "an empty file is done at once"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, errs := places(Merge(tc.logs...))
			if len(errs) > 0 {
				t.Fatal(errs)
			}
			if diff := cmp.Diff(tc.want, got); diff != "" {
				t.Errorf("(-want +got) (%s):\n%s", tc.reason, diff)
			}
		})
	}
}

func TestMergeOutOfOrderFile(t *testing.T) {
	// b's own events are out of order: Merge takes each file's events in
	// the order they come, so b:2 waits behind b:1; Join copes.
	a := strings.Join([]string{clickLine("a", "09:00:00", "P1"), clickLine("a", "09:00:10", "P1")}, "\n")
	b := strings.Join([]string{clickLine("b", "09:00:20", "P1"), clickLine("b", "09:00:05", "P1")}, "\n")
	got, _ := places(Merge(Read(strings.NewReader(a), "a"), Read(strings.NewReader(b), "b")))
	if diff := cmp.Diff([]string{"a:1", "a:2", "b:1", "b:2"}, got); diff != "" {
		t.Errorf("(-want +got):\n%s", diff)
	}
}

func TestMergeErrors(t *testing.T) {
	a := strings.Join([]string{clickLine("a", "09:00:00", "P1"), `{"type":"click"}`, clickLine("a", "09:00:20", "P1")}, "\n")
	b := clickLine("b", "09:00:10", "P1")
	disk := errors.New("disk gone")
	c := &failing{strings.NewReader(clickLine("c", "09:00:15", "P1") + "\n"), disk}
	got, errs := places(Merge(Read(strings.NewReader(a), "a"), Read(strings.NewReader(b), "b"), Read(c, "c")))
	// The bad line of a is met when a:1 is taken and a's next event is
	// looked for; c's reader fails after its one event, which ends c.
	if diff := cmp.Diff([]string{"a:1", "b:1", "c:1", "a:3"}, got); diff != "" {
		t.Errorf("events (-want +got):\n%s", diff)
	}
	var le *LineError
	if len(errs) != 2 || !errors.As(errs[0], &le) || le.File != "a" || le.Line != 2 || !errors.Is(errs[1], disk) {
		t.Errorf("errors %v, want a's line 2, then c's reader's", errs)
	}
}

func TestMergeStopsWhenAsked(t *testing.T) {
	a := strings.Join([]string{clickLine("a", "09:00:00", "P1"), clickLine("a", "09:00:10", "P1")}, "\n")
	b := clickLine("b", "09:00:05", "P1")
	n := 0
	for range Merge(Read(strings.NewReader(a), "a"), Read(strings.NewReader(b), "b")) {
		if n++; n == 2 {
			break
		}
	}
	if n != 2 {
		t.Errorf("took %d", n)
	}
}
