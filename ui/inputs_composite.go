package ui

import (
	"slices"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
)

// compositeFamilies are the family names model.CompositeOptions.Families accepts.
var compositeFamilies = model.CompositeFamilies

// The fill strength of the composite columns is a text field like the
// others; it goes after the concrete ones in tab order.
func init() {
	fieldSpecs = append(fieldSpecs, fieldSpec{id: "fill f'c", label: "Fill f'c", q: qStress, psi: true,
		blank: "blank follows the concrete f'c", hint: "concrete f'c",
		get: func(sc *model.Scheme) float64 { return sc.Composite.FillFcMPa },
		set: func(sc *model.Scheme, v float64) { sc.Composite.FillFcMPa = v }})
}

// compositeWidgets are the option inputs of the concrete-filled HSS.
type compositeWidgets struct {
	families *widget.CheckGroup
	problem  *widget.Label
}

// panel returns the composite options: the filled families and the fill's f'c.
func (o *compositeWidgets) panel(p *inputsPane) fyne.CanvasObject {
	o.families = widget.NewCheckGroup(compositeFamilies, func(sel []string) {
		p.change(func(sc *model.Scheme) {
			if len(sel) == len(compositeFamilies) {
				sc.Composite.Families = nil
				return
			}
			fams := []string{}
			for _, f := range compositeFamilies { // keep the display order
				if slices.Contains(sel, f) {
					fams = append(fams, f)
				}
			}
			sc.Composite.Families = fams
		})
	})
	o.problem = problemLabel()
	return container.NewVBox(
		widget.NewLabel("Filled tube families"), o.families, o.problem,
		p.newField("fill f'c").box,
		small("Concrete-filled HSS by AISC 360-22 I2.2. The wall takes the steel Fy (each HSS grade unless typed); the fill is 3,000 to 10,000 psi."),
	)
}

// sync sets the widgets from the draft.
func (o *compositeWidgets) sync(d *model.Scheme) {
	if o.families == nil {
		return
	}
	if d.Composite.Families == nil {
		o.families.SetSelected(append([]string(nil), compositeFamilies...))
	} else {
		o.families.SetSelected(append([]string(nil), d.Composite.Families...))
	}
}

// showProblem shows the state's problem with the family choice, if any.
func (o *compositeWidgets) showProblem(p *inputsPane) {
	if o.problem == nil {
		return
	}
	if msg := p.st.FieldError("composite families"); msg != "" {
		o.problem.SetText(msg)
		o.problem.Show()
	} else {
		o.problem.Hide()
	}
}
