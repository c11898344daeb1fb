package model

// Ranges of the material options that a user may type, shared by the model's
// checks, the command line and the window so each is stated in one place.
const (
	FyMinMPa   = 200.0 // FyMinMPa is the lowest steel yield stress accepted (29 ksi).
	FyMaxMPa   = 700.0 // FyMaxMPa is the highest steel yield stress accepted (100 ksi).
	FyAccepted = "a yield stress from 200 to 700 MPa (29 to 100 ksi)"

	FcMinMPa   = 27.5 // FcMinMPa is the lowest concrete f'c accepted (4,000 psi).
	FcMaxMPa   = 69.0 // FcMaxMPa is the highest concrete f'c accepted (10,000 psi).
	FcAccepted = "a concrete strength from 4,000 to 10,000 psi (27.6 to 69 MPa)"
)
