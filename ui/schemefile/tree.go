package schemefile

import (
	"bytes"
	"fmt"
	"unicode/utf16"
	"unicode/utf8"
)

// maxDepth bounds object and array nesting; a scheme file needs four levels.
const maxDepth = 16

// nodeKind is the JSON type of a node.
type nodeKind int

const (
	kindNull nodeKind = iota
	kindBool
	kindNumber
	kindString
	kindObject
	kindArray
)

func (k nodeKind) String() string {
	return [...]string{"null", "true or false", "a number", "a string", "an object", "an array"}[k]
}

// node is one parsed JSON value with the byte offset where it starts, so
// that every later complaint can give a line and column.
type node struct {
	kind  nodeKind
	off   int64
	b     bool
	num   string // the number's text, exactly as written
	str   string
	keys  []string // object keys in file order
	koffs []int64  // where each key starts, parallel to keys
	vals  []*node  // object values, parallel to keys
	items []*node  // array items
}

// get returns the value of an object key, or nil.
func (n *node) get(key string) *node {
	for i, k := range n.keys {
		if k == key {
			return n.vals[i]
		}
	}
	return nil
}

// text is a short rendering of a scalar node for messages.
func (n *node) text() string {
	switch n.kind {
	case kindString:
		return fmt.Sprintf("%q", n.str)
	case kindNumber:
		return n.num
	case kindBool:
		return fmt.Sprint(n.b)
	case kindNull:
		return "null"
	}
	return n.kind.String()
}

// parser builds a node tree from the bytes of a JSON text (RFC 8259),
// rejecting malformed JSON, duplicate keys, nesting deeper than maxDepth and
// content after the value. Like encoding/json it replaces invalid UTF-8 and
// lone surrogate escapes in strings with U+FFFD.
type parser struct {
	data []byte
	i    int
}

// parseTree parses data into a tree. Errors are *Error with a line and column.
func parseTree(data []byte) (*node, error) {
	p := &parser{data: data}
	n, err := p.value(0)
	if err != nil {
		return nil, err
	}
	p.space()
	if p.i < len(p.data) {
		return nil, p.errAt(p.i, "unexpected content after the end of the scheme object; a scheme file holds exactly one JSON object")
	}
	return n, nil
}

// errAt builds an *Error at a byte offset.
func (p *parser) errAt(off int, msg string) *Error {
	line, col := lineCol(p.data, int64(off))
	return &Error{Line: line, Column: col, Msg: msg}
}

// bad reports malformed JSON at the current offset.
func (p *parser) bad(what string) *Error {
	if p.i >= len(p.data) {
		return p.errAt(p.i, "malformed JSON: the file ends before the scheme object is complete")
	}
	r, _ := utf8.DecodeRune(p.data[p.i:])
	return p.errAt(p.i, fmt.Sprintf("malformed JSON: unexpected %q, expected %s", r, what))
}

func (p *parser) space() {
	for p.i < len(p.data) {
		switch p.data[p.i] {
		case ' ', '\t', '\r', '\n':
			p.i++
		default:
			return
		}
	}
}

func (p *parser) literal(word string) bool {
	if bytes.HasPrefix(p.data[p.i:], []byte(word)) {
		p.i += len(word)
		return true
	}
	return false
}

func (p *parser) value(depth int) (*node, error) {
	p.space()
	start := int64(p.i)
	if p.i >= len(p.data) {
		return nil, p.bad("a value")
	}
	switch c := p.data[p.i]; {
	case c == '{' || c == '[':
		if depth >= maxDepth {
			return nil, p.errAt(p.i, fmt.Sprintf("nesting deeper than %d levels; a scheme file needs four", maxDepth))
		}
		if c == '{' {
			return p.object(depth)
		}
		return p.array(depth)
	case c == '"':
		s, err := p.str()
		if err != nil {
			return nil, err
		}
		return &node{kind: kindString, off: start, str: s}, nil
	case c == '-' || c >= '0' && c <= '9':
		num, err := p.number()
		if err != nil {
			return nil, err
		}
		return &node{kind: kindNumber, off: start, num: num}, nil
	case p.literal("true"):
		return &node{kind: kindBool, off: start, b: true}, nil
	case p.literal("false"):
		return &node{kind: kindBool, off: start}, nil
	case p.literal("null"):
		return &node{kind: kindNull, off: start}, nil
	}
	return nil, p.bad("a value")
}

func (p *parser) object(depth int) (*node, error) {
	n := &node{kind: kindObject, off: int64(p.i)}
	p.i++ // '{'
	p.space()
	if p.i < len(p.data) && p.data[p.i] == '}' {
		p.i++
		return n, nil
	}
	for {
		p.space()
		kstart := int64(p.i)
		if p.i >= len(p.data) || p.data[p.i] != '"' {
			return nil, p.bad("a string key")
		}
		key, err := p.str()
		if err != nil {
			return nil, err
		}
		if n.get(key) != nil {
			return nil, p.errAt(int(kstart), fmt.Sprintf("the key %q appears twice in the same object", key))
		}
		p.space()
		if p.i >= len(p.data) || p.data[p.i] != ':' {
			return nil, p.bad("':' after an object key")
		}
		p.i++
		v, err := p.value(depth + 1)
		if err != nil {
			return nil, err
		}
		n.keys = append(n.keys, key)
		n.koffs = append(n.koffs, kstart)
		n.vals = append(n.vals, v)
		p.space()
		if p.i < len(p.data) && p.data[p.i] == ',' {
			p.i++
			continue
		}
		if p.i < len(p.data) && p.data[p.i] == '}' {
			p.i++
			return n, nil
		}
		return nil, p.bad("',' or '}' after an object value")
	}
}

