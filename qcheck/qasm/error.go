package qasm

import "fmt"

// Error is a problem in an OpenQASM source: where it is (1-based line and column, counted in
// bytes) and what is wrong. Every error Parse returns for bad input is an *Error.
type Error struct {
	Line, Col int
	Msg       string
}

func (e *Error) Error() string { return fmt.Sprintf("qasm: %d:%d: %s", e.Line, e.Col, e.Msg) }

// position returns the 1-based line and column of byte offset off in src.
func position(src []byte, off int) (line, col int) {
	if off > len(src) {
		off = len(src)
	}
	line, start := 1, 0
	for i := 0; i < off; i++ {
		if src[i] == '\n' {
			line++
			start = i + 1
		}
	}
	return line, off - start + 1
}
