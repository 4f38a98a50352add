package parser

import "slices"

// Kind says what a constraint constrains.
type Kind string

// The kinds of constraint.
const (
	KindProductType   Kind = "product_type"
	KindColour        Kind = "colour"
	KindPattern       Kind = "pattern"
	KindSilhouette    Kind = "silhouette"
	KindMaterial      Kind = "material"
	KindSize          Kind = "size"
	KindAudience      Kind = "audience"
	KindMeasure       Kind = "measure"
	KindSpec          Kind = "spec"
	KindPrice         Kind = "price"
	KindCompatibility Kind = "compatibility"
	KindBrand         Kind = "brand"
	KindPartNumber    Kind = "part_number"
	KindKeyword       Kind = "keyword"
	KindFiller        Kind = "filler"
)

// allKinds are the kinds in the order the JSON contract documents them.
var allKinds = []Kind{
	KindProductType, KindColour, KindPattern, KindSilhouette, KindMaterial,
	KindSize, KindAudience, KindMeasure, KindSpec, KindPrice,
	KindCompatibility, KindBrand, KindPartNumber, KindKeyword, KindFiller,
}

// AllKinds returns every kind, in the order the JSON contract documents
// them, in a slice of the caller's own.
func AllKinds() []Kind { return slices.Clone(allKinds) }

// DefaultStrictness returns the strictness a kind gets when no policy says
// otherwise. A quoted phrase is always Hard, whatever its kind.
func DefaultStrictness(k Kind) Strictness {
	switch k {
	case KindPartNumber, KindCompatibility, KindSpec, KindSize, KindAudience:
		return Hard
	case KindProductType, KindMeasure, KindPrice, KindColour, KindBrand:
		return Firm
	case KindMaterial, KindPattern, KindSilhouette, KindKeyword:
		return Soft
	}
	return Filler
}
