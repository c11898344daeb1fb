package ui

import (
	"image/color"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/theme"
)

// lightTheme is Fyne's default theme held to its light variant, so the
// window matches the chart's white paper whatever the desktop prefers.
type lightTheme struct{}

// Color returns the light variant of every colour.
func (lightTheme) Color(n fyne.ThemeColorName, _ fyne.ThemeVariant) color.Color {
	return theme.DefaultTheme().Color(n, theme.VariantLight)
}

// Font returns the default font.
func (lightTheme) Font(s fyne.TextStyle) fyne.Resource { return theme.DefaultTheme().Font(s) }

// Icon returns the default icon.
func (lightTheme) Icon(n fyne.ThemeIconName) fyne.Resource { return theme.DefaultTheme().Icon(n) }

// Size returns the default size, with slightly tighter padding so the
// inputs panel holds more.
func (lightTheme) Size(n fyne.ThemeSizeName) float32 {
	switch n {
	case theme.SizeNamePadding:
		return 3
	case theme.SizeNameInnerPadding:
		return 6
	}
	return theme.DefaultTheme().Size(n)
}

// compactTheme is lightTheme with tight padding and slightly smaller text,
// for the results table: a laptop screen then shows eight rows or more.
type compactTheme struct{ lightTheme }

// Size tightens the padding and the text of the table's cells.
func (compactTheme) Size(n fyne.ThemeSizeName) float32 {
	switch n {
	case theme.SizeNamePadding:
		return 1
	case theme.SizeNameInnerPadding:
		return 3
	case theme.SizeNameText:
		return 13
	}
	return lightTheme{}.Size(n)
}
