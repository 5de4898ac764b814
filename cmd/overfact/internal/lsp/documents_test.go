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
			if _, _, err := ds.open(uri, 1, tc.text); err != nil {
				t.Fatal(err)
			}
			if _, err := ds.change(uri, 2, tc.changes, tc.enc); err != nil {
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
	if _, err := ds.change(uri, 2, []contentChange{{Text: "x"}}, encUTF16); err == nil {
		t.Error("change of a closed document succeeded")
	}
	ds.open(uri, 1, "ab\n")
	bad := &Range{Start: Position{5, 0}, End: Position{5, 0}}
	if _, err := ds.change(uri, 2, []contentChange{{Range: bad, Text: "x"}}, encUTF16); err == nil {
		t.Error("change beyond the end succeeded")
	}
	backwards := &Range{Start: Position{0, 2}, End: Position{0, 1}}
	if _, err := ds.change(uri, 2, []contentChange{{Range: backwards, Text: "x"}}, encUTF16); err == nil {
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

// TestOutOfStepDocument follows a buffer through a change that cannot be
// applied: it stays out of step through incremental changes, whose ranges
// mean nothing without the client's text, and comes back in step with a
// full-text change, after which later changes of the same notification
// apply to that text (LSP 3.17 "DidChangeTextDocumentParams").
func TestOutOfStepDocument(t *testing.T) {
	ds := newDocuments()
	path := filepath.Join(t.TempDir(), "x.go")
	uri := pathToURI(path)
	ds.open(uri, 1, "ab\ncd\n")
	rng := func(l1, c1, l2, c2 uint32) *Range { return &Range{Start: Position{l1, c1}, End: Position{l2, c2}} }

	d, err := ds.change(uri, 2, []contentChange{{Range: rng(0, 0, 0, 0), Text: "x"}, {Range: rng(9, 0, 9, 0), Text: "y"}}, encUTF16)
	if err == nil || d.inStep() || d.version != 2 {
		t.Fatalf("after a change beyond the end: err %v, in step %v, version %d", err, d.inStep(), d.version)
	}
	if d2, err := ds.change(uri, 3, []contentChange{{Range: rng(0, 0, 0, 1), Text: "z"}}, encUTF16); err == nil || d2.inStep() || d2.version != 3 {
		t.Errorf("an incremental change put the document back in step (err %v)", err)
	}
	d, err = ds.change(uri, 4, []contentChange{{Range: rng(0, 0, 0, 0), Text: "lost"}, {Text: "new\n"}, {Range: rng(0, 3, 0, 3), Text: "er"}}, encUTF16)
	if err != nil || !d.inStep() || string(d.text) != "newer\n" || d.version != 4 {
		t.Errorf("after a full-text change: %q (version %d, in step %v, err %v), want \"newer\\n\" in step", d.text, d.version, d.inStep(), err)
	}
	if ds.get(path) != d {
		t.Error("the stored document is not the one returned")
	}
}

// TestReopen opens a buffer twice without a close: the second text wins,
// even at the same version.
func TestReopen(t *testing.T) {
	ds := newDocuments()
	uri := pathToURI(filepath.Join(t.TempDir(), "x.go"))
	first, _, _ := ds.open(uri, 1, "old\n")
	second, replaced, err := ds.open(uri, 1, "new\n")
	if err != nil || replaced != first || string(second.text) != "new\n" || second == first {
		t.Errorf("second open: %q, replaced %p (first %p), err %v", second.text, replaced, first, err)
	}
}
