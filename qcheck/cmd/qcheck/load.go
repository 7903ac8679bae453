package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"os"
	"sort"
	"strconv"
	"strings"
	"time"

	"qcheck.dev/qcheck/qasm"
)

// Defaults of the input limits: a file larger than defaultMaxInput bytes is refused before it is
// read, and a file that is not a regular file (a pipe, a device) must be read to its end within
// defaultReadTimeout.
const (
	defaultMaxInput    = 64 << 20
	defaultReadTimeout = 3 * time.Second
)

// readLimits say how input files are read: how much of a file and, for pipes and devices, for
// how long (so that qcheck equiv /dev/zero or a pipe nobody writes to is refused instead of
// running for ever), how many ops a file may expand to, and the values of the input parameters
// of OpenQASM 3 files.
type readLimits struct {
	maxBytes int64
	timeout  time.Duration
	maxOps   int
	inputs   inputValues
	free     bool // inputs without a value are free parameters (qasm.FreeInputs), for equiv
}

func (l *readLimits) register(fs *flag.FlagSet) {
	fs.Int64Var(&l.maxBytes, "max-input", defaultMaxInput, "refuse input files larger than `BYTES`")
	fs.DurationVar(&l.timeout, "read-timeout", defaultReadTimeout, "give up reading an input that is not a regular file (a pipe, a device) after `D`")
	fs.IntVar(&l.maxOps, "max-ops", qasm.DefaultMaxOps, "refuse files that expand to more than `N` ops (also bounds operands, 4N, and the work of expanding gates and loops, 8N)")
	fs.Var(&l.inputs, "input", "value of an OpenQASM 3 input parameter, `NAME=VALUE` (repeat for each); equiv proves for every value the input floats given none")
}

// inputValues is the -input flag: NAME=VALUE pairs.
type inputValues map[string]float64

func (v *inputValues) String() string {
	var parts []string
	for k, x := range *v {
		parts = append(parts, k+"="+strconv.FormatFloat(x, 'g', -1, 64))
	}
	sort.Strings(parts)
	return strings.Join(parts, ",")
}

func (v *inputValues) Set(s string) error {
	name, val, ok := strings.Cut(s, "=")
	x, err := strconv.ParseFloat(strings.TrimSpace(val), 64)
	if !ok || name == "" || err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return fmt.Errorf("want NAME=VALUE with a finite number, got %q", s)
	}
	if *v == nil {
		*v = inputValues{}
	}
	(*v)[strings.TrimSpace(name)] = x
	return nil
}

// read returns the contents of the file at path, refusing a file larger than the limit (before
// reading it when it is a regular file) and, for other files, a read that does not finish within
// the timeout.
func (l readLimits) read(path string) ([]byte, error) {
	if l.maxBytes <= 0 {
		l.maxBytes = defaultMaxInput
	}
	if l.timeout <= 0 {
		l.timeout = defaultReadTimeout
	}
	info, err := os.Stat(path)
	if err != nil {
		return nil, err
	}
	switch {
	case info.IsDir():
		return nil, fmt.Errorf("%s is a directory, not an OpenQASM file", path)
	case info.Mode().IsRegular():
		if info.Size() > l.maxBytes {
			return nil, fmt.Errorf("%s is %d bytes, more than the %d the input limit allows (raise it with -max-input)", path, info.Size(), l.maxBytes)
		}
		return l.readAll(path)
	}
	// A pipe blocks in open until a writer comes, and a device may never end: read in the
	// background and give up at the deadline. The goroutine is left blocked; the command exits.
	type result struct {
		src []byte
		err error
	}
	done := make(chan result, 1)
	go func() {
		src, err := l.readAll(path)
		done <- result{src, err}
	}()
	select {
	case r := <-done:
		return r.src, r.err
	case <-time.After(l.timeout):
		return nil, fmt.Errorf("%s (not a regular file) was not read to its end within %v (raise it with -read-timeout)", path, l.timeout)
	}
}

func (l readLimits) readAll(path string) ([]byte, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	src, err := io.ReadAll(io.LimitReader(f, l.maxBytes+1))
	if err != nil {
		return nil, err
	}
	if int64(len(src)) > l.maxBytes {
		return nil, fmt.Errorf("%s holds more than the %d bytes the input limit allows (raise it with -max-input)", path, l.maxBytes)
	}
	return src, nil
}

// load reads and parses an OpenQASM file within the limits. Errors name the file and, for bad
// OpenQASM, the line and column: "a.qasm:3:7: unknown gate foo".
func (l readLimits) load(path string) (*qasm.Program, error) {
	src, err := l.read(path)
	if err != nil {
		return nil, err
	}
	opts := []qasm.Option{qasm.MaxOps(l.maxOps), qasm.Inputs(l.inputs)}
	if l.free {
		opts = append(opts, qasm.FreeInputs())
	}
	p, err := qasm.ParseProgram(src, opts...)
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
