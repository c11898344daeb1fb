package model

// Carbon kinds: the keys of CarbonFactors and of Constituent.Kind.
const (
	CarbonRolledSteel = "rolled-steel"            // CarbonRolledSteel is hot-rolled structural sections, per kg.
	CarbonHSSSteel    = "hss-steel"               // CarbonHSSSteel is hollow structural sections, per kg.
	CarbonRebar       = "rebar"                   // CarbonRebar is steel reinforcing bar, per kg.
	CarbonConcrete    = "concrete"                // CarbonConcrete is ready-mixed concrete, per m³.
	CarbonSawnTimber  = "sawn-timber"             // CarbonSawnTimber is sawn softwood lumber and timbers, per m³.
	CarbonGlulam      = "glulam"                  // CarbonGlulam is glued-laminated timber, per m³.
	CarbonGypsum      = "gypsum-board"            // CarbonGypsum is Type X gypsum board of a fire enclosure, per kg.
	CarbonSFRM        = "sprayed-fire-protection" // CarbonSFRM is sprayed fire-resistive material, per kg.
)

// CarbonKind describes one kind of material for embodied carbon.
type CarbonKind struct {
	Key        string // the CarbonFactors key, e.g. "rolled-steel"
	Name       string // display name
	Unit       string // unit of Constituent.Amount per metre of column: "kg" or "m³"
	FactorUnit string // unit of the factor: "kg CO2e/kg" or "kg CO2e/m³"
}

// CarbonKinds lists every carbon kind in display order.
var CarbonKinds = []CarbonKind{
	{CarbonRolledSteel, "Hot-rolled steel sections", "kg", "kg CO2e/kg"},
	{CarbonHSSSteel, "Hollow structural sections", "kg", "kg CO2e/kg"},
	{CarbonRebar, "Reinforcing bar", "kg", "kg CO2e/kg"},
	{CarbonConcrete, "Ready-mixed concrete", "m³", "kg CO2e/m³"},
	{CarbonSawnTimber, "Sawn timber", "m³", "kg CO2e/m³"},
	{CarbonGlulam, "Glued-laminated timber", "m³", "kg CO2e/m³"},
	{CarbonGypsum, "Gypsum board (fire enclosure)", "kg", "kg CO2e/kg"},
	{CarbonSFRM, "Sprayed fire-resistive material", "kg", "kg CO2e/kg"},
}

// defaultCarbon holds the cradle-to-gate (A1–A3) defaults; DefaultCarbon
// hands out copies. Every value is a North American industry-average EPD
// figure recalled from memory; check the current EPD before relying on it.
var defaultCarbon = CarbonFactors{
	// AISC industry-average EPD for fabricated hot-rolled structural
	// sections (2021): 1.22 kg CO2e/kg (from memory).
	CarbonRolledSteel: 1.22,
	// AISC industry-average EPD for fabricated hollow structural sections
	// (2021): 1.99 kg CO2e/kg (from memory).
	CarbonHSSSteel: 1.99,
	// CRSI industry-average EPD for fabricated steel reinforcing bar:
	// 0.854 kg CO2e/kg (from memory).
	CarbonRebar: 0.854,
	// NRMCA industry-wide EPD for ready-mixed concrete (v3.2, 2022), US
	// national average for 4,001–5,000 psi: 354 kg CO2e/m³ (from memory).
	CarbonConcrete: 354,
	// AWC/CWC industry-average EPD for North American softwood lumber
	// (2020), fossil GWP without biogenic carbon: 63 kg CO2e/m³ (from memory).
	CarbonSawnTimber: 63,
	// AWC/CWC industry-average EPD for North American glued-laminated timber
	// (2020), fossil GWP without biogenic carbon: 137 kg CO2e/m³ (from memory).
	CarbonGlulam: 137,
	// Gypsum Association industry-average EPD for 5/8 in Type X gypsum
	// board: about 280 kg CO2e per 1,000 ft² at about 2.5 lb/ft², so
	// 0.25 kg CO2e/kg (from memory).
	CarbonGypsum: 0.25,
	// Cementitious sprayed fire-resistive material, gypsum- or cement-based:
	// about 0.4 kg CO2e/kg (rough figure from memory; use the product EPD).
	CarbonSFRM: 0.4,
}

// DefaultCarbon returns a fresh copy of the default cradle-to-gate (A1–A3)
// embodied-carbon factors, one per entry of CarbonKinds.
func DefaultCarbon() CarbonFactors {
	out := make(CarbonFactors, len(defaultCarbon))
	for k, v := range defaultCarbon {
		out[k] = v
	}
	return out
}

// PerMetre returns kg CO2e per metre of column for the given quantities.
// A kind missing from cf (or a nil cf) falls back to the default factor; a
// kind that is not one of CarbonKinds contributes nothing. It does not
// allocate.
func (cf CarbonFactors) PerMetre(cs []Constituent) float64 {
	sum := 0.0
	for _, c := range cs {
		f, ok := cf[c.Kind]
		if !ok {
			f = defaultCarbon[c.Kind]
		}
		sum += c.Amount * f
	}
	return sum
}
