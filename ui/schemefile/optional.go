package schemefile

// Fields added to version 1 after its first release are optional on
// reading: an absent field takes the model's default, so older files read
// unchanged. Marshal always writes them.

// absentBool reads a boolean field, def when the field is absent.
func (r *reader) absentBool(n *node, path, key string, def bool, give string) (bool, error) {
	if n.get(key) == nil {
		return def, nil
	}
	return r.boolean(n, path, key, give)
}

// absentNum reads a number field where absent or null means 0 (the model's default).
func (r *reader) absentNum(n *node, path, key, give string) (float64, error) {
	if n.get(key) == nil {
		return 0, nil
	}
	return r.optNum(n, path, key, give)
}
