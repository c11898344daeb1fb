package ui

import (
	"upright/ui/model"
)

// showVariantsDemo is the Variants screenshot: the scheme shown with four
// variants (as testdata/schemes/demo-variants.upright.json has them), on the
// Variants tab; it returns what undoes both.
func showVariantsDemo(w *Window) func() {
	was := append([]model.Variant(nil), w.st.Draft.Variants...)
	w.Edit("variants for the screenshot", func(sc *model.Scheme) {
		sc.Variants = []model.Variant{
			{Name: "22 ft ground floor", Changes: []model.Change{{Name: "length", Value: "22ft"}}},
			{Name: "2 h rating", Changes: []model.Change{{Name: "fire", Value: "2h"}}},
			{Name: "fixed bases", Changes: []model.Change{{Name: "ends", Value: "fixed-pinned"}}},
			{Name: "bigger bays", Changes: []model.Change{{Name: "tributary", Value: "1200ft2"}}},
		}
	})
	undoTab := showTab("Variants")(w)
	return func() {
		undoTab()
		w.Edit("variants back", func(sc *model.Scheme) { sc.Variants = was })
	}
}
