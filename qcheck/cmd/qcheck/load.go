package main

import (
	"errors"
	"fmt"
	"os"

	"qcheck.dev/qcheck/qasm"
)

// load reads and parses an OpenQASM file. Errors name the file and, for bad OpenQASM, the line
// and column: "a.qasm:3:7: unknown gate foo".
func load(path string) (*qasm.Program, error) {
	src, err := os.ReadFile(path)
	if err != nil {
		return nil, err
	}
	p, err := qasm.ParseProgram(src)
	if err != nil {
		var e *qasm.Error
		if errors.As(err, &e) {
			return nil, fmt.Errorf("%s:%d:%d: %s", path, e.Line, e.Col, e.Msg)
		}
		return nil, fmt.Errorf("%s: %v", path, err)
	}
	return p, nil
}

// refuseDirectives returns an error naming the file and line of the first measure or reset, for
// comparisons of unitaries, which have no place for them.
func refuseDirectives(path string, p *qasm.Program, hint string) error {
	for i, op := range p.Circuit.Ops {
		if name := op.Gate.Name; name == "measure" || name == "reset" {
			return fmt.Errorf("%s:%d: %s has no unitary; %s", path, p.Lines[i], name, hint)
		}
	}
	return nil
}
