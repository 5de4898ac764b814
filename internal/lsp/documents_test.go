package lsp

import (
	"path/filepath"
	"testing"
)

// TestIncrementalChanges applies sequences of TextDocumentContentChangeEvent
// as LSP 3.17 defines them: each range refers to the text left by the
// previous change of the same notification. Expected texts are worked out
// by hand from the edits.
func TestIncrementalChanges(t *testing.T) {
	rng := func(l1, c1, l2, c2 uint32) *Range {
		return &Range{Start: Position{l1, c1}, End: Position{l2, c2}}
	}
	for _, tc := range []struct {
		name    string
		text    string
		enc     encoding
		changes []contentChange
		want    string
	}{
		{"insert", "ab\ncd\n", encUTF16, []contentChange{{Range: rng(1, 1, 1, 1), Text: "X"}}, "ab\ncXd\n"},
		{"delete across lines", "ab\ncd\n", encUTF16, []contentChange{{Range: rng(0, 1, 1, 1), Text: ""}}, "ad\n"},
		{"append at end", "ab\n", encUTF16, []contentChange{{Range: rng(1, 0, 1, 0), Text: "cd\n"}}, "ab\ncd\n"},
		{"full replace", "ab\n", encUTF16, []contentChange{{Text: "new\n"}}, "new\n"},
		{"sequence", "abc\n", encUTF16, []contentChange{
			{Range: rng(0, 0, 0, 1), Text: "xy"},    // xybc
			{Range: rng(0, 4, 0, 4), Text: "\nz"},   // xybc\nz
			{Range: rng(1, 0, 1, 1), Text: "done"}}, // xybc\ndone
			"xybc\ndone\n"},
		// é is one UTF-16 unit and two bytes; 😀 two units and four bytes.
		{"after non-ASCII utf-16", "é😀x\n", encUTF16, []contentChange{{Range: rng(0, 3, 0, 4), Text: "y"}}, "é😀y\n"},
		{"after non-ASCII utf-8", "é😀x\n", encUTF8, []contentChange{{Range: rng(0, 6, 0, 7), Text: "y"}}, "é😀y\n"},
		{"replace a surrogate pair", "a😀b", encUTF16, []contentChange{{Range: rng(0, 1, 0, 3), Text: "-"}}, "a-b"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			ds := newDocuments()
			path := filepath.Join(t.TempDir(), "x.go")
			uri := pathToURI(path)
			if _, err := ds.open(uri, 1, tc.text); err != nil {
				t.Fatal(err)
			}
			if err := ds.change(uri, 2, tc.changes, tc.enc); err != nil {
				t.Fatal(err)
			}
			d := ds.get(path)
			if got := string(d.text); got != tc.want || d.version != 2 {
				t.Errorf("text = %q (version %d), want %q", got, d.version, tc.want)
			}
		})
	}
}

func TestChangeErrors(t *testing.T) {
	ds := newDocuments()
	uri := pathToURI(filepath.Join(t.TempDir(), "x.go"))
	if err := ds.change(uri, 2, []contentChange{{Text: "x"}}, encUTF16); err == nil {
		t.Error("change of a closed document succeeded")
	}
	ds.open(uri, 1, "ab\n")
	bad := &Range{Start: Position{5, 0}, End: Position{5, 0}}
	if err := ds.change(uri, 2, []contentChange{{Range: bad, Text: "x"}}, encUTF16); err == nil {
		t.Error("change beyond the end succeeded")
	}
	backwards := &Range{Start: Position{0, 2}, End: Position{0, 1}}
	if err := ds.change(uri, 2, []contentChange{{Range: backwards, Text: "x"}}, encUTF16); err == nil {
		t.Error("backwards range succeeded")
	}
}

// TestURIs checks RFC 8089 file URIs, including percent-encoded spaces
// and non-ASCII names as editors send them.
func TestURIs(t *testing.T) {
	for _, tc := range []struct{ uri, path string }{
		{"file:///home/desk/a.go", "/home/desk/a.go"},
		{"file:///home/my%20desk/%C3%A9.go", "/home/my desk/é.go"},
		{"file:///home/desk/../desk/a.go", "/home/desk/a.go"},
	} {
		got, err := uriToPath(tc.uri)
		if err != nil || got != tc.path {
			t.Errorf("uriToPath(%s) = %q, %v, want %q", tc.uri, got, err, tc.path)
		}
		if back, _ := uriToPath(pathToURI(got)); back != got {
			t.Errorf("pathToURI(%q) does not round-trip: %s", got, pathToURI(got))
		}
	}
	for _, bad := range []string{"untitled:Untitled-1", "file:relative.go", "::"} {
		if p, err := uriToPath(bad); err == nil {
			t.Errorf("uriToPath(%s) = %q, want an error", bad, p)
		}
	}
}
