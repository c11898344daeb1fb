package model

// TimberOptions are the timber column choices.
type TimberOptions struct {
	Species   string // sawn species: "DF-L", "SP", "HF" or "SPF"
	Grade     string // sawn grade: "SS", "No.1" or "No.2"
	Glulam    bool   // include glulam columns
	Sawn      bool   // include sawn lumber and timbers
	Wet       bool   // wet service (CM)
	Incised   bool   // incised lumber (Ci)
	Hot       bool   // elevated temperature 100–125 °F (Ct)
	Fire      string // "none", "1h", "1.5h" or "2h"
	FireSides int    // 3 or 4 sides exposed
	Duration  string // ASD load duration: "permanent", "ten-years", "two-months", "seven-days", "ten-minutes"; "" derives it from the loads
}

func defaultTimberOptions() TimberOptions {
	return TimberOptions{Species: "DF-L", Grade: "No.1", Glulam: true, Sawn: true, Fire: "none", FireSides: 4}
}

func (t TimberOptions) validate() error {
	switch t.Fire {
	case "none", "1h", "1.5h", "2h":
	default:
		return bad("fire", t.Fire, "none, 1h, 1.5h or 2h")
	}
	if t.FireSides != 3 && t.FireSides != 4 {
		return bad("fire sides", t.FireSides, "3 or 4")
	}
	switch t.Duration {
	case "", "permanent", "ten-years", "two-months", "seven-days", "ten-minutes":
	default:
		return bad("duration", t.Duration, "permanent, ten-years, two-months, seven-days or ten-minutes")
	}
	return nil
}
