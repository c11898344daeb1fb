package model

import "upright/steel"

// Outline returns candidate i's plan section in mm: the tube's wall, drawn
// as the steel family draws it (design wall 0.93 tnom, AISC 360-22 B4.2),
// with its inside as the concrete fill.
func (f *compositeFamily) Outline(i int, _ Setting) Outline {
	s, err := steel.Lookup(f.cols[i].Sec.Name)
	if err != nil {
		// Every filled tube is built from a catalogue tube, so this does not
		// happen; an empty outline draws nothing rather than a wrong shape.
		return Outline{}
	}
	return FilledTube(SteelOutline(s))
}
