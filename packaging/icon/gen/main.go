// Command gen draws Upright's application icon: three columns of steel,
// concrete and timber carrying one slab under a downward load arrow, on a
// rounded square. It writes a PNG; the output is the same on every run.
//
//	go run ./packaging/icon/gen -o packaging/icon/upright.png -size 512
package main

import (
	"flag"
	"fmt"
	"image"
	"image/color"
	"image/png"
	"math"
	"os"
)

// The drawing is laid out on a 512 by 512 canvas and scaled to -size.
const canvas = 512.0

// A layer is one filled shape; later layers cover earlier ones.
type layer struct {
	inside func(x, y float64) bool
	paint  func(x, y float64) color.NRGBA
}

func solid(c color.NRGBA) func(x, y float64) color.NRGBA {
	return func(x, y float64) color.NRGBA { return c }
}

func rect(x0, y0, x1, y1 float64) func(x, y float64) bool {
	return func(x, y float64) bool { return x >= x0 && x < x1 && y >= y0 && y < y1 }
}

func roundRect(x0, y0, x1, y1, r float64) func(x, y float64) bool {
	return func(x, y float64) bool {
		if x < x0 || x >= x1 || y < y0 || y >= y1 {
			return false
		}
		cx := math.Max(x0+r, math.Min(x, x1-r))
		cy := math.Max(y0+r, math.Min(y, y1-r))
		return (x-cx)*(x-cx)+(y-cy)*(y-cy) <= r*r
	}
}

// triangle reports points inside the triangle a, b, c (either winding).
func triangle(ax, ay, bx, by, cx, cy float64) func(x, y float64) bool {
	side := func(px, py, qx, qy, x, y float64) float64 { return (qx-px)*(y-py) - (qy-py)*(x-px) }
	return func(x, y float64) bool {
		d1 := side(ax, ay, bx, by, x, y)
		d2 := side(bx, by, cx, cy, x, y)
		d3 := side(cx, cy, ax, ay, x, y)
		neg := d1 < 0 || d2 < 0 || d3 < 0
		pos := d1 > 0 || d2 > 0 || d3 > 0
		return !(neg && pos)
	}
}

func mix(a, b color.NRGBA, t float64) color.NRGBA {
	l := func(p, q uint8) uint8 { return uint8(math.Round(float64(p) + (float64(q)-float64(p))*t)) }
	return color.NRGBA{l(a.R, b.R), l(a.G, b.G), l(a.B, b.B), l(a.A, b.A)}
}

var (
	bgTop     = color.NRGBA{0x24, 0x4a, 0x66, 0xff}
	bgBottom  = color.NRGBA{0x13, 0x27, 0x3b, 0xff}
	slab      = color.NRGBA{0xea, 0xee, 0xf2, 0xff}
	slabShade = color.NRGBA{0xc4, 0xcd, 0xd6, 0xff}
	steel     = color.NRGBA{0x86, 0xa3, 0xbc, 0xff}
	steelEdge = color.NRGBA{0x5a, 0x78, 0x92, 0xff}
	concrete  = color.NRGBA{0xbc, 0xbf, 0xc2, 0xff}
	aggregate = color.NRGBA{0x95, 0x99, 0x9d, 0xff}
	timber    = color.NRGBA{0xcf, 0x94, 0x52, 0xff}
	grain     = color.NRGBA{0xa6, 0x6b, 0x33, 0xff}
	arrow     = color.NRGBA{0xee, 0x6a, 0x4c, 0xff}
)

