//go:build unix

package driver

import (
	"fmt"
	"os"
	"syscall"
)

// hardLinks returns the number of names of the file.
func hardLinks(info os.FileInfo) uint64 {
	if st, ok := info.Sys().(*syscall.Stat_t); ok {
		return uint64(st.Nlink)
	}
	return 1
}

// keepOwner gives f the owner and group of the file info describes, when
// they differ from f's; a process that may not (not root, and not the
// owner) gets an error, and the file is not fixed.
func keepOwner(f *os.File, info os.FileInfo) error {
	uid, gid, ok := ownerOf(info)
	if !ok {
		return nil
	}
	fi, err := f.Stat()
	if err != nil {
		return err
	}
	if u, g, ok := ownerOf(fi); !ok || u == uid && g == gid {
		return nil
	}
	if err := f.Chown(uid, gid); err != nil {
		return fmt.Errorf("cannot keep its owner %d:%d: %v", uid, gid, err)
	}
	return nil
}

// ownerOf returns the owner and group of the file info describes.
func ownerOf(info os.FileInfo) (uid, gid int, ok bool) {
	st, ok := info.Sys().(*syscall.Stat_t)
	if !ok {
		return 0, 0, false
	}
	return int(st.Uid), int(st.Gid), true
}
