package sarif

import (
	"unicode/utf16"
	"unicode/utf8"
)

// UTF16Column converts the 1-based byte column of the position at byte
// offset in content into the 1-based column in UTF-16 code units that a
// SARIF run with columnKind "utf16CodeUnits" uses (§3.30.4), counting the
// code units of the characters between the start of the line and offset.
//
// Go positions count bytes; a character outside the Basic Multilingual
// Plane is 4 bytes in UTF-8 and a surrogate pair (2 units) in UTF-16,
// and a 2- or 3-byte character is one unit.
//
// Special cases are:
//
//	UTF16Column(content, offset, col) = col  if offset or col is out of range
//	invalid UTF-8 bytes count one unit each (U+FFFD, as decoders do)
func UTF16Column(content []byte, offset, col int) int {
	lineStart := offset - (col - 1)
	if col < 1 || offset > len(content) || lineStart < 0 {
		return col
	}
	units := 0
	for b := content[lineStart:offset]; len(b) > 0; {
		r, size := utf8.DecodeRune(b)
		n := utf16.RuneLen(r)
		if n < 1 {
			n = 1
		}
		units += n
		b = b[size:]
	}
	return units + 1
}
