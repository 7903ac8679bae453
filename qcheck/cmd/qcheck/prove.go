package main

import (
	"encoding/json"
	"fmt"
	"slices"
	"strings"

	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/param"
	"qcheck.dev/qcheck/qasm"
)

// proveFiles compares two files at least one of which has free input parameters (input float
// without a -input value) for every value of the parameters, with param.Prove. Parameters are
// matched by name; one declared by a single file is an error naming it. It exits 0 when proved,
// 1 when refuted (with the counterexample values), and exitOpen when neither.
func (f *compareFlags) proveFiles(c *command, a, b string, pa, pb *qasm.Program, asJSON bool) int {
	if err := f.proveFlags(); err != nil {
		return c.fail("%s vs %s: %v", a, b, err)
	}
	for _, x := range []struct {
		path, other string
		names       []string
		prog        *qasm.Program
	}{{a, b, pa.Free, pb}, {b, a, pb.Free, pa}} {
		for _, name := range x.names {
			if !slices.Contains(x.prog.Free, name) {
				return c.fail("%s: input %s is a free parameter of this file but not of %s; declare it in both (input float %s;) or give its value (-input %s=VALUE)", x.path, name, x.other, name, name)
			}
		}
	}
	left, err := parametric(a, pa)
	if err != nil {
		return c.fail("%v", err)
	}
	right, err := parametric(b, pb)
	if err != nil {
		return c.fail("%v", err)
	}
	res, err := param.Prove(left, right, param.Options{ExactPhase: f.exactPhase, Tolerance: f.tol})
	if err != nil {
		return c.fail("%s vs %s: %v", a, b, err)
	}
	if asJSON {
		out, err := json.MarshalIndent(res, "", "  ")
		if err != nil {
			return c.fail("%v", err)
		}
		fmt.Fprintf(c.stdout, "%s\n", out)
	} else {
		fmt.Fprintf(c.stdout, "%s (want) vs %s (got), for every value of the input parameters %s:\n%s\n", a, b, strings.Join(pa.Free, ", "), res)
	}
	switch res.Verdict {
	case param.Proved:
		return exitOK
	case param.Refuted:
		return exitDiffer
	}
	return exitOpen
}

// proveFlags refuses the flags that have no meaning for a comparison for every value: the proof
// compares unitaries, in operator norm, with the dense engine.
func (f *compareFlags) proveFlags() error {
	for _, x := range []struct {
		set  bool
		flag string
	}{
		{f.perm != "", "-perm"}, {f.measured, "-measured"}, {f.ancillas != "", "-ancillas"},
		{f.program, "-program"}, {f.fromZero, "-from-zero"}, {f.measure != "operator", "-measure " + f.measure},
		{f.engine != qcheck.Auto, "-engine " + string(f.engine)},
	} {
		if x.set {
			return fmt.Errorf("%s is not supported with free input parameters (give them values with -input NAME=VALUE to use it)", x.flag)
		}
	}
	return nil
}

// parametric returns the program read from path as a param.Circuit: the ops whose angles read
// free parameters take them from p.Angles, the others keep their constant angles. It fails at
// the first op that is not a gate (measure, reset, a conditioned op), naming its line.
func parametric(path string, p *qasm.Program) (*param.Circuit, error) {
	out := param.New(p.Circuit.Qubits())
	for i, op := range p.Circuit.Ops {
		if !op.Unitary() && op.Gate.Name != "barrier" {
			return nil, fmt.Errorf("%s:%d: %s: a file with free input parameters (%s) must be a circuit of gates only (give the inputs values, -input NAME=VALUE)",
				path, p.Lines[i], op.Gate.Name, strings.Join(p.Free, ", "))
		}
		angles, ok := p.Angles[i]
		if !ok {
			out.Append(op.Gate, op.Qubits...)
			continue
		}
		exprs := make([]param.Expr, len(angles))
		for k, a := range angles {
			e := param.Const(a.Const)
			for _, name := range a.Params() {
				e = e.Plus(param.Var(name).TimesRat(a.Coefs[name]))
			}
			exprs[k] = e
		}
		out.Gate(op.Gate, exprs, op.Qubits...)
	}
	return out, nil
}