func (p *parser) array(depth int) (*node, error) {
	n := &node{kind: kindArray, off: int64(p.i)}
	p.i++ // '['
	p.space()
	if p.i < len(p.data) && p.data[p.i] == ']' {
		p.i++
		return n, nil
	}
	for {
		v, err := p.value(depth + 1)
		if err != nil {
			return nil, err
		}
		n.items = append(n.items, v)
		p.space()
		if p.i < len(p.data) && p.data[p.i] == ',' {
			p.i++
			continue
		}
		if p.i < len(p.data) && p.data[p.i] == ']' {
			p.i++
			return n, nil
		}
		return nil, p.bad("',' or ']' after an array item")
	}
}

// number reads a JSON number and returns its text.
func (p *parser) number() (string, error) {
	start := p.i
	digits := func() int {
		k := p.i
		for p.i < len(p.data) && p.data[p.i] >= '0' && p.data[p.i] <= '9' {
			p.i++
		}
		return p.i - k
	}
	if p.data[p.i] == '-' {
		p.i++
	}
	if p.i < len(p.data) && p.data[p.i] == '0' {
		p.i++
	} else if digits() == 0 {
		return "", p.bad("a digit")
	}
	if p.i < len(p.data) && p.data[p.i] == '.' {
		p.i++
		if digits() == 0 {
			return "", p.bad("a digit after the decimal point")
		}
	}
	if p.i < len(p.data) && (p.data[p.i] == 'e' || p.data[p.i] == 'E') {
		p.i++
		if p.i < len(p.data) && (p.data[p.i] == '+' || p.data[p.i] == '-') {
			p.i++
		}
		if digits() == 0 {
			return "", p.bad("a digit in the exponent")
		}
	}
	return string(p.data[start:p.i]), nil
}

// str reads a JSON string starting at its opening quote.
func (p *parser) str() (string, error) {
	p.i++ // opening quote
	var b []byte
	for {
		if p.i >= len(p.data) {
			return "", p.bad("the closing '\"' of a string")
		}
		c := p.data[p.i]
		switch {
		case c == '"':
			p.i++
			return string(b), nil
		case c < 0x20:
			return "", p.errAt(p.i, fmt.Sprintf("malformed JSON: control character %U inside a string; write it as an escape", rune(c)))
		case c == '\\':
			r, err := p.escape()
			if err != nil {
				return "", err
			}
			b = utf8.AppendRune(b, r)
		case c < utf8.RuneSelf:
			b = append(b, c)
			p.i++
		default:
			r, size := utf8.DecodeRune(p.data[p.i:])
			b = utf8.AppendRune(b, r) // invalid UTF-8 becomes U+FFFD
			p.i += size
		}
	}
}

// escape reads one backslash escape and returns its rune; a lone surrogate
// gives U+FFFD.
func (p *parser) escape() (rune, error) {
	at := p.i
	p.i++ // backslash
	if p.i >= len(p.data) {
		return 0, p.bad("an escape")
	}
	c := p.data[p.i]
	p.i++
	switch c {
	case '"', '\\', '/':
		return rune(c), nil
	case 'b':
		return '\b', nil
	case 'f':
		return '\f', nil
	case 'n':
		return '\n', nil
	case 'r':
		return '\r', nil
	case 't':
		return '\t', nil
	case 'u':
		r, ok := p.hex4()
		if !ok {
			return 0, p.errAt(at, "malformed JSON: \\u must be followed by four hexadecimal digits")
		}
		if utf16.IsSurrogate(r) {
			save := p.i
			if p.i+1 < len(p.data) && p.data[p.i] == '\\' && p.data[p.i+1] == 'u' {
				p.i += 2
				if r2, ok := p.hex4(); ok {
					if dec := utf16.DecodeRune(r, r2); dec != utf8.RuneError {
						return dec, nil
					}
				}
			}
			p.i = save
			return utf8.RuneError, nil
		}
		return r, nil
	}
	return 0, p.errAt(at, fmt.Sprintf("malformed JSON: unknown escape \\%c", c))
}

func (p *parser) hex4() (rune, bool) {
	if p.i+4 > len(p.data) {
		return 0, false
	}
	var r rune
	for _, c := range p.data[p.i : p.i+4] {
		switch {
		case c >= '0' && c <= '9':
			r = r<<4 | rune(c-'0')
		case c >= 'a' && c <= 'f':
			r = r<<4 | rune(c-'a'+10)
		case c >= 'A' && c <= 'F':
			r = r<<4 | rune(c-'A'+10)
		default:
			return 0, false
		}
	}
	p.i += 4
	return r, true
}

// lineCol converts a byte offset to a 1-based line and a 1-based column
// counted in characters.
func lineCol(data []byte, off int64) (line, col int) {
	if off > int64(len(data)) {
		off = int64(len(data))
	}
	if off < 0 {
		off = 0
	}
	before := data[:off]
	line = 1 + bytes.Count(before, []byte{'\n'})
	if i := bytes.LastIndexByte(before, '\n'); i >= 0 {
		before = before[i+1:]
	}
	return line, 1 + utf8.RuneCount(before)
}
