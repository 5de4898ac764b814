package textedit

import "testing"

func TestApply(t *testing.T) {
	// Expected outputs written by hand.
	tests := []struct {
		name  string
		src   string
		edits []Edit
		want  string
	}{
		{"replace", "return a / b\n", []Edit{{7, 12, "q"}}, "return q\n"},
		{"unsorted", "abcdef", []Edit{{4, 5, "E"}, {0, 1, "A"}}, "AbcdEf"},
		{"insert then replace at one offset", "x = y", []Edit{{4, 4, "(z) + "}, {4, 5, "w"}}, "x = (z) + w"},
		{"two insertions keep their order", "p", []Edit{{1, 1, "1"}, {1, 1, "2"}}, "p12"},
		{"LF file keeps LF", "a\nb\n", []Edit{{2, 2, "x\ny\n"}}, "a\nx\ny\nb\n"},
		{"CRLF file gets CRLF", "a\r\nb\r\n", []Edit{{3, 3, "x\ny\n"}}, "a\r\nx\r\ny\r\nb\r\n"},
		{"CRLF text in a CRLF file is not doubled", "a\r\nb\r\n", []Edit{{3, 3, "x\r\n"}}, "a\r\nx\r\nb\r\n"},
		{"no newline at all", "abc", []Edit{{3, 3, "\nd"}}, "abc\nd"},
	}
	for _, tt := range tests {
		got, err := Apply([]byte(tt.src), tt.edits)
		if err != nil {
			t.Errorf("%s: %v", tt.name, err)
			continue
		}
		if string(got) != tt.want {
			t.Errorf("%s: Apply = %q, want %q", tt.name, got, tt.want)
		}
	}
	for _, bad := range [][]Edit{
		{{0, 5, "x"}, {3, 8, "y"}}, // overlapping
		{{2, 20, ""}},              // past the end
		{{4, 2, ""}},               // reversed
	} {
		if got, err := Apply([]byte("0123456789"), bad); err == nil {
			t.Errorf("Apply(%v) = %q, want an error", bad, got)
		}
	}
}

func TestClashes(t *testing.T) {
	tests := []struct {
		a, b Edit
		want bool
	}{
		{Edit{0, 5, ""}, Edit{5, 9, ""}, false}, // adjacent
		{Edit{0, 5, ""}, Edit{4, 9, ""}, true},
		{Edit{3, 3, "x"}, Edit{3, 3, "y"}, true}, // two insertions at one point
		{Edit{3, 3, "x"}, Edit{0, 9, ""}, true},  // insertion inside a deletion
		{Edit{0, 3, ""}, Edit{3, 3, "x"}, false}, // insertion at a deletion's end
	}
	for _, tt := range tests {
		if got := tt.a.Clashes(tt.b); got != tt.want {
			t.Errorf("%v clashes with %v = %v, want %v", tt.a, tt.b, got, tt.want)
		}
		if got := tt.b.Clashes(tt.a); got != tt.want {
			t.Errorf("%v clashes with %v = %v, want %v", tt.b, tt.a, got, tt.want)
		}
	}
}
