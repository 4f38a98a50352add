package bleveengine

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"sort"
	"sync"

	"github.com/blevesearch/bleve/v2"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// vocabFile holds, beside the index, the catalog's colour vocabulary.
const vocabFile = "whittle-vocabulary.json"

// BuildOptions tune Build. The zero value is ready to use.
type BuildOptions struct {
	// BatchSize is how many products go into one batch (default 1000).
	BatchSize int
	// Workers is how many batches are indexed at once (default 2). Each
	// holds a batch in memory; bleve turns each batch into a segment on
	// the goroutine that hands it over, so a second worker builds one
	// segment while the first builds another.
	Workers int
	// SkipBad skips malformed lines, listing them in Stats.Skipped,
	// instead of stopping at the first.
	SkipBad bool
	// Progress, when set, is called after each batch with the number of
	// products indexed so far (products alone, not the colour palette
	// entries the build also writes).
	Progress func(indexed int)
	// Lexicon reads colour names without a value; nil means the default.
	Lexicon *lexicon.Lexicon
}

// Stats reports a build.
type Stats struct {
	Products int `json:"products"`
	// Skipped are the malformed lines passed over with SkipBad.
	Skipped []*catalog.LineError `json:"skipped,omitempty"`
	Colours int                  `json:"colours"`
	// Unknown are the values whittle does not know, the most common
	// first in each field; the products are indexed all the same.
	Unknown []Unknown `json:"unknown,omitempty"`
}

type vocabulary struct {
	Colours []vocabColour `json:"colours"`
	// Documents is how many documents the build wrote (products and
	// palette entries), for Open to check that the index holds them all:
	// bleve opens an index whose segment is damaged as an empty one.
	Documents uint64 `json:"documents"`
	// Layout is the layout of the fields the build wrote; Open refuses
	// another, since queries would look for fields it lacks.
	Layout int `json:"layout"`
}

// layout numbers the index's field layout: 2 files each tyre also by its
// size alone (parser.TyreSize); 3 maps the dimensions and designations
// added with it: a lamp's colour temperature, a pipe's schedule, a
// socket's drive and size, a roller's nap, a breaker's poles, a battery's
// cold cranking amps; 4 a pressure (psi), an energy (a surge
// protector's joules, a power station's watt-hours) and a saw blade's
// teeth. An index without the number is layout 1.
const layout = 4

// ErrOldLayout is the error Open returns, wrapped, for an index written
// by a whittle that laid its fields out otherwise: rebuild it. Test for
// it with errors.Is.
var ErrOldLayout = errors.New("the index was built by another version of whittle")

type vocabColour struct {
	Name  string     `json:"name"`
	Lab   [3]float64 `json:"lab"`
	Count int        `json:"count"`
}

// ErrNotIndex is the error a *TargetError wraps: the path Build was
// asked to write holds something other than an index Build wrote.
// Test for it with errors.Is(err, ErrNotIndex).
var ErrNotIndex = errors.New("not a whittle index")

// TargetError is Build's refusal to write at Dir, because what is there
// is neither an empty directory nor an index Build wrote (a directory
// holding exactly whittle-vocabulary.json and the bleve index, index).
// Nothing at Dir is touched. It wraps ErrNotIndex; errors.As gets it.
type TargetError struct {
	Dir string
	// Reason says what is there: "it is a file", "it is a directory
	// holding notes.txt", ...
	Reason string
}

// Error says what is at the path and that nothing there was touched.
func (e *TargetError) Error() string {
	return fmt.Sprintf("refusing to write an index at %s: %s; nothing there was touched (give a new or empty directory, or an index whittle built)", e.Dir, e.Reason)
}

// Unwrap returns ErrNotIndex, for errors.Is.
func (e *TargetError) Unwrap() error { return ErrNotIndex }

// IsIndex reports whether dir holds an index Build wrote, which a build
// at dir replaces: a directory holding its colour vocabulary,
// whittle-vocabulary.json, and the bleve index, index, and nothing else.
func IsIndex(dir string) bool {
	has, err := checkTarget(filepath.Clean(dir))
	return has && err == nil
}

