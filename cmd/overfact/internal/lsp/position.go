package lsp

import (
	"bytes"
	"fmt"
	"unicode/utf8"
)

// encoding is the unit in which Position.Character counts (LSP 3.17
// "PositionEncodingKind").
type encoding string

const (
	encUTF16 encoding = "utf-16" // the protocol's default and mandatory kind
	encUTF8  encoding = "utf-8"  // byte offsets, what go/token uses
)

// chooseEncoding picks utf-8 when the client offers it, since Go positions
// are byte offsets and no conversion can then go wrong; otherwise utf-16,
// which every client must support.
func chooseEncoding(offered []string) encoding {
	for _, e := range offered {
		if encoding(e) == encUTF8 {
			return encUTF8
		}
	}
	return encUTF16
}

// units returns how many code units of enc rune r takes. Runes outside the
// Basic Multilingual Plane take a UTF-16 surrogate pair (RFC 2781 section
// 2.1); an invalid byte decodes to U+FFFD, one unit.
func (enc encoding) units(r rune, size int) int {
	if enc == encUTF8 {
		return size
	}
	if r >= 0x10000 && r != utf8.RuneError {
		return 2
	}
	return 1
}

// lineStart returns the byte offset of the start of line (zero-based) in
// text, or false if text has fewer lines. Lines end at '\n'; a '\r' before
// it belongs to the line's content for the purposes of this function.
func lineStart(text []byte, line uint32) (int, bool) {
	off := 0
	for l := uint32(0); l < line; l++ {
		i := bytes.IndexByte(text[off:], '\n')
		if i < 0 {
			return 0, false
		}
		off += i + 1
	}
	return off, true
}

// toOffset converts an LSP position into a byte offset into text.
// A character past the end of its line means the end of the line, as LSP
// 3.17 requires; a line past the end of the text is an error, except the
// line just after a final newline, which is the end of the text.
// A position inside a UTF-16 surrogate pair is taken to mean the rune's start.
func (enc encoding) toOffset(text []byte, p Position) (int, error) {
	off, ok := lineStart(text, p.Line)
	if !ok {
		return 0, fmt.Errorf("line %d is beyond the end of the document", p.Line)
	}
	var col uint32
	for off < len(text) && text[off] != '\n' && !(text[off] == '\r' && off+1 < len(text) && text[off+1] == '\n') {
		r, size := utf8.DecodeRune(text[off:])
		n := uint32(enc.units(r, size))
		if col+n > p.Character {
			break
		}
		col += n
		off += size
	}
	return off, nil
}

// toPosition converts a byte offset into text into an LSP position.
// An offset inside a multi-byte rune is moved back to the rune's start.
func (enc encoding) toPosition(text []byte, offset int) Position {
	if offset > len(text) {
		offset = len(text)
	}
	var p Position
	start := 0
	for i := 0; i < offset; i++ {
		if text[i] == '\n' {
			p.Line++
			start = i + 1
		}
	}
	for i := start; i < offset; {
		r, size := utf8.DecodeRune(text[i:])
		if i+size > offset {
			break
		}
		p.Character += uint32(enc.units(r, size))
		i += size
	}
	return p
}

// toRange converts a byte span into an LSP range.
func (enc encoding) toRange(text []byte, start, end int) Range {
	return Range{Start: enc.toPosition(text, start), End: enc.toPosition(text, end)}
}
