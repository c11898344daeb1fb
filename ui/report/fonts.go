package report

import (
	"strings"
	"sync"

	"codeberg.org/go-fonts/liberation/liberationsansbold"
	"codeberg.org/go-fonts/liberation/liberationsansitalic"
	"codeberg.org/go-fonts/liberation/liberationsansregular"
	"codeberg.org/go-pdf/fpdf"
	"golang.org/x/image/font/sfnt"
)

// fontFamily is the name the report's embedded TrueType font is registered under.
const fontFamily = "LiberationSans"

// addFonts embeds Liberation Sans (regular, bold, italic) in the document as
// UTF-8 TrueType subsets, so that φ, Ω, ×, ≤ and ² print on every reader.
func addFonts(pdf *fpdf.Fpdf) {
	pdf.AddUTF8FontFromBytes(fontFamily, "", liberationsansregular.TTF)
	pdf.AddUTF8FontFromBytes(fontFamily, "B", liberationsansbold.TTF)
	pdf.AddUTF8FontFromBytes(fontFamily, "I", liberationsansitalic.TTF)
}

// coverage reports whether the regular face has a glyph for a rune.
var coverage struct {
	once sync.Once
	font *sfnt.Font
	mu   sync.Mutex
	buf  sfnt.Buffer
	seen map[rune]bool
}

// covered reports whether the embedded font can draw r. Runes outside the
// Basic Multilingual Plane are never covered (fpdf's width tables stop there).
func covered(r rune) bool {
	if r < 0x20 {
		return false
	}
	if r > 0xFFFF {
		return false
	}
	if r < 0x7F {
		return true
	}
	coverage.once.Do(func() {
		coverage.font, _ = sfnt.Parse(liberationsansregular.TTF)
		coverage.seen = map[rune]bool{}
	})
	if coverage.font == nil {
		return false
	}
	coverage.mu.Lock()
	defer coverage.mu.Unlock()
	ok, hit := coverage.seen[r]
	if !hit {
		gi, err := coverage.font.GlyphIndex(&coverage.buf, r)
		ok = err == nil && gi != 0
		coverage.seen[r] = ok
	}
	return ok
}

// printable replaces every rune the embedded font cannot draw (emoji,
// control characters, scripts Liberation Sans lacks) with "?", keeping
// newlines, so that no text is silently dropped or crashes the layout.
func printable(s string) string {
	clean := true
	for _, r := range s {
		if r != '\n' && !covered(r) {
			clean = false
			break
		}
	}
	if clean {
		return s
	}
	var b strings.Builder
	for _, r := range s {
		if r == '\n' || covered(r) {
			b.WriteRune(r)
		} else {
			b.WriteByte('?')
		}
	}
	return b.String()
}