// checkTarget reports whether dir holds an index Build wrote (has). It
// refuses with a *TargetError anything at dir Build must not replace:
// everything but an empty directory or such an index.
func checkTarget(dir string) (has bool, err error) {
	refuse := func(format string, args ...any) (bool, error) {
		return false, &TargetError{Dir: dir, Reason: fmt.Sprintf(format, args...)}
	}
	st, err := os.Lstat(dir)
	switch {
	case errors.Is(err, fs.ErrNotExist):
		return false, nil
	case err != nil:
		return false, err
	case st.Mode()&fs.ModeSymlink != 0:
		to, _ := os.Readlink(dir)
		return refuse("it is a symbolic link, to %s", to)
	case !st.IsDir():
		return refuse("it is a file, not a directory")
	}
	entries, err := os.ReadDir(dir)
	if err != nil {
		return false, err
	}
	if len(entries) == 0 {
		return false, nil
	}
	var vocab, index bool
	var others []string
	for _, e := range entries {
		switch {
		case e.Name() == vocabFile && e.Type().IsRegular():
			vocab = true
		case e.Name() == "index" && e.IsDir():
			index = true
		default:
			others = append(others, e.Name())
		}
	}
	if vocab && index && len(others) == 0 {
		return true, nil
	}
	if len(others) == 0 { // one of the two, alone
		return refuse("it is a directory holding only part of a whittle index (%s)", entries[0].Name())
	}
	what := others[0]
	if len(others) > 1 {
		what = fmt.Sprintf("%s and %d more", others[0], len(others)-1)
	}
	if vocab && index {
		return refuse("it holds a whittle index but also %s, which whittle did not write", what)
	}
	return refuse("it is a directory holding %s, which is not a whittle index", what)
}

// Build reads a catalog from r and writes an index at dir, replacing any
// index already there only once the new one is complete. A dir that
// exists must be an empty directory or an index Build wrote: Build
// refuses anything else with a *TargetError (see ErrNotIndex) before it
// reads the catalog, and leaves it as it was.
func Build(ctx context.Context, r io.Reader, dir string, opts BuildOptions) (*Stats, error) {
	dir = filepath.Clean(dir)
	if _, err := checkTarget(dir); err != nil {
		return nil, err
	}
	if opts.BatchSize <= 0 {
		opts.BatchSize = 1000
	}
	if opts.Workers <= 0 {
		opts.Workers = 2
	}
	lex := opts.Lexicon
	if lex == nil {
		lex = lexicon.Default()
	}
	parent := filepath.Dir(dir)
	if err := os.MkdirAll(parent, 0o755); err != nil {
		return nil, err
	}
	tmp, err := os.MkdirTemp(parent, "."+filepath.Base(dir)+".building-")
	if err != nil {
		return nil, err
	}
	ok := false
	defer func() {
		if !ok {
			os.RemoveAll(tmp)
		}
	}()
	idxDir := filepath.Join(tmp, "index")
	idx, err := bleve.New(idxDir, indexMapping(lex))
	if err != nil {
		return nil, fmt.Errorf("creating the index: %w", err)
	}
	stats, err := fill(ctx, idx, r, opts, lex)
	if cerr := idx.Close(); err == nil && cerr != nil {
		err = cerr
	}
	if err != nil {
		return nil, err
	}
	docs := uint64(stats.Products + len(stats.colours))
	if err := writeVocabulary(filepath.Join(tmp, vocabFile), stats.colours, docs); err != nil {
		return nil, err
	}
	stats.Colours = len(stats.colours)
	if err := swap(tmp, dir); err != nil {
		return nil, err
	}
	ok = true
	return &stats.Stats, nil
}

// BuildProducts indexes products already in memory at dir, as Build
// does a catalog read from a file: they are written as catalog lines
// through a pipe into Build.
func BuildProducts(ctx context.Context, ps []catalog.Product, dir string, opts BuildOptions) (*Stats, error) {
	pr, pw := io.Pipe()
	go func() {
		enc := json.NewEncoder(pw)
		for i := range ps {
			if err := enc.Encode(&ps[i]); err != nil {
				pw.CloseWithError(err)
				return
			}
		}
		pw.Close()
	}()
	st, err := Build(ctx, pr, dir, opts)
	pr.Close()
	return st, err
}

type buildStats struct {
	Stats
	colours map[string]*vocabColour
}

// fill reads the catalog and indexes it. Reading and mapping the next
// batch overlaps the indexing of the last ones.
func fill(ctx context.Context, idx bleve.Index, r io.Reader, opts BuildOptions, lex *lexicon.Lexicon) (*buildStats, error) {
	st := &buildStats{colours: make(map[string]*vocabColour)}
	batches := make(chan docBatch, 1)
	readErr := make(chan error, 1)
	stop := make(chan struct{})
	go func() {
		defer close(batches)
		readErr <- read(ctx, idx, r, opts, lex, st, batches, stop)
	}()
	var (
		mu       sync.Mutex
		indexed  int
		indexErr error
		wg       sync.WaitGroup
	)
	for range opts.Workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for b := range batches {
				mu.Lock()
				failed := indexErr != nil
				mu.Unlock()
				if failed {
					continue // drain, so the reader can finish
				}
				err := idx.Batch(b.b)
				mu.Lock()
				switch {
				case err != nil && indexErr == nil:
					indexErr = err
					close(stop)
				case err == nil:
					indexed += b.products
					if opts.Progress != nil {
						opts.Progress(indexed)
					}
				}
				mu.Unlock()
			}
		}()
	}
	wg.Wait()
	if err := <-readErr; err != nil {
		return nil, err
	}
	if indexErr != nil {
		return nil, indexErr
	}
	if st.Products == 0 {
		return nil, errors.New("the catalog has no products")
	}
	return st, nil
}

