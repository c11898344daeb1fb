package plots

import "image/color"

// Okabe–Ito colours (Okabe & Ito, "Color Universal Design", 2008), safe for the
// common forms of colour-vision deficiency. Yellow is left out: it is too pale
// for a thin line on white.
var (
	okabeBlack     = color.NRGBA{R: 0x00, G: 0x00, B: 0x00, A: 0xff}
	okabeOrange    = color.NRGBA{R: 0xE6, G: 0x9F, B: 0x00, A: 0xff}
	okabeSkyBlue   = color.NRGBA{R: 0x56, G: 0xB4, B: 0xE9, A: 0xff}
	okabeGreen     = color.NRGBA{R: 0x00, G: 0x9E, B: 0x73, A: 0xff}
	okabeBlue      = color.NRGBA{R: 0x00, G: 0x72, B: 0xB2, A: 0xff}
	okabeVermilion = color.NRGBA{R: 0xD5, G: 0x5E, B: 0x00, A: 0xff}
	okabePurple    = color.NRGBA{R: 0xCC, G: 0x79, B: 0xA7, A: 0xff}
)

// Neutral colours for the chart furniture.
var (
	inkText   = color.NRGBA{R: 0x22, G: 0x22, B: 0x22, A: 0xff}
	inkMuted  = color.NRGBA{R: 0x55, G: 0x55, B: 0x55, A: 0xff}
	inkGrid   = color.NRGBA{R: 0xE2, G: 0xE2, B: 0xE2, A: 0xff}
	inkMarker = color.NRGBA{R: 0x44, G: 0x44, B: 0x44, A: 0xff}
	paper     = color.NRGBA{R: 0xFF, G: 0xFF, B: 0xFF, A: 0xff}
	paperVeil = color.NRGBA{R: 0xFF, G: 0xFF, B: 0xFF, A: 0xE6}
)
