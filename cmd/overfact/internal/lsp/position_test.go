package lsp

import (
	"strings"
	"testing"
	"unicode/utf16"
	"unicode/utf8"
)

// positionTexts mix one-byte, two-byte (é U+00E9, λ U+03BB), three-byte
// (€ U+20AC) and four-byte (𝛤 U+1D6E4, 😀 U+1F600) runes, CRLF line ends
// and an empty last line. Unit counts come from the Unicode Standard's
// definitions of UTF-8 and UTF-16 (chapter 3); the reference conversion
// below uses unicode/utf16, not the code under test.
var positionTexts = []string{
	"",
	"package desk\n",
	"// λ é\nvar é = 1 // 𝛤(n+1) €\n",
	"a😀b\r\nc€d\r\n",
	"no final newline λ",
	"\n\n\n",
}

// reference computes the LSP position of byte offset off by splitting the
// text into lines and encoding the line prefix with unicode/utf16.
func reference(text string, off int, enc encoding) Position {
	before := text[:off]
	line := strings.Count(before, "\n")
	prefix := before[strings.LastIndex(before, "\n")+1:]
	if enc == encUTF8 {
		return Position{uint32(line), uint32(len(prefix))}
	}
	return Position{uint32(line), uint32(len(utf16.Encode([]rune(prefix))))}
}

// TestPositionRoundTrip checks every rune boundary of every text in both
// encodings against the reference and back.
func TestPositionRoundTrip(t *testing.T) {
	for _, text := range positionTexts {
		for _, enc := range []encoding{encUTF16, encUTF8} {
			for off := 0; off <= len(text); off++ {
				if off < len(text) && !utf8.RuneStart(text[off]) {
					continue
				}
				if off > 0 && off < len(text) && text[off-1] == '\r' && text[off] == '\n' {
					continue // inside a CRLF terminator: no LSP position
				}
				want := reference(text, off, enc)
				got := enc.toPosition([]byte(text), off)
				if got != want {
					t.Errorf("%s toPosition(%q, %d) = %+v, want %+v", enc, text, off, got, want)
				}
				back, err := enc.toOffset([]byte(text), got)
				if err != nil || back != off {
					t.Errorf("%s toOffset(%q, %+v) = %d, %v, want %d", enc, text, got, back, err, off)
				}
			}
		}
	}
}

// TestPositionEdges covers positions that do not name a rune boundary.
func TestPositionEdges(t *testing.T) {
	const text = "a😀b\nλ\r\nend"
	for _, tc := range []struct {
		name string
		enc  encoding
		pos  Position
		want int // byte offset, -1 for an error
	}{
		// LSP 3.17: a character beyond the line's length means its end.
		{"past end of line", encUTF16, Position{0, 99}, 6},
		{"past end before CRLF", encUTF16, Position{1, 99}, 9},
		// Inside the surrogate pair of 😀: the rune's start.
		{"inside surrogate pair", encUTF16, Position{0, 2}, 1},
		{"after surrogate pair", encUTF16, Position{0, 3}, 5},
		{"inside a UTF-8 sequence", encUTF8, Position{0, 3}, 1},
		{"last line", encUTF16, Position{2, 3}, 14},
		{"line past the end", encUTF16, Position{3, 0}, -1},
	} {
		got, err := tc.enc.toOffset([]byte(text), tc.pos)
		if tc.want < 0 {
			if err == nil {
				t.Errorf("%s: got offset %d, want an error", tc.name, got)
			}
			continue
		}
		if err != nil || got != tc.want {
			t.Errorf("%s: toOffset(%+v) = %d, %v, want %d", tc.name, tc.pos, got, err, tc.want)
		}
	}
}

func TestChooseEncoding(t *testing.T) {
	for _, tc := range []struct {
		offered []string
		want    encoding
	}{
		{nil, encUTF16},
		{[]string{"utf-16"}, encUTF16},
		{[]string{"utf-32", "utf-16"}, encUTF16},
		{[]string{"utf-16", "utf-8"}, encUTF8},
	} {
		if got := chooseEncoding(tc.offered); got != tc.want {
			t.Errorf("chooseEncoding(%q) = %s, want %s", tc.offered, got, tc.want)
		}
	}
}