// docBatch is a batch of mapped documents, and how many of them are
// products (the last batch also holds the palette entries).
type docBatch struct {
	b        *bleve.Batch
	products int
}

// read turns catalog lines into batches of mapped documents.
func read(ctx context.Context, idx bleve.Index, r io.Reader, opts BuildOptions, lex *lexicon.Lexicon, st *buildStats,
	out chan<- docBatch, stop <-chan struct{}) error {
	rd := catalog.NewReader(r, lex)
	dims, unknown := dimensionSet(lex), newTally()
	note := func(field, value string) { unknown.note(field, value, rd.Line()) }
	defer func() { st.Unknown = unknown.list(knownValues(lex)) }()
	batch := idx.NewBatch()
	products := 0
	send := func() bool {
		if batch.Size() == 0 {
			return true
		}
		select {
		case out <- docBatch{batch, products}:
			batch, products = idx.NewBatch(), 0
			return true
		case <-stop:
			return false
		}
	}
	for {
		if err := ctx.Err(); err != nil {
			return err
		}
		p, err := rd.Next()
		if err == io.EOF {
			break
		}
		var le *catalog.LineError
		if errors.As(err, &le) && opts.SkipBad {
			st.Skipped = append(st.Skipped, le)
			continue
		}
		if err != nil {
			return err
		}
		doc, lab, err := document(p, rd, lex, dims, note)
		if err != nil {
			le := &catalog.LineError{Line: rd.Line(), Msg: err.Error()}
			if opts.SkipBad {
				st.Skipped = append(st.Skipped, le)
				continue
			}
			return le
		}
		if err := batch.Index(p.ID, doc); err != nil {
			return err
		}
		st.Products++
		products++
		if name := norm(p.Colour); name != "" && lab != nil {
			c := st.colours[name]
			if c == nil {
				c = &vocabColour{Name: name, Lab: [3]float64{lab.L, lab.A, lab.B}}
				st.colours[name] = c
			}
			c.Count++
		}
		if batch.Size() >= opts.BatchSize && !send() {
			return nil
		}
	}
	// The palette entries, in name order, so that builds are alike.
	names := make([]string, 0, len(st.colours))
	for name := range st.colours {
		names = append(names, name)
	}
	sort.Strings(names)
	for _, name := range names {
		if err := batch.Index(paletteIDPrefix+name, paletteDocument(st.colours[name])); err != nil {
			return err
		}
	}
	send()
	return nil
}

func writeVocabulary(path string, cs map[string]*vocabColour, docs uint64) error {
	v := vocabulary{Documents: docs, Layout: layout}
	for _, c := range cs {
		v.Colours = append(v.Colours, *c)
	}
	sort.Slice(v.Colours, func(i, j int) bool { return v.Colours[i].Name < v.Colours[j].Name })
	b, err := json.Marshal(v)
	if err != nil {
		return err
	}
	return os.WriteFile(path, b, 0o644)
}

// swap puts the finished directory tmp at dir: what is at dir, an empty
// directory or an old index, is checked again (the build may have taken
// a while), moved aside into a fresh directory of its own, and removed
// once the new index is in place.
func swap(tmp, dir string) error {
	if _, err := checkTarget(dir); err != nil {
		return err
	}
	hold := ""
	if _, err := os.Lstat(dir); err == nil {
		if hold, err = os.MkdirTemp(filepath.Dir(dir), "."+filepath.Base(dir)+".old-"); err != nil {
			return fmt.Errorf("moving the old index aside: %w", err)
		}
		if err := os.Rename(dir, filepath.Join(hold, "index")); err != nil {
			os.Remove(hold)
			return fmt.Errorf("moving the old index aside: %w", err)
		}
	}
	if err := os.Rename(tmp, dir); err != nil {
		if hold != "" {
			if rerr := os.Rename(filepath.Join(hold, "index"), dir); rerr != nil {
				// The old index stays where it was moved, and the error says where.
				return fmt.Errorf("putting the new index in place: %w (and putting the old one back: %v; it is in %s)", err, rerr, hold)
			}
			os.Remove(hold)
		}
		return fmt.Errorf("putting the new index in place: %w", err)
	}
	if hold != "" {
		os.RemoveAll(hold)
	}
	return nil
}

func (v vocabulary) palette() []colour.PaletteColour {
	out := make([]colour.PaletteColour, len(v.Colours))
	for i, c := range v.Colours {
		out[i] = colour.PaletteColour{Name: c.Name, Lab: colour.Lab{L: c.Lab[0], A: c.Lab[1], B: c.Lab[2]}, Count: c.Count}
	}
	return out
}
