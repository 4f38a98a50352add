package parser

import "fmt"

// Strictness says how far a constraint may be relaxed when a query finds
// nothing. Levels are ordered: relaxing a constraint means stepping down.
type Strictness int8

// The strictness levels, from the first dropped to the never relaxed.
const (
	// Filler carries no constraint and is dropped first.
	Filler Strictness = iota
	// Soft may be dropped.
	Soft
	// Firm may be widened, and dropped only after widening fails.
	Firm
	// Hard is never relaxed.
	Hard
)

var strictnessNames = [...]string{"filler", "soft", "firm", "hard"}

// String returns the level's name: "filler", "soft", "firm" or "hard".
func (s Strictness) String() string {
	if s < 0 || int(s) >= len(strictnessNames) {
		return fmt.Sprintf("Strictness(%d)", int8(s))
	}
	return strictnessNames[s]
}

// Down returns the next lower level, or Filler when s is already Filler.
func (s Strictness) Down() Strictness {
	if s <= Filler {
		return Filler
	}
	return s - 1
}

// ParseStrictness returns the level with the given name.
func ParseStrictness(name string) (Strictness, error) {
	for i, n := range strictnessNames {
		if n == name {
			return Strictness(i), nil
		}
	}
	return 0, fmt.Errorf("unknown strictness %q (want filler, soft, firm or hard)", name)
}

// MarshalText encodes the level as its name.
func (s Strictness) MarshalText() ([]byte, error) {
	if s < 0 || int(s) >= len(strictnessNames) {
		return nil, fmt.Errorf("invalid strictness %d", int8(s))
	}
	return []byte(s.String()), nil
}

// UnmarshalText decodes a level from its name.
func (s *Strictness) UnmarshalText(b []byte) error {
	v, err := ParseStrictness(string(b))
	if err != nil {
		return err
	}
	*s = v
	return nil
}
