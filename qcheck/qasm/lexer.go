package qasm

import (
	"fmt"
	"strconv"
	"unicode"
	"unicode/utf8"
)

// kind is the class of a token.
type kind uint8

const (
	tEOF    kind = iota
	tIdent       // a name: letters, digits and _, not starting with a digit
	tNumber      // a non-negative real or integer literal
	tString      // a double-quoted string, quotes included
	tPunct       // one of ; , [ ] ( ) { } + - * / ^ and the two-byte -> and == (OpenQASM 3 has more)
)

// token is one lexical unit; text points into the source.
type token struct {
	kind kind
	off  int
	text []byte
}

func (t token) is(s string) bool { return t.kind != tEOF && t.kind != tString && string(t.text) == s }

func (t token) describe() string {
	switch t.kind {
	case tEOF:
		return "end of file"
	case tString:
		return "string " + string(t.text)
	}
	return strconv.Quote(string(t.text))
}

// lexer splits an OpenQASM source into tokens, skipping spaces and // comments. With v3 set it
// reads OpenQASM 3: block comments, Unicode letters in names (θ, π), physical qubits $n (an
// identifier token), underscores in numbers, and the operators of the 3 grammar.
type lexer struct {
	src []byte
	pos int
	v3  bool
}

// punct3 are the operators of OpenQASM 3 beyond those of 2.0, longest first.
var punct3 = []string{
	"**=", "<<=", ">>=",
	"==", "!=", "<=", ">=", "&&", "||", "**", "<<", ">>", "++", "->",
	"+=", "-=", "*=", "/=", "%=", "&=", "|=", "^=",
	"@", ":", "%", "&", "|", "~", "!", "<", ">", "=", ".",
}

// next returns the next token, or an error for a byte that starts no token.
func (l *lexer) next() (token, error) {
	src := l.src
	if l.pos == 0 && len(src) >= 3 && src[0] == 0xEF && src[1] == 0xBB && src[2] == 0xBF {
		l.pos = 3 // a UTF-8 byte order mark, as some editors write
	}
	for l.pos < len(src) {
		c := src[l.pos]
		if c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f' || c == '\v' {
			l.pos++
			continue
		}
		if c == '/' && l.pos+1 < len(src) && src[l.pos+1] == '/' {
			for l.pos < len(src) && src[l.pos] != '\n' {
				l.pos++
			}
			continue
		}
		if l.v3 && c == '/' && l.pos+1 < len(src) && src[l.pos+1] == '*' {
			end := l.pos + 2
			for end+1 < len(src) && !(src[end] == '*' && src[end+1] == '/') {
				end++
			}
			if end+1 >= len(src) {
				return token{}, l.errorf(l.pos, "block comment not closed with */")
			}
			l.pos = end + 2
			continue
		}
		break
	}
	start := l.pos
	if start >= len(src) {
		return token{kind: tEOF, off: start}, nil
	}
	c := src[start]
	if l.v3 {
		if t, ok, err := l.next3(start); ok || err != nil {
			return t, err
		}
	}
	switch {
	case isLetter(c):
		l.pos++
		for l.pos < len(src) && (isLetter(src[l.pos]) || isDigit(src[l.pos])) {
			l.pos++
		}
		return token{kind: tIdent, off: start, text: src[start:l.pos]}, nil
	case isDigit(c) || c == '.' && start+1 < len(src) && isDigit(src[start+1]):
		for l.pos < len(src) && isDigit(src[l.pos]) {
			l.pos++
		}
		if l.pos < len(src) && src[l.pos] == '.' {
			l.pos++
			for l.pos < len(src) && isDigit(src[l.pos]) {
				l.pos++
			}
		}
		if l.pos < len(src) && (src[l.pos] == 'e' || src[l.pos] == 'E') {
			p := l.pos + 1
			if p < len(src) && (src[p] == '+' || src[p] == '-') {
				p++
			}
			if p >= len(src) || !isDigit(src[p]) {
				return token{}, l.errorf(start, "malformed number %q: exponent has no digits", src[start:min(p, len(src))])
			}
			for p < len(src) && isDigit(src[p]) {
				p++
			}
			l.pos = p
		}
		if l.pos < len(src) && isLetter(src[l.pos]) {
			return token{}, l.errorf(start, "malformed number %q", src[start:l.pos+1])
		}
		return token{kind: tNumber, off: start, text: src[start:l.pos]}, nil
	case c == '"':
		l.pos++
		for l.pos < len(src) && src[l.pos] != '"' && src[l.pos] != '\n' {
			l.pos++
		}
		if l.pos >= len(src) || src[l.pos] != '"' {
			return token{}, l.errorf(start, "string not closed on its line")
		}
		l.pos++
		return token{kind: tString, off: start, text: src[start:l.pos]}, nil
	case c == '-' && start+1 < len(src) && src[start+1] == '>', c == '=' && start+1 < len(src) && src[start+1] == '=':
		l.pos += 2
		return token{kind: tPunct, off: start, text: src[start:l.pos]}, nil
	}
	if c == '/' && start+1 < len(src) && src[start+1] == '*' {
		return token{}, l.errorf(start, "block comments /* */ are not part of OpenQASM 2.0; use //")
	}
	switch c {
	case ';', ',', '[', ']', '(', ')', '{', '}', '+', '-', '*', '/', '^', '>', '<', '=', '!':
		l.pos++
		return token{kind: tPunct, off: start, text: src[start:l.pos]}, nil
	}
	if c >= 0x80 || c < 0x20 {
		return token{}, l.errorf(start, "unexpected byte 0x%02x", c)
	}
	return token{}, l.errorf(start, "unexpected character %q", c)
}

