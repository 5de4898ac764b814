package repocheck

import (
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"testing"
)

// TestDevelopersNamesEveryFile checks that DEVELOPERS.md's layout tables
// match the tree: every non-test Go file of analyzer/ and fixes/ is
// named in the part of the guide that describes its package (the
// package's row of the layout table, the category table and the support
// tables), and every file those parts name exists.
func TestDevelopersNamesEveryFile(t *testing.T) {
	doc, err := os.ReadFile(filepath.Join("..", "..", "DEVELOPERS.md"))
	if err != nil {
		t.Fatal(err)
	}
	text := string(doc)
	row := func(path string) string {
		for _, l := range strings.Split(text, "\n") {
			if strings.HasPrefix(l, "| `"+path+"` |") {
				return l
			}
		}
		t.Fatalf("DEVELOPERS.md has no layout row for %s", path)
		return ""
	}
	between := func(from, to string) string {
		i, j := strings.Index(text, from), strings.Index(text, to)
		if i < 0 || j < i {
			t.Fatalf("DEVELOPERS.md lacks %q before %q", from, to)
		}
		return text[i:j]
	}
	parts := map[string]string{
		"analyzer": row("analyzer/") + between("### Where each category lives", "Files of `fixes/`"),
		"fixes":    row("fixes/") + between("Files of `fixes/`", "### Modules"),
	}
	for dir, part := range parts {
		named := map[string]bool{}
		for _, m := range regexp.MustCompile("`(?:"+dir+"/)?([a-z0-9_]+\\.go)`").FindAllStringSubmatch(part, -1) {
			named[m[1]] = true
		}
		// A path spelled out anywhere names the file too.
		for _, m := range regexp.MustCompile("`"+dir+"/([a-z0-9_]+\\.go)`").FindAllStringSubmatch(text, -1) {
			named[m[1]] = true
		}
		files, err := filepath.Glob(filepath.Join("..", "..", dir, "*.go"))
		if err != nil {
			t.Fatal(err)
		}
		have := map[string]bool{}
		for _, f := range files {
			if name := filepath.Base(f); !strings.HasSuffix(name, "_test.go") {
				have[name] = true
			}
		}
		var missing, stale []string
		for name := range have {
			if !named[name] {
				missing = append(missing, name)
			}
		}
		for name := range named {
			if !have[name] && !strings.HasSuffix(name, "_test.go") {
				stale = append(stale, name)
			}
		}
		sort.Strings(missing)
		sort.Strings(stale)
		if len(missing) > 0 {
			t.Errorf("DEVELOPERS.md does not name these files of %s/: %v", dir, missing)
		}
		if len(stale) > 0 {
			t.Errorf("DEVELOPERS.md names files %s/ does not have: %v", dir, stale)
		}
	}
}

// TestDevelopersNamesEveryPackage checks the layout table against the
// folders that hold Go code: every such folder outside testdata has a
// row, its own or an enclosing folder's, and every folder a row names
// exists.
func TestDevelopersNamesEveryPackage(t *testing.T) {
	doc, err := os.ReadFile(filepath.Join("..", "..", "DEVELOPERS.md"))
	if err != nil {
		t.Fatal(err)
	}
	rows := map[string]bool{}
	for _, m := range regexp.MustCompile("(?m)^\\| `([a-z0-9_./-]+)/` \\|").FindAllStringSubmatch(string(doc), -1) {
		rows[m[1]] = true
	}
	root := filepath.Join("..", "..")
	for dir := range rows {
		if fi, err := os.Stat(filepath.Join(root, dir)); err != nil || !fi.IsDir() {
			t.Errorf("DEVELOPERS.md has a row for %s/, which is no folder", dir)
		}
	}
	err = filepath.WalkDir(root, func(path string, d os.DirEntry, err error) error {
		if err != nil {
			return err
		}
		if d.IsDir() && (d.Name() == "testdata" || strings.HasPrefix(d.Name(), ".") && path != root) {
			return filepath.SkipDir
		}
		if d.IsDir() || !strings.HasSuffix(path, ".go") {
			return nil
		}
		rel, _ := filepath.Rel(root, filepath.Dir(path))
		rel = filepath.ToSlash(rel)
		for p := rel; p != "." && p != "/"; p = filepath.ToSlash(filepath.Dir(p)) {
			if rows[p] {
				return nil
			}
		}
		t.Errorf("DEVELOPERS.md's layout table has no row for %s/ or a folder holding it", rel)
		return filepath.SkipDir
	})
	if err != nil {
		t.Fatal(err)
	}
}
