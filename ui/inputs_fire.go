package ui

import (
	"strconv"

	"fyne.io/fyne/v2"
	"fyne.io/fyne/v2/container"
	"fyne.io/fyne/v2/widget"

	"upright/ui/model"
)

// Choice lists of the scheme's fire rating.
var (
	fireRatingChoices = []choice{{"None", "none"}, {"1 hour", "1h"}, {"1½ hours", "1.5h"}, {"2 hours", "2h"}, {"3 hours", "3h"}}
	aggregateChoices  = []choice{{"Siliceous", "siliceous"}, {"Carbonate", "carbonate"}, {"Semi-lightweight", "semi-lightweight"}}
	protectionChoices = []choice{{"Gypsum board box", "board"}, {"Sprayed material", "spray"}}
)

// fireWidgets are the inputs of the scheme's one fire-resistance rating.
type fireWidgets struct {
	rating     *widget.Select
	aggregate  *widget.Select
	protection *widget.Select // steel (and filled tubes that need it): board or spray
}

// buildFireInputs makes the fire-resistance group: the rating every
// material answers to and the concrete aggregate it depends on.
func (p *inputsPane) buildFireInputs() fyne.CanvasObject {
	p.fire.rating = widget.NewSelect(labels(fireRatingChoices), func(s string) {
		p.change(func(sc *model.Scheme) { sc.Fire.Rating = valueOf(fireRatingChoices, s) })
	})
	p.fire.aggregate = widget.NewSelect(labels(aggregateChoices), func(s string) {
		p.change(func(sc *model.Scheme) { sc.Fire.Aggregate = valueOf(aggregateChoices, s) })
	})
	p.fire.protection = widget.NewSelect(labels(protectionChoices), func(s string) {
		p.change(func(sc *model.Scheme) { sc.Fire.SteelProtection = valueOf(protectionChoices, s) })
	})
	note := small("Steel boxed in Type X gypsum board or sprayed, concrete least size and cover, timber char. Calculated methods for comparison; listed assemblies and the local code govern.")
	note.Wrapping = fyne.TextWrapWord
	return container.NewVBox(heading("Fire resistance"),
		row("Rating", p.fire.rating),
		row("Concrete aggregate", p.fire.aggregate),
		row("Steel protection", p.fire.protection),
		note,
	)
}

// syncFire sets the fire inputs from the draft.
func (p *inputsPane) syncFire() {
	if p.fire.rating == nil {
		return
	}
	d := &p.st.Draft
	p.fire.rating.SetSelected(labelOf(fireRatingChoices, d.Fire.Rating))
	p.fire.aggregate.SetSelected(labelOf(aggregateChoices, d.Fire.Aggregate))
	p.fire.protection.SetSelected(labelOf(protectionChoices, d.Fire.SteelProtection))
}

// fireNote is the line under the table note on the fire rating: empty without one.
func fireNote(sc model.Scheme) string {
	if !sc.Fire.On() {
		return ""
	}
	return strconv.FormatFloat(sc.Fire.Hours(), 'f', -1, 64) + " h fire rating: plan, weight and carbon include the protection"
}