// next3 reads the tokens OpenQASM 3 spells differently from 2.0: names with Unicode letters,
// $n, numbers with underscores or a base prefix, and the longer operators. It reports false for
// a token that 2.0's rules read the same way.
func (l *lexer) next3(start int) (token, bool, error) {
	src := l.src
	c := src[start]
	switch {
	case isLetter(c) || c >= 0x80:
		end := start
		for end < len(src) {
			r, n := utf8.DecodeRune(src[end:])
			if r == utf8.RuneError && n <= 1 {
				if end == start {
					return token{}, false, l.errorf(start, "unexpected byte 0x%02x", src[start])
				}
				break
			}
			if !(r == '_' || unicode.IsLetter(r) || end > start && unicode.IsDigit(r)) {
				break
			}
			end += n
		}
		if end == start {
			r, _ := utf8.DecodeRune(src[start:])
			return token{}, false, l.errorf(start, "unexpected character %q", r)
		}
		l.pos = end
		return token{kind: tIdent, off: start, text: src[start:end]}, true, nil
	case c == '$':
		end := start + 1
		for end < len(src) && isDigit(src[end]) {
			end++
		}
		if end == start+1 {
			return token{}, false, l.errorf(start, "$ must be followed by a physical qubit number")
		}
		l.pos = end
		return token{kind: tIdent, off: start, text: src[start:end]}, true, nil
	case c == '0' && start+1 < len(src) && (src[start+1] == 'x' || src[start+1] == 'X' || src[start+1] == 'b' || src[start+1] == 'B' || src[start+1] == 'o' || src[start+1] == 'O'):
		end := start + 2
		for end < len(src) && (isDigit(src[end]) || isLetter(src[end])) {
			end++
		}
		l.pos = end
		return token{kind: tNumber, off: start, text: src[start:end]}, true, nil
	case isDigit(c) || c == '.' && start+1 < len(src) && isDigit(src[start+1]):
		// 2.0's rules, with underscores between digits, and a unit after the number refused.
		end := start
		digits := func() {
			for end < len(src) && (isDigit(src[end]) || src[end] == '_' && end > start && isDigit(src[end-1]) && end+1 < len(src) && isDigit(src[end+1])) {
				end++
			}
		}
		digits()
		if end < len(src) && src[end] == '.' {
			end++
			digits()
		}
		if end < len(src) && (src[end] == 'e' || src[end] == 'E') {
			p := end + 1
			if p < len(src) && (src[p] == '+' || src[p] == '-') {
				p++
			}
			if p >= len(src) || !isDigit(src[p]) {
				return token{}, false, l.errorf(start, "malformed number %q: exponent has no digits", src[start:min(p, len(src))])
			}
			end = p
			digits()
		}
		if end < len(src) && (isLetter(src[end]) || src[end] >= 0x80) {
			u := end
			for u < len(src) && (isLetter(src[u]) || src[u] >= 0x80) {
				u++
			}
			switch unit := string(src[end:u]); unit {
			case "ns", "us", "µs", "ms", "s", "dt":
				return token{}, false, l.errorf(start, "durations (%s%s) are not supported: timing has no place in a circuit's meaning here", src[start:end], unit)
			case "im":
				return token{}, false, l.errorf(start, "complex numbers (%s) are not supported", src[start:u])
			}
			return token{}, false, l.errorf(start, "malformed number %q", src[start:u])
		}
		l.pos = end
		return token{kind: tNumber, off: start, text: src[start:end]}, true, nil
	case c == '#':
		return token{}, false, l.errorf(start, "pragmas (#pragma) are not supported")
	}
	for _, p := range punct3 {
		if len(src)-start >= len(p) && string(src[start:start+len(p)]) == p {
			l.pos = start + len(p)
			return token{kind: tPunct, off: start, text: src[start:l.pos]}, true, nil
		}
	}
	return token{}, false, nil
}

func (l *lexer) errorf(off int, format string, args ...any) *Error {
	line, col := position(l.src, off)
	return &Error{Line: line, Col: col, Msg: fmt.Sprintf(format, args...)}
}

func isLetter(c byte) bool { return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c == '_' }
func isDigit(c byte) bool  { return c >= '0' && c <= '9' }
