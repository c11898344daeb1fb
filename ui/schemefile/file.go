package schemefile

import (
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"

	"upright/ui/model"
)

// Extension is the file-name extension of scheme files.
const Extension = ".upright.json"

// Load reads and checks the scheme file at path. It refuses, with an *Error
// naming the file, anything that is not a regular file of at most MaxSize
// bytes and everything Unmarshal refuses.
func Load(path string) (model.Scheme, error) {
	f, err := os.Open(path)
	if err != nil {
		return model.Scheme{}, &Error{File: path, Msg: "cannot open: " + plainOSError(err), Err: err}
	}
	defer f.Close()
	fi, err := f.Stat()
	if err != nil {
		return model.Scheme{}, &Error{File: path, Msg: "cannot read: " + plainOSError(err), Err: err}
	}
	if !fi.Mode().IsRegular() {
		return model.Scheme{}, &Error{File: path, Msg: "not a regular file; give the path of a scheme file"}
	}
	if fi.Size() > MaxSize {
		return model.Scheme{}, &Error{File: path, Msg: fmt.Sprintf("the file is %s; a scheme file is at most 1 MiB (%d bytes)", sizeText(fi.Size()), MaxSize)}
	}
	// Read at most one byte past the limit, in case the file grew.
	data, err := io.ReadAll(io.LimitReader(f, MaxSize+1))
	if err != nil {
		return model.Scheme{}, &Error{File: path, Msg: "cannot read: " + plainOSError(err), Err: err}
	}
	sc, err := Unmarshal(data)
	if err != nil {
		var fe *Error
		if errors.As(err, &fe) {
			fe.File = path
			return model.Scheme{}, fe
		}
		return model.Scheme{}, &Error{File: path, Msg: err.Error(), Err: err}
	}
	return sc, nil
}

// plainOSError drops the operation and path from an *os.PathError, which
// the *Error already names.
func plainOSError(err error) string {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err.Error()
	}
	return err.Error()
}

// Save writes sc to path atomically: it marshals the scheme (refusing one
// Marshal refuses), writes a temporary file in the same directory, flushes
// it to disk, renames it over path and flushes the directory. If any step
// fails the temporary file is removed and the file at path, if any, is left
// exactly as it was. An existing file keeps its permission bits; a new one
// gets 0644. When path is a symbolic link the file it points to is replaced.
func Save(path string, sc model.Scheme) error {
	data, err := Marshal(sc)
	if err != nil {
		var fe *Error
		if errors.As(err, &fe) {
			fe.File = path
			return fe
		}
		return &Error{File: path, Msg: err.Error(), Err: err}
	}
	return saveData(path, data)
}

// saveData writes marshalled data atomically, wrapping failures in *Error.
func saveData(path string, data []byte) error {
	if err := writeAtomic(path, data); err != nil {
		var de *dirSyncError
		if errors.As(err, &de) {
			return &Error{File: path, Msg: "saved, but the directory could not be flushed to disk: " + plainOSError(de.err), Err: de.err}
		}
		return &Error{File: path, Msg: "not saved (the previous file, if any, is unchanged): " + plainOSError(err), Err: err}
	}
	return nil
}

// WriteFileAtomic replaces the file at path with data the way Save does
// (temporary file in the same directory, flush, rename, flush the
// directory), so that a failure leaves any previous file intact. The
// report and CSV exports use it.
func WriteFileAtomic(path string, data []byte) error {
	return saveData(path, data)
}

// Hooks through which tests inject failures into writeAtomic.
var (
	writeFile = func(f *os.File, b []byte) (int, error) { return f.Write(b) }
	syncFile  = func(f *os.File) error { return f.Sync() }
	rename    = os.Rename
)

// writeAtomic replaces path with data by way of a temporary file in the same
// directory, so that readers see either the old content or the new.
func writeAtomic(path string, data []byte) (err error) {
	if target, e := filepath.EvalSymlinks(path); e == nil {
		path = target
	}
	mode := os.FileMode(0o644)
	if fi, e := os.Stat(path); e == nil {
		if !fi.Mode().IsRegular() {
			return fmt.Errorf("%s exists and is not a regular file", path)
		}
		mode = fi.Mode().Perm()
	}
	dir := filepath.Dir(path)
	tmp, err := os.CreateTemp(dir, "."+filepath.Base(path)+".*.tmp")
	if err != nil {
		return err
	}
	name := tmp.Name()
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(name)
		}
	}()
	n, err := writeFile(tmp, data)
	if err == nil && n != len(data) {
		err = io.ErrShortWrite
	}
	if err != nil {
		return err
	}
	if err = syncFile(tmp); err != nil {
		return err
	}
	if err = tmp.Chmod(mode); err != nil && runtime.GOOS != "windows" {
		return err
	}
	if err = tmp.Close(); err != nil {
		return err
	}
	if err = rename(name, path); err != nil {
		return err
	}
	if e := syncDir(dir); e != nil {
		return &dirSyncError{e}
	}
	return nil
}

// dirSyncError is a failure to flush the directory after the rename: the
// new file is in place.
type dirSyncError struct{ err error }

func (e *dirSyncError) Error() string { return e.err.Error() }

// syncDir flushes a directory so that a rename in it survives a crash.
// Windows cannot open a directory for syncing; there it does nothing.
func syncDir(dir string) error {
	if runtime.GOOS == "windows" {
		return nil
	}
	d, err := os.Open(dir)
	if err != nil {
		return err
	}
	defer d.Close()
	return d.Sync()
}
