//go:build race

package model_test

// raceOn is true when the tests run under the race detector, which slows
// the map tests about tenfold; they then use smaller grids.
const raceOn = true
