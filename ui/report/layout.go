package report

import (
	"fmt"
	"strings"

	"codeberg.org/go-pdf/fpdf"
)

// rgb is a colour of the report's palette.
type rgb struct{ r, g, b int }

// The report's palette: dark ink on white, one blue-green accent, pale
// fills for table headers and the caution panels.
var (
	inkText     = rgb{33, 37, 41}
	inkMuted    = rgb{95, 103, 112}
	inkAccent   = rgb{20, 83, 116}
	fillHeader  = rgb{226, 235, 241}
	fillZebra   = rgb{246, 248, 250}
	fillBest    = rgb{231, 243, 234}
	fillCaution = rgb{255, 245, 220}
	lineCaution = rgb{176, 122, 0}
	lineRule    = rgb{190, 200, 208}
)

// Type sizes in points.
const (
	sizeTitle   = 20
	sizeHeading = 12.5
	sizeBody    = 9.5
	sizeSmall   = 8
	sizeTable   = 8.5
)

const ptToMM = 25.4 / 72

// lineH returns a comfortable line height in mm for a type size in points.
func lineH(size float64) float64 { return size * ptToMM * 1.32 }

// doc wraps an fpdf document with the report's typography.
type doc struct {
	pdf                 *fpdf.Fpdf
	left, right, width  float64 // content area, mm
	pageH, bottomMargin float64
	footerLeft          string
}

// newDoc starts a portrait document of the given paper ("Letter" or "A4").
func newDoc(paper, footerLeft string) *doc {
	pdf := fpdf.New("P", "mm", paper, "")
	addFonts(pdf)
	const margin = 18.0
	pdf.SetMargins(margin, 16, margin)
	pdf.SetAutoPageBreak(true, 17)
	pdf.SetCellMargin(1.6)
	pdf.AliasNbPages("{nb}")
	w, h := pdf.GetPageSize()
	d := &doc{pdf: pdf, left: margin, right: w - margin, width: w - 2*margin, pageH: h, bottomMargin: 17, footerLeft: footerLeft}
	pdf.SetFooterFunc(d.footer)
	return d
}

func (d *doc) font(style string, size float64) { d.pdf.SetFont(fontFamily, style, size) }
func (d *doc) ink(c rgb)                       { d.pdf.SetTextColor(c.r, c.g, c.b) }
func (d *doc) fill(c rgb)                      { d.pdf.SetFillColor(c.r, c.g, c.b) }
func (d *doc) draw(c rgb)                      { d.pdf.SetDrawColor(c.r, c.g, c.b) }

// footer prints the running line at the foot of every page.
func (d *doc) footer() {
	p := d.pdf
	p.SetY(-12)
	d.draw(lineRule)
	p.SetLineWidth(0.2)
	p.Line(d.left, p.GetY()-1.5, d.right, p.GetY()-1.5)
	d.font("", sizeSmall-0.5)
	d.ink(inkMuted)
	p.SetX(d.left)
	p.CellFormat(d.width*0.8, 4, printable(d.footerLeft), "", 0, "L", false, 0, "")
	p.CellFormat(d.width*0.2, 4, fmt.Sprintf("Page %d of {nb}", p.PageNo()), "", 0, "R", false, 0, "")
}

// room reports whether h mm fit above the bottom margin; if not, it starts
// a new page.
func (d *doc) room(h float64) {
	if d.pdf.GetY()+h > d.pageH-d.bottomMargin {
		d.pdf.AddPage()
	}
}

// heading starts a section, keeping at least keep mm of content with it.
func (d *doc) heading(text string, keep float64) {
	p := d.pdf
	d.room(12 + keep)
	if p.GetY() > 30 {
		p.Ln(4)
	}
	d.font("B", sizeHeading)
	d.ink(inkAccent)
	p.SetX(d.left)
	p.CellFormat(d.width, lineH(sizeHeading)+1, printable(text), "", 1, "L", false, 0, "")
	d.draw(inkAccent)
	p.SetLineWidth(0.35)
	y := p.GetY()
	p.Line(d.left, y, d.right, y)
	p.Ln(2.2)
	d.ink(inkText)
}

// subheading writes a bold line introducing part of a section.
func (d *doc) subheading(text string) {
	p := d.pdf
	d.room(18)
	p.Ln(1.5)
	d.font("B", sizeBody+0.5)
	d.ink(inkText)
	p.SetX(d.left)
	p.CellFormat(d.width, lineH(sizeBody+0.5)+0.5, printable(text), "", 1, "L", false, 0, "")
}

// para writes a wrapped paragraph in the body face.
func (d *doc) para(text string, style string, size float64) {
	p := d.pdf
	d.font(style, size)
	d.ink(inkText)
	p.SetX(d.left)
	p.MultiCell(d.width, lineH(size), printable(text), "", "L", false)
}

// bullets writes a list, each item wrapped with a hanging indent.
func (d *doc) bullets(items []string, size float64) {
	p := d.pdf
	const indent = 5.0
	d.font("", size)
	for _, it := range items {
		lines := p.SplitText(printable(it), d.width-indent)
		d.room(float64(len(lines)) * lineH(size))
		d.ink(inkAccent)
		p.SetX(d.left)
		p.CellFormat(indent, lineH(size), "•", "", 0, "C", false, 0, "")
		d.ink(inkText)
		p.MultiCell(d.width-indent, lineH(size), printable(it), "", "L", false)
		p.Ln(0.6)
	}
}

