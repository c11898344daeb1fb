package ui

import (
	"fmt"
	"slices"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/timber"
	"upright/ui/model"
)

// steelFamilies are the family names model.SteelOptions.Families accepts.
var steelFamilies = model.SteelFamilies

// Choice lists of the material options.
var (
	barGradeChoices   = []choice{{"Grade 60", "60"}, {"Grade 80", "80"}}
	transverseChoices = []choice{{"Tied and spiral", "all"}, {"Tied only", "ties"}, {"Spiral only", "spiral"}}
	eiChoices         = []choice{{"Largest of (a), (b), (c)", "largest"}, {"(a) 0.4 Ec Ig", "a"}, {"(b) 0.2 Ec Ig + Es Ise", "b"}, {"(c) Ec I, I of Table 6.6.3.1.1(b)", "c"}}
	speciesChoices    = named(timber.SawnSpecies(), map[string]string{"DF-L": "Douglas fir-larch", "SP": "Southern pine", "HF": "Hem-fir", "SPF": "Spruce-pine-fir"})
	gradeChoices      = named(timber.SawnGrades(), map[string]string{"SS": "Select structural", "No.1": "No. 1", "No.2": "No. 2"})
	sidesChoices      = []choice{{"4 sides exposed", "4"}, {"3 sides exposed", "3"}}
	durationChoices   = []choice{{"From the loads", ""}, {"Permanent", "permanent"}, {"Ten years", "ten-years"}, {"Two months", "two-months"}, {"Seven days", "seven-days"}, {"Ten minutes", "ten-minutes"}}
)

// named pairs each value with its name, or the value itself when it has none.
func named(values []string, names map[string]string) []choice {
	out := make([]choice, len(values))
	for i, v := range values {
		out[i] = choice{v, v}
		if n, ok := names[v]; ok {
			out[i].label = n
		}
	}
	return out
}

// materialWidgets are the option inputs of the materials the window knows.
type materialWidgets struct {
	steelFam      *widget.CheckGroup
	steelProblem  *widget.Label
	barGrade      *widget.Select
	transverse    *widget.Select
	eiMethod      *widget.Select
	betaFromLoads *widget.Check
	cap14         *widget.Check
	nonswayK1     *widget.Check
	species       *widget.Select
	grade         *widget.Select
	sawn, glulam  *widget.Check
	combos        *widget.CheckGroup
	wet, incised  *widget.Check
	hot           *widget.Check
	fireSides     *widget.Select
	duration      *widget.Select
	timberProblem *widget.Label
	composite     compositeWidgets
}

func problemLabel() *widget.Label {
	l := widget.NewLabel("")
	l.Importance = widget.DangerImportance
	l.Wrapping = fyne.TextWrapWord
	l.Hide()
	return l
}

func labelled(name string, o fyne.CanvasObject) fyne.CanvasObject { return row(name, o) }

