package textedit

import "testing"

// TestEmptiedImports checks which imports are dropped after fixes:
// only one whose name the old text used and the fixed text no longer
// does, with its whole line.
func TestEmptiedImports(t *testing.T) {
	for _, tt := range []struct{ name, old, fixed, want string }{
		{
			name:  "lone import emptied",
			old:   "package p\n\nimport \"math\"\n\nvar x = math.Pi\n",
			fixed: "package p\n\nimport \"math\"\n\nvar x = 3.14\n",
			want:  "package p\n\n\nvar x = 3.14\n",
		},
		{
			name:  "spec of a group emptied, its line goes",
			old:   "package p\n\nimport (\n\t\"fmt\"\n\t\"math\"\n)\n\nvar x, y = math.Pi, fmt.Sprint(1)\n",
			fixed: "package p\n\nimport (\n\t\"fmt\"\n\t\"math\"\n)\n\nvar x, y = 3.14, fmt.Sprint(1)\n",
			want:  "package p\n\nimport (\n\t\"fmt\"\n)\n\nvar x, y = 3.14, fmt.Sprint(1)\n",
		},
		{
			name:  "still used",
			old:   "package p\n\nimport \"math\"\n\nvar x, y = math.Pi, math.E\n",
			fixed: "package p\n\nimport \"math\"\n\nvar x, y = 3.14, math.E\n",
			want:  "package p\n\nimport \"math\"\n\nvar x, y = 3.14, math.E\n",
		},
		{
			name:  "unused before the fixes: left to the compiler",
			old:   "package p\n\nimport \"math\"\n",
			fixed: "package p\n\nimport \"math\"\n\nvar x = 1\n",
			want:  "package p\n\nimport \"math\"\n\nvar x = 1\n",
		},
		{
			name:  "named, blank and dot imports",
			old:   "package p\n\nimport (\n\tm \"math\"\n\t_ \"embed\"\n\t. \"strings\"\n)\n\nvar x, y = m.Pi, ToUpper(\"a\")\n",
			fixed: "package p\n\nimport (\n\tm \"math\"\n\t_ \"embed\"\n\t. \"strings\"\n)\n\nvar x, y = 3.14, ToUpper(\"a\")\n",
			want:  "package p\n\nimport (\n\t_ \"embed\"\n\t. \"strings\"\n)\n\nvar x, y = 3.14, ToUpper(\"a\")\n",
		},
		{
			name:  "a path whose last element is not the name is kept",
			old:   "package p\n\nimport \"gopkg.in/yaml.v3\"\n\nvar x = yaml.Marshal\n",
			fixed: "package p\n\nimport \"gopkg.in/yaml.v3\"\n\nvar x = 1\n",
			want:  "package p\n\nimport \"gopkg.in/yaml.v3\"\n\nvar x = 1\n",
		},
		{
			name:  "CRLF lines",
			old:   "package p\r\n\r\nimport (\r\n\t\"fmt\"\r\n\t\"math\"\r\n)\r\n\r\nvar x, y = math.Pi, fmt.Sprint(1)\r\n",
			fixed: "package p\r\n\r\nimport (\r\n\t\"fmt\"\r\n\t\"math\"\r\n)\r\n\r\nvar x, y = 3.14, fmt.Sprint(1)\r\n",
			want:  "package p\r\n\r\nimport (\r\n\t\"fmt\"\r\n)\r\n\r\nvar x, y = 3.14, fmt.Sprint(1)\r\n",
		},
	} {
		got, err := Apply([]byte(tt.fixed), EmptiedImports([]byte(tt.old), []byte(tt.fixed)))
		if err != nil || string(got) != tt.want {
			t.Errorf("%s: got %q (%v), want %q", tt.name, got, err, tt.want)
		}
	}
}
