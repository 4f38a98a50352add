package lexicon

import (
	"embed"
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"slices"
	"unicode"

	"strings"
	"sync"
)

//go:embed data/*.wlx
var defaultFiles embed.FS

// Lexicon is a loaded vocabulary with its matcher. It is immutable after
// loading and safe for concurrent use.
type Lexicon struct {
	root   *node
	byKind map[Kind][]*Entry
	byName map[Kind]map[string]*Entry
	maxLen int
	// keys caches the key of every word the vocabulary spells, so that
	// most query words need no stemming.
	keys map[string]string
	// joined holds the joined forms waiting for insertJoined.
	joined []joinedForm
	// children lists each product type's direct subtypes.
	children map[string][]*Entry
	paletteState
}

// node is one step of the word trie: children by word key, and the entries
// whose phrase ends here.
type node struct {
	next    map[string]*node
	entries []*Entry
}

var (
	defaultOnce sync.Once
	defaultLex  *Lexicon
	defaultErr  error
)

// Default returns the vocabulary embedded in whittle. It is loaded once;
// an error in the embedded files is a build defect and panics.
func Default() *Lexicon {
	defaultOnce.Do(func() {
		sub, err := fs.Sub(defaultFiles, "data")
		if err == nil {
			defaultLex, defaultErr = Load(sub)
		} else {
			defaultErr = err
		}
	})
	if defaultErr != nil {
		panic("whittle: embedded lexicon: " + defaultErr.Error())
	}
	return defaultLex
}

// LoadDir loads a lexicon from the .wlx files in dir. A kind whose file is
// missing from dir is taken from the embedded default, so a shop can
// replace only the files it cares about.
func LoadDir(dir string) (*Lexicon, error) {
	st, err := os.Stat(dir)
	if err != nil {
		return nil, fmt.Errorf("lexicon directory: %w", err)
	}
	if !st.IsDir() {
		return nil, fmt.Errorf("lexicon directory: %s is not a directory", dir)
	}
	l, err := Load(overlayFS{top: os.DirFS(dir), dir: dir})
	if err != nil {
		placeIn(dir, err)
		return nil, err
	}
	return l, nil
}

// placeIn gives each *FileError in err about a file of dir the file's
// path, so that "colours.wlx:2:19" names the shop's file and not the
// built-in one of the same name.
func placeIn(dir string, err error) {
	var fe *FileError
	switch e := err.(type) {
	case interface{ Unwrap() []error }:
		for _, x := range e.Unwrap() {
			placeIn(dir, x)
		}
	default:
		if errors.As(err, &fe) && !filepath.IsAbs(fe.File) && !strings.ContainsRune(fe.File, filepath.Separator) {
			if _, serr := os.Stat(filepath.Join(dir, fe.File)); serr == nil {
				fe.File = filepath.Join(dir, fe.File)
			}
		}
	}
}

// overlayFS serves a file from top when it is there, else the embedded one.
type overlayFS struct {
	top fs.FS
	dir string
}

func (o overlayFS) Open(name string) (fs.File, error) {
	f, err := o.top.Open(name)
	if err == nil || !errors.Is(err, fs.ErrNotExist) {
		return f, err
	}
	return defaultFiles.Open("data/" + name)
}

// Load reads one file per kind (named by [Kind.File]) from fsys and builds
// the matcher. Errors are *FileError values where a line is at fault.
func Load(fsys fs.FS) (*Lexicon, error) {
	l := &Lexicon{
		root:   &node{},
		byKind: make(map[Kind][]*Entry),
		byName: make(map[Kind]map[string]*Entry),
		keys:   make(map[string]string),
	}
	var errs []error
	for _, k := range kinds {
		f, err := fsys.Open(k.File())
		if err != nil {
			errs = append(errs, fmt.Errorf("lexicon: %w", err))
			continue
		}
		entries, err := ParseFile(k.File(), k, f)
		f.Close()
		if err != nil {
			errs = append(errs, err)
			continue
		}
		if err := l.add(k, entries); err != nil {
			errs = append(errs, err)
		}
	}
	l.insertJoined()
	if err := l.checkParents(); err != nil {
		errs = append(errs, err)
	}
	l.children = make(map[string][]*Entry)
	for _, e := range l.byKind[ProductType] {
		if e.Parent != "" {
			l.children[e.Parent] = append(l.children[e.Parent], e)
		}
	}
	if len(errs) > 0 {
		return nil, errors.Join(errs...)
	}
	return l, nil
}

