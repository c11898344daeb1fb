package schemefile

import (
	"os"
	"path/filepath"
	"sync"
	"testing"
	"time"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
	"go.uber.org/goleak"

	"upright/ui/model"
)

// named returns the default scheme with a name, to tell versions apart.
func named(name string) model.Scheme {
	sc := model.DefaultScheme()
	sc.Name = name
	return sc
}

// writeTimes starts recording when each of an autosaver's successful writes began.
func writeTimes(a *Autosaver) func() []time.Time {
	var mu sync.Mutex
	var ts []time.Time
	a.mu.Lock()
	a.onSaved = func(start time.Time) {
		mu.Lock()
		ts = append(ts, start)
		mu.Unlock()
	}
	a.mu.Unlock()
	return func() []time.Time {
		mu.Lock()
		defer mu.Unlock()
		return append([]time.Time{}, ts...)
	}
}

func loadName(t *testing.T, path string) string {
	t.Helper()
	sc, err := Load(path)
	require.NoError(t, err)
	return sc.Name
}

func TestAutosaveRejectsBadArguments(t *testing.T) {
	_, err := NewAutosaver("", time.Second, nil)
	assert.ErrorContains(t, err, "autosave path")
	_, err = NewAutosaver("x", time.Millisecond, nil)
	assert.ErrorContains(t, err, "autosave interval: 1ms is not accepted; give 10ms or more")
}

func TestAutosaveDebouncesABurst(t *testing.T) {
	defer goleak.VerifyNone(t)
	path := filepath.Join(t.TempDir(), "auto"+Extension)
	const every = 300 * time.Millisecond
	a, err := NewAutosaver(path, every, nil)
	require.NoError(t, err)
	times := writeTimes(a)
	for i := 0; i < 40; i++ {
		a.Update(named("burst"))
	}
	a.Update(named("last of the burst"))
	_, err = os.Stat(path)
	assert.True(t, os.IsNotExist(err), "nothing is written during the burst")
	require.Eventually(t, func() bool { return len(times()) == 1 }, 3*time.Second, 10*time.Millisecond)
	assert.Equal(t, "last of the burst", loadName(t, path), "the latest scheme is the one written")
	time.Sleep(2 * every)
	assert.Len(t, times(), 1, "one burst gives one write")
	require.NoError(t, a.Stop())
}

func TestAutosaveSteadyEditingIsSavedAtMostOncePerInterval(t *testing.T) {
	defer goleak.VerifyNone(t)
	path := filepath.Join(t.TempDir(), "auto"+Extension)
	const every = 150 * time.Millisecond
	a, err := NewAutosaver(path, every, nil)
	require.NoError(t, err)
	times := writeTimes(a)
	start := time.Now()
	for time.Since(start) < 5*every {
		a.Update(named(time.Now().String()))
		time.Sleep(5 * time.Millisecond) // edits never pause for the quiet period
	}
	require.NoError(t, a.Stop())
	ts := times()
	require.GreaterOrEqual(t, len(ts), 3, "steady edits are still saved (about once per interval, plus the final flush)")
	// Every write but the last (Stop's flush) keeps the interval.
	for i := 1; i < len(ts)-1; i++ {
		assert.GreaterOrEqual(t, ts[i].Sub(ts[i-1]), every-5*time.Millisecond, "write %d came too soon", i)
	}
}

func TestAutosaveStopFlushesAndEndsTheGoroutine(t *testing.T) {
	defer goleak.VerifyNone(t)
	path := filepath.Join(t.TempDir(), "auto"+Extension)
	a, err := NewAutosaver(path, time.Hour, nil)
	require.NoError(t, err)
	assert.Equal(t, path, a.Path())
	a.Update(named("before stop"))
	require.NoError(t, a.Stop())
	assert.Equal(t, "before stop", loadName(t, path))
	a.Update(named("after stop")) // ignored
	require.NoError(t, a.Stop(), "Stop may be called again")
	assert.Equal(t, "before stop", loadName(t, path))
}

func TestAutosaveFlush(t *testing.T) {
	path := filepath.Join(t.TempDir(), "auto"+Extension)
	a, err := NewAutosaver(path, time.Hour, nil)
	require.NoError(t, err)
	defer a.Stop()
	require.NoError(t, a.Flush(), "nothing pending: nothing to do")
	_, err = os.Stat(path)
	assert.True(t, os.IsNotExist(err))
	a.Update(named("flushed"))
	require.NoError(t, a.Flush())
	assert.Equal(t, "flushed", loadName(t, path))
}

func TestAutosaveKeepsItsOwnCopy(t *testing.T) {
	path := filepath.Join(t.TempDir(), "auto"+Extension)
	a, err := NewAutosaver(path, time.Hour, nil)
	require.NoError(t, err)
	sc := named("copy")
	sc.Materials = []string{"steel"}
	a.Update(sc)
	sc.Carbon[model.CarbonConcrete] = 999 // the caller goes on editing its own scheme
	sc.Materials[0] = "timber"
	require.NoError(t, a.Stop())
	back, err := Load(path)
	require.NoError(t, err)
	assert.Equal(t, 354.0, back.Carbon[model.CarbonConcrete])
	assert.Equal(t, []string{"steel"}, back.Materials)
}

func TestAutosaveReportsFailures(t *testing.T) {
	defer goleak.VerifyNone(t)
	dir := t.TempDir()
	path := filepath.Join(dir, "missing-dir", "auto"+Extension)
	errs := make(chan error, 10)
	a, err := NewAutosaver(path, 20*time.Millisecond, func(e error) { errs <- e })
	require.NoError(t, err)
	a.Update(named("unsavable"))
	select {
	case e := <-errs:
		assert.Contains(t, e.Error(), "not saved")
	case <-time.After(3 * time.Second):
		t.Fatal("no error reported")
	}
	assert.Error(t, a.Stop())

	// An invalid scheme is reported once and dropped, not retried.
	good := filepath.Join(dir, "auto"+Extension)
	require.NoError(t, Save(good, named("good")))
	errs2 := make(chan error, 10)
	b, err := NewAutosaver(good, 20*time.Millisecond, func(e error) { errs2 <- e })
	require.NoError(t, err)
	bad := named("bad")
	bad.Setting.LengthMM = -5
	b.Update(bad)
	select {
	case e := <-errs2:
		assert.Contains(t, e.Error(), "not autosaved: ")
		assert.Contains(t, e.Error(), "setting.length")
	case <-time.After(3 * time.Second):
		t.Fatal("no error reported")
	}
	time.Sleep(100 * time.Millisecond)
	assert.Len(t, errs2, 0, "an invalid scheme is not retried")
	assert.Equal(t, "good", loadName(t, good), "the previous autosave is intact")
	assert.Error(t, b.Stop())
}
