//go:build !unix

package driver

import "os"

// hardLinks returns the number of names of the file, which this system
// does not report: 1.
func hardLinks(os.FileInfo) uint64 { return 1 }

// keepOwner keeps nothing: this system has no Unix owner to keep.
func keepOwner(*os.File, os.FileInfo) error { return nil }

// ownerOf reports no owner: this system has none to report.
func ownerOf(os.FileInfo) (uid, gid int, ok bool) { return 0, 0, false }