// add indexes the entries of one kind and refuses a phrase defined twice.
func (l *Lexicon) add(k Kind, entries []*Entry) error {
	names := make(map[string]*Entry)
	type seenAt struct {
		e      *Entry
		phrase string
	}
	seen := make(map[string]seenAt)
	for _, e := range entries {
		for _, p := range append([]string{e.Name}, e.Aliases...) {
			key := strings.Join(phraseKeys(p), " ")
			if prev, dup := seen[key]; dup && prev.e != e {
				how := "is already defined"
				if prev.phrase != p {
					how = fmt.Sprintf("matches the same stemmed words (%q) as %q", key, prev.phrase)
				}
				return &FileError{File: e.File, Line: e.Line, Column: 1,
					Msg: fmt.Sprintf("%q %s on line %d", p, how, prev.e.Line)}
			}
			seen[key] = seenAt{e, p}
			l.insert(p, e)
		}
		names[e.Name] = e
	}
	l.byKind[k] = entries
	l.byName[k] = names
	return nil
}

func (l *Lexicon) checkParents() error {
	for _, e := range l.byKind[ProductType] {
		if e.Parent != "" && l.byName[ProductType][e.Parent] == nil {
			return &FileError{File: e.File, Line: e.Line, Column: 1,
				Msg: fmt.Sprintf("parent %q of %q is not a product type", e.Parent, e.Name)}
		}
		if len(l.Lineage(e)) == maxDepth {
			return &FileError{File: e.File, Line: e.Line, Column: 1,
				Msg: fmt.Sprintf("the parents of %q go round in a loop, or more than %d deep", e.Name, maxDepth)}
		}
	}
	return nil
}

// phraseKeys splits a phrase into word keys.
func phraseKeys(p string) []string {
	ws := Words(p)
	keys := make([]string, len(ws))
	for i, w := range ws {
		keys[i] = Key(w)
	}
	return keys
}

// Key returns [Key](word), from a cache of the words the vocabulary spells
// when word is one of them. word must be normalised already.
func (l *Lexicon) Key(word string) string {
	if k, ok := l.keys[word]; ok {
		return k
	}
	return Key(word)
}

// insert adds the phrase under its word keys and, for hyphenated or
// multi-word phrases, under the joined form too ("v-neck" also as "vneck").
func (l *Lexicon) insert(p string, e *Entry) {
	keys := phraseKeys(p)
	ws := Words(p)
	for i, w := range ws {
		l.keys[w] = keys[i]
	}
	// The Porter stemmer does not always bring a plural to its singular's
	// stem ("ties" to "ti", "tie" stays "tie"); the plural of the last
	// word is then looked up under the singular's key too.
	if n := len(ws); n > 0 {
		last := Normalise(ws[n-1])
		if pl := pluralOf(last); pl != last && Key(pl) != keys[n-1] {
			if _, taken := l.keys[pl]; !taken {
				l.keys[pl] = keys[n-1]
			}
		}
	}
	l.insertKeys(keys, e)
	if len(ws) > 1 && len(ws) <= 3 {
		l.joined = append(l.joined, joinedForm{Key(strings.Join(ws, "")), e})
	}
}

// pluralOf is the regular English plural of a noun (common practice): -es
// after s, x, z, ch and sh ("lenses"), -ies for a y after a consonant,
// else -s. A word that does not end in a letter is its own. (A word
// plural already, "jeans", gets a form no one types, which is harmless.)
func pluralOf(w string) string {
	switch {
	case w == "" || !unicode.IsLetter(rune(w[len(w)-1])):
		return w
	case strings.HasSuffix(w, "s"), strings.HasSuffix(w, "x"), strings.HasSuffix(w, "z"), strings.HasSuffix(w, "ch"), strings.HasSuffix(w, "sh"):
		return w + "es"
	case len(w) > 1 && strings.HasSuffix(w, "y") && !strings.ContainsRune("aeiou", rune(w[len(w)-2])):
		return w[:len(w)-1] + "ies"
	}
	return w + "s"
}