// panel draws a framed, tinted box holding a bold title and wrapped text.
func (d *doc) panel(title, text string, size float64) {
	p := d.pdf
	const pad = 3.0
	d.font("", size)
	lines := p.SplitText(printable(text), d.width-2*pad)
	h := pad*2 + lineH(size+1) + float64(len(lines))*lineH(size)
	d.room(h)
	y := p.GetY()
	d.fill(fillCaution)
	d.draw(lineCaution)
	p.SetLineWidth(0.4)
	p.Rect(d.left, y, d.width, h, "FD")
	p.SetXY(d.left+pad, y+pad)
	d.font("B", size+1)
	d.ink(lineCaution)
	p.CellFormat(d.width-2*pad, lineH(size+1), printable(title), "", 2, "L", false, 0, "")
	d.font("", size)
	d.ink(inkText)
	for _, l := range lines {
		p.SetX(d.left + pad)
		p.CellFormat(d.width-2*pad, lineH(size), l, "", 2, "L", false, 0, "")
	}
	p.SetY(y + h + 2)
}

// column is one table column: its heading, share of the width and alignment.
type column struct {
	title string
	share float64 // relative width
	align string  // "L", "C" or "R"
}

// rowStyle marks a table row.
type rowStyle int

const (
	rowPlain rowStyle = iota
	rowBest           // the best row of a group: bold on a green tint
	rowGroup          // a group heading spanning the table
)

// row is one table row.
type row struct {
	cells []string
	style rowStyle
}

// table draws a table with wrapped cells, a tinted header repeated after
// page breaks, zebra stripes and highlighted rows.
func (d *doc) table(cols []column, rows []row) {
	p := d.pdf
	total := 0.0
	for _, c := range cols {
		total += c.share
	}
	widths := make([]float64, len(cols))
	for i, c := range cols {
		widths[i] = d.width * c.share / total
	}
	lh := lineH(sizeTable)
	header := func() {
		d.font("B", sizeTable-0.5)
		lines := make([][]string, len(cols))
		n := 1
		for i, c := range cols {
			lines[i] = p.SplitText(printable(c.title), widths[i])
			n = max(n, len(lines[i]))
		}
		h := float64(n)*lh + 2
		y := p.GetY()
		d.fill(fillHeader)
		p.Rect(d.left, y, d.width, h, "F")
		d.ink(inkText)
		x := d.left
		for i := range cols {
			for k, l := range lines[i] {
				p.SetXY(x, y+1+float64(k)*lh)
				p.CellFormat(widths[i], lh, l, "", 0, cols[i].align, false, 0, "")
			}
			x += widths[i]
		}
		p.SetXY(d.left, y+h)
	}
	d.room(3 * lh * 2)
	header()
	stripe := false
	for _, r := range rows {
		style := ""
		if r.style == rowBest || r.style == rowGroup {
			style = "B"
		}
		d.font(style, sizeTable)
		if r.style == rowGroup {
			h := lh + 2.4
			if p.GetY()+h+lh+2 > d.pageH-d.bottomMargin {
				p.AddPage()
				header()
			}
			y := p.GetY()
			d.ink(inkAccent)
			p.SetXY(d.left, y+1.4)
			p.CellFormat(d.width, lh, printable(strings.Join(r.cells, " ")), "", 0, "L", false, 0, "")
			d.draw(lineRule)
			p.SetLineWidth(0.2)
			p.Line(d.left, y+h, d.right, y+h)
			p.SetXY(d.left, y+h)
			stripe = false
			continue
		}
		lines := make([][]string, len(cols))
		n := 1
		for i := range cols {
			txt := ""
			if i < len(r.cells) {
				txt = r.cells[i]
			}
			lines[i] = p.SplitText(printable(txt), widths[i])
			if len(lines[i]) == 0 {
				lines[i] = []string{""}
			}
			n = max(n, len(lines[i]))
		}
		h := float64(n)*lh + 1.6
		if p.GetY()+h > d.pageH-d.bottomMargin {
			p.AddPage()
			header()
			d.font(style, sizeTable)
		}
		y := p.GetY()
		switch {
		case r.style == rowBest:
			d.fill(fillBest)
			p.Rect(d.left, y, d.width, h, "F")
		case stripe:
			d.fill(fillZebra)
			p.Rect(d.left, y, d.width, h, "F")
		}
		stripe = !stripe
		d.ink(inkText)
		x := d.left
		for i := range cols {
			for k, l := range lines[i] {
				p.SetXY(x, y+0.8+float64(k)*lh)
				p.CellFormat(widths[i], lh, l, "", 0, cols[i].align, false, 0, "")
			}
			x += widths[i]
		}
		p.SetXY(d.left, y+h)
	}
	d.draw(lineRule)
	p.SetLineWidth(0.2)
	p.Line(d.left, p.GetY(), d.right, p.GetY())
	p.Ln(1.5)
}
