package lexicon

import (
	"errors"
	"io/fs"
	"strings"
	"testing"
)

// FuzzParseFile reads generated lexicon files of every kind. Its seed
// corpus holds the lines of the embedded lexicon's own files. A file
// either reads, every entry's name normalised as Normalise does, or
// fails with errors that name a line of the file and a column on it.
func FuzzParseFile(f *testing.F) {
	files, _ := fs.Glob(defaultFiles, "data/*.wlx")
	for _, name := range files {
		b, _ := fs.ReadFile(defaultFiles, name)
		lines := strings.Split(string(b), "\n")
		for i := 0; i < len(lines); i += 25 {
			f.Add(strings.Join(lines[i:min(i+3, len(lines))], "\n"), uint8(i))
		}
	}
	f.Add("navy | hex=#000080 | also=dark blue", uint8(1))
	f.Add("drill bit | category=hardware | slot=diameter:length:in:0.25..1", uint8(0))
	f.Fuzz(func(t *testing.T, text string, kind uint8) {
		k := kinds[int(kind)%len(kinds)]
		entries, err := ParseFile("f.txt", k, strings.NewReader(text))
		lines := strings.Count(text, "\n") + 1
		if err != nil {
			var errs []error
			if j, ok := err.(interface{ Unwrap() []error }); ok {
				errs = j.Unwrap()
			} else {
				errs = []error{err}
			}
			for _, e := range errs {
				var fe *FileError
				if !errors.As(e, &fe) {
					t.Fatalf("%q: error %v (%T) is not a *FileError", text, e, e)
				}
				if fe.Line < 1 || fe.Line > lines || fe.Column < 0 || fe.Msg == "" {
					t.Fatalf("%q: error at line %d column %d of %d lines: %q", text, fe.Line, fe.Column, lines, fe.Msg)
				}
			}
			return
		}
		for _, e := range entries {
			if e.Name == "" || Normalise(e.Name) != e.Name {
				t.Fatalf("%q: entry name %q is not normalised", text, e.Name)
			}
		}
	})
}