// panel returns the options of one material, or nil for a material without options here.
func (o *materialWidgets) panel(p *inputsPane, material string) fyne.CanvasObject {
	switch material {
	case "steel":
		o.steelFam = widget.NewCheckGroup(steelFamilies, func(sel []string) {
			p.change(func(sc *model.Scheme) {
				if len(sel) == len(steelFamilies) {
					sc.Steel.Families = nil
					return
				}
				fams := []string{}
				for _, f := range steelFamilies { // keep the catalogue order
					if slices.Contains(sel, f) {
						fams = append(fams, f)
					}
				}
				sc.Steel.Families = fams
			})
		})
		o.steelProblem = problemLabel()
		o.nonswayK1 = widget.NewCheck("k = 1.0 at nonsway ends (ACI 318-19 6.6.4.4.3) in place of the ends' recommended K", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Concrete.NonswayK1 = on })
		})
		return container.NewVBox(p.newField("steel Fy").box, widget.NewLabel("Shape families"), o.steelFam, o.steelProblem)
	case "concrete":
		o.barGrade = widget.NewSelect(labels(barGradeChoices), func(s string) {
			p.change(func(sc *model.Scheme) {
				fmt.Sscanf(valueOf(barGradeChoices, s), "%d", &sc.Concrete.BarGrade)
			})
		})
		o.transverse = widget.NewSelect(labels(transverseChoices), func(s string) {
			p.change(func(sc *model.Scheme) { sc.Concrete.Transverse = valueOf(transverseChoices, s) })
		})
		o.eiMethod = widget.NewSelect(labels(eiChoices), func(s string) {
			p.change(func(sc *model.Scheme) { sc.Concrete.EIMethod = valueOf(eiChoices, s) })
		})
		o.betaFromLoads = widget.NewCheck("βdns of each load combination (factored dead over total); untick to type one that may only raise it", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Concrete.BetaFromLoads = on })
		})
		o.cap14 = widget.NewCheck("δ above 1.4 never works (ACI 318-19 6.2.5.3); untick to see the uncapped strength as a note", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Concrete.SecondOrderCap = on })
		})
		return container.NewVBox(
			p.newField("f'c").box,
			labelled("Reinforcing bars", o.barGrade),
			p.newField("rho-max").box,
			labelled("Transverse reinforcement", o.transverse),
			p.newField("m1m2").box,
			small("−1 is single curvature (the severe case); 1 is double curvature."),
			o.betaFromLoads,
			p.newField("beta-dns").box,
			small("A typed βdns applies when the box above is off, and only where it is higher than a combination's own."),
			labelled("(EI)eff, ACI 318-19 6.6.4.4.4", o.eiMethod),
			o.cap14,
			o.nonswayK1,
		)
	case "timber":
		o.species = widget.NewSelect(labels(speciesChoices), func(s string) {
			p.change(func(sc *model.Scheme) { sc.Timber.Species = valueOf(speciesChoices, s) })
		})
		o.grade = widget.NewSelect(labels(gradeChoices), func(s string) {
			p.change(func(sc *model.Scheme) { sc.Timber.Grade = valueOf(gradeChoices, s) })
		})
		o.sawn = widget.NewCheck("Sawn lumber and timbers", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Timber.Sawn = on })
		})
		o.glulam = widget.NewCheck("Glulam", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Timber.Glulam = on })
		})
		all := timber.GlulamCombinations(0)
		o.combos = widget.NewCheckGroup(all, func(sel []string) {
			p.change(func(sc *model.Scheme) {
				if len(sel) == len(all) {
					sc.Timber.GlulamCombos = nil
					return
				}
				cs := []string{}
				for _, c := range all { // keep the table order
					if slices.Contains(sel, c) {
						cs = append(cs, c)
					}
				}
				sc.Timber.GlulamCombos = cs
			})
		})
		o.wet = widget.NewCheck("Wet service (CM)", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Timber.Wet = on })
		})
		o.incised = widget.NewCheck("Incised sawn lumber (Ci)", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Timber.Incised = on })
		})
		o.hot = widget.NewCheck("Sustained 100–125 °F (Ct)", func(on bool) {
			p.change(func(sc *model.Scheme) { sc.Timber.Hot = on })
		})
		o.fireSides = widget.NewSelect(labels(sidesChoices), func(s string) {
			p.change(func(sc *model.Scheme) { fmt.Sscanf(valueOf(sidesChoices, s), "%d", &sc.Timber.FireSides) })
		})
		o.duration = widget.NewSelect(labels(durationChoices), func(s string) {
			p.change(func(sc *model.Scheme) { sc.Timber.Duration = valueOf(durationChoices, s) })
		})
		o.timberProblem = problemLabel()
		return container.NewVBox(
			widget.NewLabel("Products"), o.sawn, o.glulam,
			widget.NewLabel("Glulam combinations"), o.combos, o.timberProblem,
			labelled("Sawn species", o.species),
			labelled("Sawn grade", o.grade),
			widget.NewLabel("Conditions"), o.wet, o.incised, o.hot,
			labelled("Fire exposure (rating under Fire resistance)", o.fireSides),
			labelled("ASD load duration", o.duration),
		)
	case "composite":
		return o.composite.panel(p)
	}
	return nil
}

// sync sets the option widgets from the draft.
func (o *materialWidgets) sync(p *inputsPane) {
	d := &p.st.Draft
	if o.steelFam != nil {
		if len(d.Steel.Families) == 0 && d.Steel.Families == nil {
			o.steelFam.SetSelected(append([]string(nil), steelFamilies...))
		} else {
			o.steelFam.SetSelected(append([]string(nil), d.Steel.Families...))
		}
	}
	if o.barGrade != nil {
		c := d.Concrete
		o.barGrade.SetSelected(labelOf(barGradeChoices, fmt.Sprint(c.BarGrade)))
		o.transverse.SetSelected(labelOf(transverseChoices, c.Transverse))
		o.eiMethod.SetSelected(labelOf(eiChoices, c.EIMethod))
		o.betaFromLoads.SetChecked(c.BetaFromLoads)
		o.cap14.SetChecked(c.SecondOrderCap)
		o.nonswayK1.SetChecked(c.NonswayK1)
	}
	if o.species != nil {
		t := d.Timber
		o.species.SetSelected(labelOf(speciesChoices, t.Species))
		o.grade.SetSelected(labelOf(gradeChoices, t.Grade))
		o.sawn.SetChecked(t.Sawn)
		o.glulam.SetChecked(t.Glulam)
		if t.GlulamCombos == nil {
			o.combos.SetSelected(append([]string(nil), o.combos.Options...))
		} else {
			o.combos.SetSelected(append([]string(nil), t.GlulamCombos...))
		}
		o.wet.SetChecked(t.Wet)
		o.incised.SetChecked(t.Incised)
		o.hot.SetChecked(t.Hot)
		o.fireSides.SetSelected(labelOf(sidesChoices, fmt.Sprint(t.FireSides)))
		o.duration.SetSelected(labelOf(durationChoices, t.Duration))
	}
	o.composite.sync(d)
}

// enable is called when a material is switched on or off.
func (o *materialWidgets) enable(p *inputsPane) {}

// showProblems shows the option problems the state found.
func (o *materialWidgets) showProblems(p *inputsPane) {
	for _, pr := range []struct {
		l  *widget.Label
		id string
	}{{o.steelProblem, "steel families"}, {o.timberProblem, "timber products"}} {
		if pr.l == nil {
			continue
		}
		if msg := p.st.FieldError(pr.id); msg != "" {
			pr.l.SetText(msg)
			pr.l.Show()
		} else {
			pr.l.Hide()
		}
	}
	o.composite.showProblem(p)
}
