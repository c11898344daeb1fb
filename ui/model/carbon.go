package model

// DefaultCarbon returns the default embodied-carbon factors.
func DefaultCarbon() CarbonFactors {
	return CarbonFactors{}
}
