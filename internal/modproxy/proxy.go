// Package modproxy builds a module proxy in a directory, to be served to
// the go command as GOPROXY=file://DIR. The layout is the one the go
// command's GOPROXY protocol defines (see "go help goproxy"): for each
// module, $escapedPath/@v/list, and $version.info, .mod and .zip.
//
// The project's release tests publish the working tree into such a
// proxy, together with copies of its dependencies from the local module
// cache, and then install the command and fetch the helper module from it
// exactly as a user would from proxy.golang.org, with no network.
package modproxy

import (
	"bytes"
	"encoding/json"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"time"

	"golang.org/x/mod/module"
	"golang.org/x/mod/semver"
	modzip "golang.org/x/mod/zip"
)

// A Proxy is a file-based module proxy rooted at Dir.
type Proxy struct {
	Dir string
}

// URL is the value of GOPROXY that serves p.
func (p *Proxy) URL() string {
	return "file://" + filepath.ToSlash(p.Dir)
}

// versionDir returns the @v directory of module path, created if needed.
func (p *Proxy) versionDir(path string) (string, error) {
	esc, err := module.EscapePath(path)
	if err != nil {
		return "", err
	}
	dir := filepath.Join(p.Dir, filepath.FromSlash(esc), "@v")
	return dir, os.MkdirAll(dir, 0o755)
}

// PublishDir publishes the module in dir, whose go.mod must declare
// path, at version: it writes the module zip (made by x/mod's zip
// package, which leaves out nested modules and VCS directories as the go
// command does), the go.mod file and an info file, and lists the version.
func (p *Proxy) PublishDir(path, version, dir string) error {
	if !semver.IsValid(version) {
		return fmt.Errorf("modproxy: %q is not a semantic version", version)
	}
	m := module.Version{Path: path, Version: version}
	if err := module.Check(path, version); err != nil {
		return err
	}
	gomod, err := os.ReadFile(filepath.Join(dir, "go.mod"))
	if err != nil {
		return err
	}
	var zip bytes.Buffer
	if err := modzip.CreateFromDir(&zip, m, dir); err != nil {
		return err
	}
	info, err := json.Marshal(struct {
		Version string
		Time    time.Time
	}{version, time.Now().UTC().Truncate(time.Second)})
	if err != nil {
		return err
	}
	return p.write(m, map[string][]byte{".zip": zip.Bytes(), ".mod": gomod, ".info": info})
}

// CopyFromCache publishes each module version as the local module cache
// holds it: cacheDir is $(go env GOMODCACHE)/cache/download, which has
// the proxy layout itself. A version whose zip the cache lacks is copied
// without it, since the go command often needs only a go.mod file.
func (p *Proxy) CopyFromCache(cacheDir string, mods []module.Version) error {
	for _, m := range mods {
		esc, err := module.EscapePath(m.Path)
		if err != nil {
			return err
		}
		ver, err := module.EscapeVersion(m.Version)
		if err != nil {
			return err
		}
		src := filepath.Join(cacheDir, filepath.FromSlash(esc), "@v", ver)
		files := make(map[string][]byte)
		for _, ext := range []string{".info", ".mod", ".zip"} {
			data, err := os.ReadFile(src + ext)
			if os.IsNotExist(err) && ext != ".mod" {
				continue
			}
			if err != nil {
				return fmt.Errorf("modproxy: %s is not in the module cache: %v", m, err)
			}
			files[ext] = data
		}
		if err := p.write(m, files); err != nil {
			return err
		}
	}
	return nil
}

// write stores the files of one module version and adds it to the list.
func (p *Proxy) write(m module.Version, files map[string][]byte) error {
	dir, err := p.versionDir(m.Path)
	if err != nil {
		return err
	}
	ver, err := module.EscapeVersion(m.Version)
	if err != nil {
		return err
	}
	for ext, data := range files {
		if err := os.WriteFile(filepath.Join(dir, ver+ext), data, 0o644); err != nil {
			return err
		}
	}
	return p.addToList(dir, m.Version)
}

// addToList adds version to the module's list file, which answers the
// go command's @latest and version queries.
func (p *Proxy) addToList(dir, version string) error {
	name := filepath.Join(dir, "list")
	f, err := os.OpenFile(name, os.O_RDWR|os.O_CREATE, 0o644)
	if err != nil {
		return err
	}
	defer f.Close()
	data, err := io.ReadAll(f)
	if err != nil {
		return err
	}
	versions := strings.Fields(string(data))
	if slices.Contains(versions, version) {
		return nil
	}
	versions = append(versions, version)
	semver.Sort(versions)
	if err := f.Truncate(0); err != nil {
		return err
	}
	_, err = f.WriteAt([]byte(strings.Join(versions, "\n")+"\n"), 0)
	return err
}
