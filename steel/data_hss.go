package steel

// Nominal wall thicknesses of square and rectangular HSS, as the fraction
// written in the designation (ASTM A500 sizes listed in AISC Manual
// Tables 1-11 and 1-12).
const (
	t1_8  = "1/8"
	t3_16 = "3/16"
	t1_4  = "1/4"
	t5_16 = "5/16"
	t3_8  = "3/8"
	t1_2  = "1/2"
	t5_8  = "5/8"
	t3_4  = "3/4"
	t7_8  = "7/8"
	t1    = "1"
)

// boxRow is one outside size of square or rectangular HSS, height H by
// width B in inches, with every nominal wall it is made in.
type boxRow struct {
	h, b  float64
	walls []string
}

// squareRows lists square HSS from 3 in to 22 in.
var squareRows = []boxRow{
	{22, 22, []string{t1, t7_8, t3_4, t5_8, t1_2}},
	{20, 20, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16}},
	{18, 18, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{16, 16, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{14, 14, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{12, 12, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{10, 10, []string{t3_4, t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{9, 9, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{8, 8, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{7, 7, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{6, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{5.5, 5.5, []string{t3_8, t5_16, t1_4, t3_16, t1_8}},
	{5, 5, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{4.5, 4.5, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{4, 4, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{3.5, 3.5, []string{t3_8, t5_16, t1_4, t3_16, t1_8}},
	{3, 3, []string{t3_8, t5_16, t1_4, t3_16, t1_8}},
}

// rectRows lists rectangular HSS from 4X3 to 34X10.
var rectRows = []boxRow{
	{34, 10, []string{t1, t7_8, t3_4, t5_8}},
	{30, 10, []string{t1, t7_8, t3_4, t5_8, t1_2}},
	{24, 20, []string{t3_4, t5_8, t1_2, t3_8, t5_16}},
	{24, 18, []string{t3_4, t5_8, t1_2, t3_8, t5_16}},
	{24, 16, []string{t3_4, t5_8, t1_2, t3_8, t5_16}},
	{24, 14, []string{t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{24, 12, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{24, 8, []string{t1_2, t3_8, t5_16, t1_4}},
	{22, 20, []string{t3_4, t5_8, t1_2, t3_8, t5_16}},
	{22, 18, []string{t3_4, t5_8, t1_2, t3_8, t5_16}},
	{22, 16, []string{t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{22, 14, []string{t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{22, 10, []string{t5_8, t1_2, t3_8, t5_16, t1_4}},
	{20, 16, []string{t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{20, 12, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16}},
	{20, 8, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16}},
	{20, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4}},
	{20, 4, []string{t1_2, t3_8, t5_16, t1_4}},
	{18, 10, []string{t5_8, t1_2, t3_8, t5_16, t1_4}},
	{18, 8, []string{t5_8, t1_2, t3_8, t5_16, t1_4}},
	{18, 6, []string{t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{16, 12, []string{t1, t7_8, t3_4, t5_8, t1_2, t3_8, t5_16}},
	{16, 10, []string{t5_8, t1_2, t3_8, t5_16, t1_4}},
	{16, 8, []string{t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{16, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{16, 4, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{14, 12, []string{t5_8, t1_2, t3_8, t5_16, t1_4}},
	{14, 10, []string{t7_8, t3_4, t5_8, t1_2, t3_8, t5_16, t1_4}},
	{14, 8, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{14, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{14, 4, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{12, 10, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{12, 8, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{12, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{12, 4, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{12, 3, []string{t5_16, t1_4, t3_16}},
	{10, 8, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{10, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{10, 5, []string{t3_8, t5_16, t1_4}},
	{10, 4, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{10, 3.5, []string{t3_8, t5_16, t1_4, t3_16}},
	{10, 3, []string{t3_8, t5_16, t1_4, t3_16, t1_8}},
	{9, 7, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{9, 5, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{9, 3, []string{t1_2, t3_8, t5_16, t1_4, t3_16}},
	{8, 6, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16}},
	{8, 4, []string{t5_8, t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{8, 3, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{7, 5, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{7, 4, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{7, 3, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{6, 5, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{6, 4, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{6, 3, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{5, 4, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{5, 3, []string{t1_2, t3_8, t5_16, t1_4, t3_16, t1_8}},
	{4, 3, []string{t3_8, t5_16, t1_4, t3_16, t1_8}},
}

// roundRow is one outside diameter of round HSS, in inches, with every
// nominal wall (in inches, three decimals as in the designation).
type roundRow struct {
	od    float64
	walls []float64
}

// roundRows lists round HSS from 3.5 in to 28 in outside diameter (AISC
// Manual Table 1-13, ASTM A500).
var roundRows = []roundRow{
	{28.000, []float64{1.000, 0.875, 0.750, 0.625, 0.500, 0.375}},
	{26.000, []float64{0.750, 0.625, 0.500, 0.375, 0.313}},
	{24.000, []float64{1.000, 0.875, 0.750, 0.625, 0.500, 0.375, 0.313}},
	{22.000, []float64{0.750, 0.625, 0.500, 0.375, 0.313}},
	{20.000, []float64{1.000, 0.875, 0.750, 0.625, 0.500, 0.375, 0.313, 0.250}},
	{18.000, []float64{1.000, 0.875, 0.750, 0.625, 0.500, 0.375, 0.313, 0.250}},
	{16.000, []float64{1.000, 0.875, 0.750, 0.625, 0.500, 0.438, 0.375, 0.312, 0.250}},
	{14.000, []float64{1.000, 0.875, 0.750, 0.625, 0.500, 0.375, 0.312, 0.250, 0.188}},
	{13.375, []float64{0.625, 0.500, 0.375, 0.313, 0.250, 0.188}},
	{12.750, []float64{0.750, 0.625, 0.500, 0.375, 0.250, 0.188}},
	{12.000, []float64{0.625, 0.500, 0.375, 0.250}},
	{11.750, []float64{0.625, 0.500, 0.375, 0.337, 0.250}},
	{10.750, []float64{0.625, 0.500, 0.375, 0.313, 0.250, 0.188}},
	{10.000, []float64{0.625, 0.500, 0.375, 0.312, 0.250, 0.188}},
	{9.625, []float64{0.625, 0.500, 0.375, 0.312, 0.250, 0.188}},
	{8.625, []float64{0.625, 0.500, 0.375, 0.322, 0.250, 0.188}},
	{7.500, []float64{0.500, 0.375, 0.312, 0.250, 0.188}},
	{7.000, []float64{0.500, 0.375, 0.312, 0.250, 0.188, 0.125}},
	{6.875, []float64{0.375, 0.312, 0.250, 0.188}},
	{6.625, []float64{0.500, 0.432, 0.375, 0.312, 0.280, 0.250, 0.188, 0.125}},
	{6.000, []float64{0.500, 0.375, 0.312, 0.280, 0.250, 0.188, 0.125}},
	{5.563, []float64{0.500, 0.375, 0.258, 0.188, 0.134}},
	{5.500, []float64{0.500, 0.375, 0.258}},
	{5.000, []float64{0.500, 0.375, 0.312, 0.258, 0.250, 0.188, 0.125}},
	{4.500, []float64{0.375, 0.337, 0.237, 0.188, 0.125}},
	{4.000, []float64{0.313, 0.250, 0.237, 0.226, 0.220, 0.188, 0.125}},
	{3.500, []float64{0.313, 0.300, 0.250, 0.216, 0.203, 0.188, 0.125}},
}

// pipeRow is one nominal pipe size with its outside diameter and the wall
// of each weight class, in inches (ASME B36.10M, as in AISC Manual
// Table 1-14); 0 means the class is not made in that size.
type pipeRow struct {
	nps          string
	od           float64
	std, xs, xxs float64
}

// pipeRows lists standard, extra-strong and double-extra-strong pipe up to
// 26 in nominal size; from 14 in up the outside diameter is the nominal
// size, standard wall 0.375 in and extra-strong 0.500 in (ASME B36.10M, from
// memory).
var pipeRows = []pipeRow{
	{"26", 26.000, 0.375, 0.500, 0},
	{"24", 24.000, 0.375, 0.500, 0},
	{"20", 20.000, 0.375, 0.500, 0},
	{"18", 18.000, 0.375, 0.500, 0},
	{"16", 16.000, 0.375, 0.500, 0},
	{"14", 14.000, 0.375, 0.500, 0},
	{"12", 12.750, 0.375, 0.500, 1.000},
	{"10", 10.750, 0.365, 0.500, 1.000},
	{"8", 8.625, 0.322, 0.500, 0.875},
	{"6", 6.625, 0.280, 0.432, 0.864},
	{"5", 5.563, 0.258, 0.375, 0.750},
	{"4", 4.500, 0.237, 0.337, 0.674},
	{"3-1/2", 4.000, 0.226, 0.318, 0},
	{"3", 3.500, 0.216, 0.300, 0.600},
	{"2-1/2", 2.875, 0.203, 0.276, 0.552},
	{"2", 2.375, 0.154, 0.218, 0.436},
	{"1-1/2", 1.900, 0.145, 0.200, 0},
	{"1-1/4", 1.660, 0.140, 0.191, 0},
	{"1", 1.315, 0.133, 0.179, 0},
	{"3/4", 1.050, 0.113, 0.154, 0},
	{"1/2", 0.840, 0.109, 0.147, 0},
}

// pipeTabulatedA holds the gross area A, in², that AISC Manual Table 1-14
// tabulates for the pipes whose tabulated A differs by more than rounding
// from π(OD − tdes)tdes (from memory). Their tabulated I and r agree with
// OD and tdes, so only A is replaced; the trace says so.
var pipeTabulatedA = map[string]float64{
	"Pipe12STD":    13.7,  // OD and tdes give 13.6
	"Pipe10STD":    11.5,  // OD and tdes give 11.1
	"Pipe3STD":     2.07,  // OD and tdes give 2.08
	"Pipe2-1/2STD": 1.61,  // OD and tdes give 1.59
	"Pipe2STD":     1.02,  // OD and tdes give 1.00
	"Pipe1STD":     0.469, // OD and tdes give 0.463
	"Pipe2-1/2XS":  2.10,  // OD and tdes give 2.11
	"Pipe2XS":      1.40,  // OD and tdes give 1.38
	"Pipe12XS":     17.5,  // OD and tdes give 17.9
	"Pipe1-1/4XS":  0.837, // OD and tdes give 0.827
}