// layers returns the drawing from back to front.
func layers() []layer {
	const colTop, colBottom = 140.0, 398.0
	var ls []layer

	// Rounded square with a top-to-bottom gradient.
	ls = append(ls, layer{roundRect(16, 16, 496, 496, 92), func(x, y float64) color.NRGBA {
		return mix(bgTop, bgBottom, (y-16)/480)
	}})

	// Steel column: flange edges darker than the web between them.
	ls = append(ls, layer{rect(92, colTop, 156, colBottom), solid(steel)})
	ls = append(ls, layer{rect(92, colTop, 104, colBottom), solid(steelEdge)})
	ls = append(ls, layer{rect(144, colTop, 156, colBottom), solid(steelEdge)})

	// Concrete column, the widest, speckled with aggregate.
	ls = append(ls, layer{rect(204, colTop, 308, colBottom), solid(concrete)})
	seed := uint32(20260)
	next := func() float64 {
		seed = seed*1664525 + 1013904223
		return float64(seed>>8) / float64(1<<24)
	}
	for i := 0; i < 46; i++ {
		cx := 212 + next()*88
		cy := colTop + 8 + next()*(colBottom-colTop-16)
		r := 2.5 + next()*3.5
		ls = append(ls, layer{func(x, y float64) bool {
			return (x-cx)*(x-cx)+(y-cy)*(y-cy) <= r*r
		}, solid(aggregate)})
	}

	// Timber column with wavy grain lines.
	ls = append(ls, layer{rect(352, colTop, 422, colBottom), solid(timber)})
	for k, gx := range []float64{364, 380, 396, 411} {
		phase := float64(k) * 1.7
		ls = append(ls, layer{func(x, y float64) bool {
			if y < colTop || y >= colBottom {
				return false
			}
			c := gx + 3.2*math.Sin(y/21+phase)
			return math.Abs(x-c) <= 1.6
		}, solid(grain)})
	}

	// Slab on top and footing line below, each with a shaded lower edge.
	ls = append(ls, layer{roundRect(60, 112, 452, 140, 6), solid(slab)})
	ls = append(ls, layer{rect(66, 134, 446, 140), solid(slabShade)})
	ls = append(ls, layer{roundRect(60, 398, 452, 420, 6), solid(slab)})
	ls = append(ls, layer{rect(66, 414, 446, 420), solid(slabShade)})

	// Load arrow pressing down on the middle of the slab.
	ls = append(ls, layer{roundRect(244, 34, 268, 84, 4), solid(arrow)})
	ls = append(ls, layer{triangle(218, 76, 294, 76, 256, 108), solid(arrow)})
	return ls
}

// draw renders the icon at size by size pixels, sampling each pixel on a
// 4 by 4 grid and averaging in premultiplied colour.
func draw(size int) *image.NRGBA {
	const sub = 4
	ls := layers()
	img := image.NewNRGBA(image.Rect(0, 0, size, size))
	scale := canvas / float64(size)
	for py := 0; py < size; py++ {
		for px := 0; px < size; px++ {
			var r, g, b, a float64
			for sy := 0; sy < sub; sy++ {
				for sx := 0; sx < sub; sx++ {
					x := (float64(px) + (float64(sx)+0.5)/sub) * scale
					y := (float64(py) + (float64(sy)+0.5)/sub) * scale
					for i := len(ls) - 1; i >= 0; i-- {
						if ls[i].inside(x, y) {
							c := ls[i].paint(x, y)
							al := float64(c.A) / 255
							r += float64(c.R) * al
							g += float64(c.G) * al
							b += float64(c.B) * al
							a += al
							break
						}
					}
				}
			}
			if a == 0 {
				continue
			}
			img.SetNRGBA(px, py, color.NRGBA{
				R: uint8(math.Round(r / a)),
				G: uint8(math.Round(g / a)),
				B: uint8(math.Round(b / a)),
				A: uint8(math.Round(a / (sub * sub) * 255)),
			})
		}
	}
	return img
}

func main() {
	out := flag.String("o", "upright.png", "PNG file to write")
	size := flag.Int("size", 512, "width and height in pixels, 16 to 2048")
	flag.Parse()
	if *size < 16 || *size > 2048 {
		fmt.Fprintf(os.Stderr, "gen: -size %d is out of range; accepted 16 to 2048\n", *size)
		os.Exit(2)
	}
	f, err := os.Create(*out)
	if err != nil {
		fmt.Fprintln(os.Stderr, "gen:", err)
		os.Exit(1)
	}
	enc := png.Encoder{CompressionLevel: png.BestCompression}
	if err := enc.Encode(f, draw(*size)); err != nil {
		f.Close()
		fmt.Fprintln(os.Stderr, "gen:", err)
		os.Exit(1)
	}
	if err := f.Close(); err != nil {
		fmt.Fprintln(os.Stderr, "gen:", err)
		os.Exit(1)
	}
}
