package steel

import (
	"math"
	"testing"
)

// independentPn works AISC 360-22 Chapter E from the reference's tabulated
// properties alone (A, Ix, Iy, J, Cw, the slenderness ratios and the
// plate thicknesses), written without the package's code. It uses the
// rounded c2 of Table E7.1 as printed.
func independentPn(r refShape, fam Family, fy, lcx, lcy, lcz float64) float64 {
	const e, g = 29000.0, 11200.0
	pe := math.Pi * math.Pi * e
	area, ix, iy := refSection(r)
	// Radii of gyration from I and A: the tabulated r is rounded to three
	// figures, which alone moves the elastic range by up to 1 %. A pipe
	// whose tabulated A differs from π(OD − tdes)tdes by more than rounding
	// takes the tabulated r: the table's r is still that of OD and design
	// wall, not √(I/A).
	rx, ry := math.Sqrt(ix/area), math.Sqrt(iy/area)
	if od, td := r.get("OD"), r.get("tdes"); r.typ == "PIPE" && relErr(math.Pi*(od-td)*td, area) > 0.005 && !areaNotHeld[r.label] {
		rx, ry = r.get("rx"), r.get("ry")
	}
	fe := math.Min(pe/math.Pow(lcx/rx, 2), pe/math.Pow(lcy/ry, 2)) // Eq. E3-4
	if fam.IShaped() {
		fez := (pe*r.get("Cw")/(lcz*lcz) + g*r.get("J")) / (r.get("Ix") + r.get("Iy")) // Eq. E4-2
		fe = math.Min(fe, fez)
	}
	var fcr float64
	if fy/fe <= 2.25 {
		fcr = math.Pow(0.658, fy/fe) * fy // Eq. E3-2
	} else {
		fcr = 0.877 * fe // Eq. E3-3
	}
	// Effective width of one plate (Eq. E7-2, E7-3, E7-5).
	lossOf := func(lambda, lambdaR, c1, c2, b, t float64) float64 {
		if lambda <= lambdaR*math.Sqrt(fy/fcr) {
			return 0
		}
		fel := math.Pow(c2*lambdaR/lambda, 2) * fy
		be := b * (1 - c1*math.Sqrt(fel/fcr)) * math.Sqrt(fel/fcr)
		return math.Max(0, b-be) * t
	}
	ae := area
	switch fam {
	case W, HP:
		tf, tw := r.get("tf"), r.get("tw")
		ae -= 4 * lossOf(r.get("bf/2tf"), 0.56*math.Sqrt(e/fy), 0.22, 1.49, r.get("bf")/2, tf) // Table E7.1 (c)
		ae -= lossOf(r.get("h/tw"), 1.49*math.Sqrt(e/fy), 0.18, 1.31, r.get("h/tw")*tw, tw)    // Table E7.1 (a)
	case HSSSquare, HSSRect:
		t := r.get("tdes")
		lr := 1.40 * math.Sqrt(e/fy)
		ae -= 2 * lossOf(r.get("b/tdes"), lr, 0.20, 1.38, r.get("b/tdes")*t, t) // Table E7.1 (b)
		ae -= 2 * lossOf(r.get("h/tdes"), lr, 0.20, 1.38, r.get("h/tdes")*t, t)
	default:
		dt := r.get("D/t")
		if dt > 0.11*e/fy { // Eq. E7-7
			ae = math.Min(area, (0.038*e/(fy*dt)+2.0/3)*area)
		}
	}
	return fcr * ae // Eq. E3-1 / E7-1
}

// refSection returns the gross area and moments of inertia the independent
// calculation uses: the tabulated A, Ix and Iy. Pipe geometry is fixed by OD
// and tdes, and its small sizes' A and I are tabulated to three figures,
// so pipe takes A and I from those two columns, except where the tabulated A
// differs from them by more than rounding: there the table's own A is used
// (with its r, see independentPn), unless the catalogue does not hold it
// (areaNotHeld).
func refSection(r refShape) (a, ix, iy float64) {
	if r.typ != "PIPE" {
		return r.get("A"), r.get("Ix"), r.get("Iy")
	}
	od, td := r.get("OD"), r.get("tdes")
	id := od - 2*td
	a = math.Pi / 4 * (od*od - id*id)
	ix = math.Pi / 64 * (od*od*od*od - id*id*id*id)
	if relErr(a, r.get("A")) > 0.005 && !areaNotHeld[r.label] {
		a = r.get("A")
	}
	return a, ix, ix
}

// TestStrengthAgainstIndependentCalculation compares the package's strength
// with independentPn for every catalogue shape that is in the reference data
// (AISC Shapes Database v16.0, ../shared/reference/steel-shapes.csv), at
// several lengths, K factors, weak-axis bracing, yield stresses and both
// methods: within 1 %.
func TestStrengthAgainstIndependentCalculation(t *testing.T) {
	ref := loadReference(t)
	lengths := []float64{24, 96, 168, 240, 360, 480} // in
	ks := []float64{0.65, 1.0, 2.1}
	n, worst, worstAt := 0, 0.0, ""
	nz, worstZ, worstZAt := 0, 0.0, ""
	for _, r := range ref {
		fam, ok := inScope(r)
		if !ok {
			continue
		}
		s, err := Lookup(r.label)
		if err != nil {
			continue // reported by TestCatalogAgainstReference
		}
		for _, fy := range []float64{0, 65} {
			col, err := NewColumn(s, fy)
			if err != nil {
				t.Fatal(err)
			}
			for _, l := range lengths {
				for _, k := range ks {
					for _, weak := range []float64{1, 0.5} {
						lcx, lcy := k*l, k*l*weak
						if lcx/s.Ry > 300 { // far past the E2 recommendation; r rounding dominates there
							continue
						}
						// Twisting over the weak-axis length (braces that restrain twist)
						// or over the full length (the default: braces that do not).
						// With the weak axis braced and twist not, E4 with Lcz = Lcx
						// leans on J, which the catalogue works from the dimensions
						// (within 11 %, TestTorsionConstantsAgainstReference; 25 % for
						// HP16 and HP18 with their approximate fillet): held to 12 %.
						for _, lcz := range []float64{lcy, lcx} {
							tol := 0.01
							if lcz != lcy {
								tol = 0.12
							}
							for _, m := range []Method{LRFD, ASD} {
								got := col.Strength(lcx, lcy, lcz, m).Available
								want := independentPn(r, fam, col.Fy(), lcx, lcy, lcz) * m.Factor()
								e := relErr(got, want)
								if lcz != lcy {
									nz++
									if e > worstZ {
										worstZ, worstZAt = e, r.label
									}
								} else {
									n++
									if e > worst {
										worst, worstAt = e, r.label
									}
								}
								if e > tol {
									t.Errorf("%s Fy=%g Lcx=%g Lcy=%g Lcz=%g %s: %.4g kip, independent calculation from the AISC Shapes Database %.4g (%.2f %% off)",
										r.label, col.Fy(), lcx, lcy, lcz, m, got, want, 100*e)
								}
							}
						}
					}
				}
			}
		}
	}
	t.Logf("%d strengths compared with Lcz = Lcy; largest difference %.2f %% (%s)", n, 100*worst, worstAt)
	t.Logf("%d strengths compared with the weak axis braced and Lcz = Lcx; largest difference %.2f %% (%s)", nz, 100*worstZ, worstZAt)
}
