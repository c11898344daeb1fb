package ui

import (
	"bytes"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/storage/repository"

	"upright/ui/schemefile"
)

// localFiles is what Fyne's own repository for file: URIs offers; the
// wrapper below keeps all of it and changes only how a file is written.
type localFiles interface {
	repository.WritableRepository
	repository.AppendableRepository
	repository.ListableRepository
	repository.HierarchicalRepository
	repository.CopyableRepository
	repository.MovableRepository
}

// atomicFiles is the file: repository with writers that never truncate the
// target: what is written is kept in memory and, on Close, written to a
// temporary file beside the target and renamed over it
// (schemefile.WriteFileAtomic). A writer closed without a byte written leaves
// the file as it was, so a save dialog that opens a writer and a save that
// then fails leave no empty file behind.
type atomicFiles struct{ localFiles }

// useAtomicFileWriters wraps the registered file: repository once, after the
// app's driver has registered its own.
func useAtomicFileWriters() {
	r, err := repository.ForScheme("file")
	if err != nil {
		return
	}
	if _, done := r.(atomicFiles); done {
		return
	}
	if lf, ok := r.(localFiles); ok {
		repository.Register("file", atomicFiles{lf})
	}
}

// Writer returns a writer that replaces the file atomically on Close.
func (a atomicFiles) Writer(u fyne.URI) (fyne.URIWriteCloser, error) {
	return &atomicWriter{uri: u}, nil
}

// atomicWriter gathers a file's new content and replaces the file on Close.
type atomicWriter struct {
	uri     fyne.URI
	buf     bytes.Buffer
	written bool
	closed  bool
}

func (w *atomicWriter) URI() fyne.URI { return w.uri }

func (w *atomicWriter) Write(p []byte) (int, error) {
	w.written = true
	return w.buf.Write(p)
}

// Close writes the gathered content, if any was written, beside the target
// and renames it into place.
func (w *atomicWriter) Close() error {
	if w.closed || !w.written {
		w.closed = true
		return nil
	}
	w.closed = true
	return schemefile.WriteFileAtomic(w.uri.Path(), w.buf.Bytes())
}
