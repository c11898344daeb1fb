package schemefile

import "upright/ui/model"

// reportMapKey is the optional top-level field that puts the map of the
// winning family in the client report; Marshal always writes it.
const reportMapKey = "report_map"

func init() { topKeys = append(topKeys, reportMapKey) }

// reportMap reads the optional report_map field; absent means false.
func (r *reader) reportMap(root *node, sc *model.Scheme) error {
	if root.get(reportMapKey) == nil {
		sc.ReportMap = false
		return nil
	}
	v, err := r.boolean(root, "", reportMapKey, "true to put the map of the winning family over length and load in the client report")
	if err != nil {
		return err
	}
	sc.ReportMap = v
	return nil
}
