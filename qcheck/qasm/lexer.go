package qasm

import (
	"fmt"
	"strconv"
)

// kind is the class of a token.
type kind uint8

const (
	tEOF    kind = iota
	tIdent       // a name: letters, digits and _, not starting with a digit
	tNumber      // a non-negative real or integer literal
	tString      // a double-quoted string, quotes included
	tPunct       // one of ; , [ ] ( ) { } + - * / ^ and the two-byte -> and ==
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

// lexer splits an OpenQASM 2.0 source into tokens, skipping spaces and // comments.
type lexer struct {
	src []byte
	pos int
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
		break
	}
	start := l.pos
	if start >= len(src) {
		return token{kind: tEOF, off: start}, nil
	}
	c := src[start]
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

func (l *lexer) errorf(off int, format string, args ...any) *Error {
	line, col := position(l.src, off)
	return &Error{Line: line, Col: col, Msg: fmt.Sprintf(format, args...)}
}

func isLetter(c byte) bool { return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c == '_' }
func isDigit(c byte) bool  { return c >= '0' && c <= '9' }