// joinedForm is a phrase of several words written as one ("vneck",
// "bunkbed"), added once every phrase is in.
type joinedForm struct {
	key string
	e   *Entry
}

// insertJoined adds the joined forms where no phrase of the vocabulary
// already has that key: "orangered" stems like "orange", and must not
// make plain "orange" mean two colours.
func (l *Lexicon) insertJoined() {
	for _, j := range l.joined {
		if c := l.root.next[j.key]; c != nil && len(c.entries) > 0 && !slices.Contains(c.entries, j.e) {
			continue
		}
		l.insertKeys([]string{j.key}, j.e)
	}
	l.joined = nil
}

func (l *Lexicon) insertKeys(keys []string, e *Entry) {
	if len(keys) == 0 {
		return
	}
	n := l.root
	for _, k := range keys {
		if n.next == nil {
			n.next = make(map[string]*node)
		}
		c := n.next[k]
		if c == nil {
			c = &node{}
			n.next[k] = c
		}
		n = c
	}
	for _, have := range n.entries {
		if have == e {
			return
		}
	}
	n.entries = append(n.entries, e)
	if len(keys) > l.maxLen {
		l.maxLen = len(keys)
	}
}

// Match finds the longest phrase of the lexicon that starts at keys[0],
// where keys are word keys as made by [Key]. It returns how many words the
// phrase covers and the entries it names (several when the same phrase is,
// say, both a colour and a material), or 0 and nil.
func (l *Lexicon) Match(keys []string) (n int, entries []*Entry) {
	cur := l.root
	for i, k := range keys {
		c := cur.next[k]
		if c == nil {
			break
		}
		cur = c
		if len(c.entries) > 0 {
			n, entries = i+1, c.entries
		}
	}
	return n, entries
}

// MaxPhraseWords is the number of words in the longest phrase.
func (l *Lexicon) MaxPhraseWords() int { return l.maxLen }

// Entries returns the entries of kind k in file order. The slice is shared:
// do not modify it.
func (l *Lexicon) Entries(k Kind) []*Entry { return l.byKind[k] }

// Names returns the canonical names of the entries of kind k, in the
// order of its file.
func (l *Lexicon) Names(k Kind) []string {
	names := make([]string, len(l.byKind[k]))
	for i, e := range l.byKind[k] {
		names[i] = e.Name
	}
	return names
}

// Lookup returns the entry of kind k whose canonical name is name.
func (l *Lexicon) Lookup(k Kind, name string) (*Entry, bool) {
	e, ok := l.byName[k][name]
	return e, ok
}

// Counts returns how many entries each kind has, for reports.
func (l *Lexicon) Counts() map[Kind]int {
	out := make(map[Kind]int, len(l.byKind))
	for k, es := range l.byKind {
		out[k] = len(es)
	}
	return out
}

// maxDepth bounds a walk up the parent chain; the loader refuses a chain
// that reaches it, which is how a loop shows.
const maxDepth = 32

// Lineage returns e and its ancestors, nearest first: "chelsea boot",
// then "boot".
func (l *Lexicon) Lineage(e *Entry) []*Entry {
	var out []*Entry
	for ; e != nil && len(out) < maxDepth; e = l.byName[ProductType][e.Parent] {
		out = append(out, e)
		if e.Parent == "" {
			break
		}
	}
	return out
}

// Descendants returns the product types below e, nearest first: "boot"
// gives "chelsea boot", "hiking boot" and the rest.
func (l *Lexicon) Descendants(e *Entry) []*Entry {
	var out []*Entry
	queue := []*Entry{e}
	for len(queue) > 0 && len(out) < 10000 {
		next := queue[0]
		queue = queue[1:]
		for _, c := range l.children[next.Name] {
			out = append(out, c)
			queue = append(queue, c)
		}
	}
	return out
}

// SlotsOf returns the measure slots of a product type, inherited from the
// nearest ancestor that has any.
func (l *Lexicon) SlotsOf(e *Entry) []Slot {
	for _, a := range l.Lineage(e) {
		if len(a.Slots) > 0 {
			return a.Slots
		}
	}
	return nil
}
