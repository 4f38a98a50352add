// Package svgchart draws the small charts of whittle's HTML reports as
// inline SVG, made by the program itself: a report needs nothing from
// the network and reads offline.
package svgchart
