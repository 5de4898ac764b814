package driver

import (
	"fmt"
	"os"
	"path/filepath"
)

// writeFixed writes the fixed text of every change, or of none. The fixes
// of one run depend on each other (a range guard written into one file
// silences the finding whose rewrite is in another), so a run that can
// write only some of its files writes none of them and says why.
//
// First every target is checked: it still holds the text the analysis
// saw, it is a regular file with write permission, and it has no other
// hard link. Then the new text of each goes to a temporary file beside
// it, with the original's mode and owner. Only when all are ready are
// they renamed over the originals, each just after checking once more
// that the original has not changed. A symbolic link is written through:
// the file it points to is replaced and the link stays.
func (r *run) writeFixed(changes []change) {
	targets, problems := r.targets(changes)
	if len(problems) > 0 {
		for _, err := range problems {
			r.errorf("%v", err)
		}
		r.errorf("no file written: %d of the %d files to fix cannot be written safely", len(problems), len(changes))
		return
	}
	defer func() {
		for _, t := range targets {
			if t.tmp != "" {
				os.Remove(t.tmp) // after its rename there is nothing to remove
			}
		}
	}()
	for i := range targets {
		if err := targets[i].stage(targets[i].new); err != nil {
			r.errorf("%v; no file written", err)
			return
		}
	}
	for i, t := range targets {
		if testHookBeforeRename != nil {
			testHookBeforeRename(t.name)
		}
		if err := t.unchanged(r.src); err != nil {
			if i == 0 {
				r.errorf("%v; no file written", err)
			} else {
				r.errorf("%v; restoring the files already written", err)
				r.restore(targets[:i])
			}
			return
		}
		if err := os.Rename(t.tmp, t.path); err != nil {
			r.errorf("cannot write %s: %v; restoring the files already written", t.name, err)
			r.restore(targets[:i])
			return
		}
		targets[i].tmp = ""
	}
}

// testHookBeforeRename, when set by a test, runs just before each
// target's last check and rename.
var testHookBeforeRename func(name string)

// A target is a file -fix writes.
type target struct {
	change
	path string      // the file written: name with symbolic links resolved
	info os.FileInfo // the file's, before writing
	tmp  string      // the temporary file holding the new text, until renamed
}

// targets checks that every change can be written, and returns the
// targets with every reason one cannot.
func (r *run) targets(changes []change) ([]target, []error) {
	var out []target
	var problems []error
	byPath := make(map[string]string)
	for _, c := range changes {
		t, err := r.target(c)
		if err == nil {
			if other, ok := byPath[t.path]; ok {
				err = fmt.Errorf("%s and %s are the same file %s; fixing both could lose the fixes of one", other, c.name, t.path)
			}
			byPath[t.path] = c.name
		}
		if err != nil {
			problems = append(problems, err)
			continue
		}
		out = append(out, t)
	}
	return out, problems
}

func (r *run) target(c change) (target, error) {
	t := target{change: c}
	path, err := filepath.EvalSymlinks(c.name)
	if err != nil {
		return t, err
	}
	t.path = path
	if t.info, err = os.Stat(path); err != nil {
		return t, err
	}
	if !t.info.Mode().IsRegular() {
		return t, fmt.Errorf("%s is not a regular file", c.name)
	}
	// A file without write permission is refused even when the process
	// could replace it (as root can): its owner marked it read-only.
	if t.info.Mode().Perm()&0o200 == 0 {
		return t, fmt.Errorf("%s is read-only", c.name)
	}
	// Replacing the file would leave its other names with the old text;
	// writing it in place could leave it half-written.
	if n := hardLinks(t.info); n > 1 {
		return t, fmt.Errorf("%s has %d hard links, which writing it would break; apply the fixes with -diff and a tool that writes in place", c.name, n)
	}
	return t, t.unchanged(r.src)
}

// unchanged reports an error unless the file still holds the text the
// analysis saw.
func (t target) unchanged(src *sources) error {
	content, err := os.ReadFile(t.path)
	if err != nil {
		return err
	}
	return src.check(t.name, content)
}

// stage writes content to a new temporary file beside the target, with
// the target's owner and mode.
func (t *target) stage(content []byte) error {
	tmp, err := os.CreateTemp(filepath.Dir(t.path), "."+filepath.Base(t.path)+".overfact-*")
	if err != nil {
		return fmt.Errorf("cannot write %s: %v", t.name, err)
	}
	t.tmp = tmp.Name()
	_, err = tmp.Write(content)
	if err == nil {
		err = tmp.Sync()
	}
	if err == nil {
		// The owner first: changing it may clear set-id bits.
		err = keepOwner(tmp, t.info)
	}
	if err == nil {
		err = tmp.Chmod(t.info.Mode() & (os.ModePerm | os.ModeSetuid | os.ModeSetgid | os.ModeSticky))
	}
	if cerr := tmp.Close(); err == nil {
		err = cerr
	}
	if err != nil {
		return fmt.Errorf("cannot write %s: %v", t.name, err)
	}
	return nil
}

// restore puts back the analysed text of targets already written, after
// a later one failed, so that the run still leaves all or nothing.
func (r *run) restore(written []target) {
	for _, t := range written {
		t.tmp = ""
		err := t.stage(t.old)
		if err == nil {
			err = os.Rename(t.tmp, t.path)
		}
		if err != nil {
			os.Remove(t.tmp)
			r.errorf("could not restore %s: %v", t.name, err)
		}
	}
}

// writeFile replaces one file that is not a source the analysis read (a
// go.mod) the way writeFixed replaces sources: through a temporary file
// beside it, with its mode and owner, and through a symbolic link.
func writeFile(name string, content []byte) error {
	path, err := filepath.EvalSymlinks(name)
	if err != nil {
		return err
	}
	t := target{change: change{name: name}, path: path}
	if t.info, err = os.Stat(path); err != nil {
		return err
	}
	if err := t.stage(content); err != nil {
		return err
	}
	if err := os.Rename(t.tmp, path); err != nil {
		os.Remove(t.tmp)
		return fmt.Errorf("cannot write %s: %v", name, err)
	}
	return nil
}
