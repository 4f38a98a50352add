package lines

import (
	"bufio"
	"bytes"
	"io"
)

// bom is the UTF-8 encoding of U+FEFF, the byte order mark.
var bom = []byte{0xef, 0xbb, 0xbf}

// Reader reads lines from a reader.
type Reader struct {
	br   *bufio.Reader
	max  int
	long []byte // a line longer than br's buffer, gathered
	line int    // the number of the line last returned
}

// NewReader reads lines of r, keeping lines of up to max bytes.
func NewReader(r io.Reader, max int) *Reader {
	return &Reader{br: bufio.NewReaderSize(r, min(max, 64<<10)), max: max}
}

// Line is the number of the line last returned, from 1.
func (r *Reader) Line() int { return r.line }

// Next returns the next line without its line break ("\n" or "\r\n"),
// or, for a line longer than the reader's max, no bytes and long set;
// io.EOF at the end. The line is valid until the next call.
func (r *Reader) Next() (line []byte, long bool, err error) {
	b, err := r.br.ReadSlice('\n')
	if err == io.EOF && len(b) == 0 {
		return nil, false, io.EOF
	}
	r.line++
	switch err {
	case nil, io.EOF:
		return r.trim(b)
	case bufio.ErrBufferFull:
	default:
		return nil, false, err
	}
	r.long = append(r.long[:0], b...)
	for {
		b, err = r.br.ReadSlice('\n')
		if len(r.long) <= r.max+2 {
			r.long = append(r.long, b...)
		}
		switch err {
		case nil, io.EOF:
			return r.trim(r.long)
		case bufio.ErrBufferFull:
		default:
			return nil, false, err
		}
	}
}

// trim takes the line break off b, and the byte order mark off the
// first line, and says whether what is left is too long.
func (r *Reader) trim(b []byte) ([]byte, bool, error) {
	b = bytes.TrimSuffix(b, []byte{'\n'})
	b = bytes.TrimSuffix(b, []byte{'\r'})
	if r.line == 1 {
		b = bytes.TrimPrefix(b, bom)
	}
	if len(b) > r.max {
		return nil, true, nil
	}
	return b, false, nil
}
