//go:build !race

package model_test

// raceOn is true when the tests run under the race detector.
const raceOn = false
