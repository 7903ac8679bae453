package qcheck

import (
	"fmt"
	"runtime/debug"

	"qcheck.dev/qcheck/circuit"
)

// FailureKind says how a pass went wrong.
type FailureKind int

const (
	// NotEquivalent: the pass returned a circuit whose meaning differs from its input's.
	NotEquivalent FailureKind = iota + 1
	// PassError: the pass returned an error for a valid input circuit.
	PassError
	// PassPanic: the pass panicked.
	PassPanic
	// ModifiedInput: the pass changed the circuit it was given instead of returning a new one.
	ModifiedInput
	// BadOutput: the pass returned a nil or ill-formed circuit, a circuit of the wrong width, or
	// a layout that is not a permutation.
	BadOutput
)

// String returns how the pass failed, in words.
func (k FailureKind) String() string {
	switch k {
	case NotEquivalent:
		return "changed the circuit's meaning"
	case PassError:
		return "returned an error"
	case PassPanic:
		return "panicked"
	case ModifiedInput:
		return "modified its input circuit"
	case BadOutput:
		return "returned an unusable circuit"
	}
	return fmt.Sprintf("FailureKind(%d)", int(k))
}

// Failure is an input circuit on which a pass is wrong, and what went wrong. From Preserves it is
// the smallest such circuit rapid could shrink to; from Search it is 1-minimal.
type Failure struct {
	Kind FailureKind
	// Input is the circuit given to the pass (as it was before the pass ran).
	Input *circuit.Circuit
	// Output is what the pass returned, or nil; Layout is the final layout a LayoutPass reported.
	Output *circuit.Circuit
	Layout []int
	// Modified is the input circuit after the pass changed it, for ModifiedInput.
	Modified *circuit.Circuit
	// Err is the pass's error (PassError), the panic value with its stack (PassPanic), or why
	// the output could not be compared (BadOutput).
	Err error
	// Result is the comparison of Input and Output, for NotEquivalent.
	Result *Result
	// Seed and Passed describe how Search found the failure: the seed of the failing draw
	// (see Search for how it replays), and how many checks passed before it. They are zero from
	// Preserves, where rapid prints how to replay.
	Seed   uint64
	Passed int
}

// subject is a pass of either kind, seen uniformly.
type subject func(*circuit.Circuit) (*circuit.Circuit, []int, error)

func (p Pass) subject() subject {
	if p == nil {
		return nil
	}
	return func(c *circuit.Circuit) (*circuit.Circuit, []int, error) {
		out, err := p(c)
		return out, nil, err
	}
}

func (p LayoutPass) subject() subject {
	if p == nil {
		return nil
	}
	return subject(p)
}

// trial runs the pass on one input and checks everything that can go wrong. It returns nil when
// the pass is correct on this input.
func trial(cfg *config, pass subject, in *circuit.Circuit) *Failure {
	keep := in.Clone()
	out, layout, err, panicked := runGuarded(pass, in)
	switch {
	case panicked:
		return &Failure{Kind: PassPanic, Input: keep, Err: err}
	case !in.Equal(keep):
		return &Failure{Kind: ModifiedInput, Input: keep, Output: out, Layout: layout, Modified: in.Clone(), Err: err}
	case err != nil:
		return &Failure{Kind: PassError, Input: keep, Err: err}
	case out == nil:
		return &Failure{Kind: BadOutput, Input: keep, Layout: layout, Err: fmt.Errorf("the pass returned a nil circuit and no error")}
	}
	c := cfg
	if layout != nil {
		copied := *cfg
		copied.perm = layout
		c = &copied
	}
	r, err := compare(c, keep, out, false)
	if err != nil {
		return &Failure{Kind: BadOutput, Input: keep, Output: out, Layout: layout, Err: err}
	}
	if r.Equivalent {
		return nil
	}
	return &Failure{Kind: NotEquivalent, Input: keep, Output: out, Layout: layout, Result: &r}
}

// passPanic is the error a panicking pass is reported with.
type passPanic struct {
	value any
	stack []byte
}

func (p *passPanic) Error() string { return fmt.Sprintf("panic: %v\n\n%s", p.value, p.stack) }

// runGuarded runs the pass, turning a panic into an error.
func runGuarded(pass subject, in *circuit.Circuit) (out *circuit.Circuit, layout []int, err error, panicked bool) {
	defer func() {
		if v := recover(); v != nil {
			out, layout, err, panicked = nil, nil, &passPanic{value: v, stack: debug.Stack()}, true
		}
	}()
	out, layout, err = pass(in)
	return out, layout, err, false
}
