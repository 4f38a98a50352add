package lines

import (
	"errors"
	"io"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
)

type read struct {
	Line int
	Text string
	Long bool
}

func readAll(t *testing.T, r io.Reader, max int) []read {
	t.Helper()
	lr := NewReader(r, max)
	var out []read
	for {
		b, long, err := lr.Next()
		if err == io.EOF {
			return out
		}
		if err != nil {
			t.Fatal(err)
		}
		out = append(out, read{lr.Line(), string(b), long})
	}
}

func TestReader(t *testing.T) {
	for _, tc := range []struct {
		name, in, reason string
		max              int
		want             []read
	}{
		{"lines", "a\nbb\n\nccc", "the last line needs no break; a blank line is a line", 10,
			[]read{{1, "a", false}, {2, "bb", false}, {3, "", false}, {4, "ccc", false}}},
		{"crlf", "a\r\nb\r\n", "a CR before the LF is part of the break (RFC 4180 writes CRLF)", 10,
			[]read{{1, "a", false}, {2, "b", false}}},
		{"bom", "\ufeff{\"q\": 1}\n\ufeffx\n", "U+FEFF at the start of the file is a byte order mark (Unicode 15, 23.8); elsewhere it stays", 20,
			[]read{{1, `{"q": 1}`, false}, {2, "\ufeffx", false}}},
		{"too long", "ok\n" + strings.Repeat("x", 100) + "\nnext\n", "a long line is reported by its number, and reading goes on", 10,
			[]read{{1, "ok", false}, {2, "", true}, {3, "next", false}}},
		{"just fits", strings.Repeat("y", 10) + "\n", "max bytes is still a line", 10,
			[]read{{1, strings.Repeat("y", 10), false}}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if diff := cmp.Diff(tc.want, readAll(t, strings.NewReader(tc.in), tc.max)); diff != "" {
				t.Errorf("%s (-want +got):\n%s", tc.reason, diff)
			}
		})
	}
}

// A line longer than the reader's buffer is gathered across reads, and
// one far longer is skipped without being kept whole.
func TestLongerThanTheBuffer(t *testing.T) {
	in := strings.Repeat("z", 200<<10) + "\n" + strings.Repeat("w", 300<<10) + "\nend"
	got := readAll(t, strings.NewReader(in), 256<<10)
	want := []read{{1, strings.Repeat("z", 200<<10), false}, {2, "", true}, {3, "end", false}}
	if diff := cmp.Diff(want, got); diff != "" {
		t.Errorf("(-want +got):\n%s", diff)
	}
}

type broken struct{}

func (broken) Read([]byte) (int, error) { return 0, errors.New("disk gone") }

func TestReaderError(t *testing.T) {
	if _, _, err := NewReader(broken{}, 10).Next(); err == nil || err.Error() != "disk gone" {
		t.Errorf("err = %v, want the reader's", err)
	}
}
