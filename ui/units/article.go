package units

import "strings"

// Article puts "a" or "an" before a word as its first sound needs ("a length", "an area").
func Article(word string) string {
	w := strings.ToLower(strings.TrimSpace(word))
	if w != "" && strings.ContainsRune("aeiou", rune(w[0])) && !strings.HasPrefix(w, "uni") && !strings.HasPrefix(w, "one") {
		return "an " + word
	}
	return "a " + word
}
