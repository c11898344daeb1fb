package schemefile

import (
	"errors"
	"fmt"
	"maps"
	"slices"
	"sync"
	"time"

	"upright/ui/model"
)

// Autosaver writes the latest scheme it is given to one path from its own
// goroutine: never more often than once per interval, after the edits have
// paused for a quarter of the interval (debounced), and at the latest one
// interval after the first unsaved edit, so steady editing is still saved.
// Every write is atomic (Save). Stop ends the goroutine.
type Autosaver struct {
	path    string
	every   time.Duration
	quiet   time.Duration
	onError func(error)

	wmu        sync.Mutex    // held for a whole write
	mu         sync.Mutex    // guards the fields below
	pending    *model.Scheme // latest unsaved scheme; nil when saved
	firstDirty time.Time     // when pending first became unsaved
	lastChange time.Time     // when pending was last replaced
	lastWrite  time.Time     // when the last write was attempted
	lastErr    error
	onSaved    func(start time.Time) // called after each successful write with when it began; tests set it
	stopped    bool

	wake chan struct{}
	stop chan struct{}
	done chan struct{}
	once sync.Once
}

// NewAutosaver starts an autosaver writing to path at most once per every.
// onError, if not nil, is called from the autosaver's goroutine with each
// failed write. It refuses an empty path and an interval below 10 ms.
func NewAutosaver(path string, every time.Duration, onError func(error)) (*Autosaver, error) {
	if path == "" {
		return nil, errors.New("autosave path: empty; give the file to write the scheme to")
	}
	if every < 10*time.Millisecond {
		return nil, fmt.Errorf("autosave interval: %v is not accepted; give 10ms or more", every)
	}
	a := &Autosaver{
		path: path, every: every, quiet: every / 4, onError: onError,
		wake: make(chan struct{}, 1), stop: make(chan struct{}), done: make(chan struct{}),
	}
	go a.loop()
	return a, nil
}

// clone copies a scheme deeply, so that the caller may go on changing its
// slices and map while the autosaver writes the copy.
func clone(sc model.Scheme) model.Scheme {
	sc.Materials = slices.Clone(sc.Materials)
	sc.Steel.Families = slices.Clone(sc.Steel.Families)
	sc.Carbon = maps.Clone(sc.Carbon)
	return sc
}

// Update records sc as the scheme to save. It returns at once; the write
// happens later on the autosaver's goroutine. After Stop it does nothing.
func (a *Autosaver) Update(sc model.Scheme) {
	c := clone(sc)
	now := time.Now()
	a.mu.Lock()
	if a.stopped {
		a.mu.Unlock()
		return
	}
	if a.pending == nil {
		a.firstDirty = now
	}
	a.pending = &c
	a.lastChange = now
	a.mu.Unlock()
	select {
	case a.wake <- struct{}{}:
	default:
	}
}

// due returns when the pending scheme should be written; ok is false when
// nothing is pending. Call with a.mu held.
func (a *Autosaver) due() (at time.Time, ok bool) {
	if a.pending == nil {
		return time.Time{}, false
	}
	at = a.lastChange.Add(a.quiet)
	if latest := a.firstDirty.Add(a.every); latest.Before(at) {
		at = latest
	}
	if earliest := a.lastWrite.Add(a.every); !a.lastWrite.IsZero() && earliest.After(at) {
		at = earliest
	}
	return at, true
}

func (a *Autosaver) loop() {
	defer close(a.done)
	timer := time.NewTimer(time.Hour)
	timer.Stop()
	defer timer.Stop()
	for {
		a.mu.Lock()
		at, ok := a.due()
		a.mu.Unlock()
		if ok {
			timer.Reset(time.Until(at))
		}
		select {
		case <-a.stop:
			a.write()
			return
		case <-a.wake:
		case <-timer.C:
			a.mu.Lock()
			at, ok := a.due()
			a.mu.Unlock()
			if ok && !time.Now().Before(at) {
				a.write()
			}
		}
		timer.Stop()
	}
}

// write saves the pending scheme, if any. A scheme Marshal refuses is
// dropped (saving it again would fail again); after a failed write to disk
// the scheme stays pending and is retried one interval later. Writes are
// serialised so that an older scheme never lands over a newer one.
func (a *Autosaver) write() error {
	a.wmu.Lock()
	defer a.wmu.Unlock()
	a.mu.Lock()
	sc := a.pending
	if sc == nil {
		a.mu.Unlock()
		return nil
	}
	a.pending = nil
	a.lastWrite = time.Now()
	began := a.lastWrite
	a.mu.Unlock()
	data, err := Marshal(*sc)
	retry := false
	if err != nil {
		var fe *Error
		if errors.As(err, &fe) {
			fe.File = a.path
			fe.Msg = "not autosaved: " + fe.Msg
		}
	} else if err = saveData(a.path, data); err != nil {
		retry = true
	}
	a.mu.Lock()
	a.lastErr = err
	saved := a.onSaved
	if retry && a.pending == nil {
		a.pending = sc
		a.firstDirty = a.lastWrite
		a.lastChange = a.lastWrite
	}
	a.mu.Unlock()
	if err == nil && saved != nil {
		saved(began)
	}
	if err != nil && a.onError != nil {
		a.onError(err)
	}
	return err
}

// Flush writes the pending scheme now, if there is one, regardless of the
// interval (e.g. before the window closes), and returns the write's error.
// It may run on any goroutine.
func (a *Autosaver) Flush() error {
	return a.write()
}

// Stop writes the pending scheme, if any, ends the goroutine and returns the
// last write's error. Later calls do nothing and return the same error.
func (a *Autosaver) Stop() error {
	a.once.Do(func() {
		a.mu.Lock()
		a.stopped = true
		a.mu.Unlock()
		close(a.stop)
	})
	<-a.done
	a.mu.Lock()
	defer a.mu.Unlock()
	return a.lastErr
}

// Path returns the file the autosaver writes.
func (a *Autosaver) Path() string { return a.path }
