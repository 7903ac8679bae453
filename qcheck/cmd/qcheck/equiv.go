package main

import (
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"strconv"
	"strings"
	"time"

	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/qasm"
)

// compareFlags are the flags that set how two circuits are compared, shared by equiv and pairs.
type compareFlags struct {
	tol        float64
	exactPhase bool
	perm       string
	measured   bool
	ancillas   string
	dirty      bool
	measure    string
	engine     qcheck.Engine
	work       float64
	timeout    time.Duration
	limits     readLimits
	program    bool
	fromZero   bool
}

func (f *compareFlags) register(fs *flag.FlagSet) {
	fs.Float64Var(&f.tol, "tol", qcheck.DefaultTolerance, "largest distance `EPS` that still counts as equivalent")
	fs.BoolVar(&f.exactPhase, "exact-phase", false, "count a global phase as a difference")
	fs.StringVar(&f.perm, "perm", "", "output permutation `P0,P1,...`: logical qubit i of A ends on qubit Pi of B")
	fs.BoolVar(&f.measured, "measured", false, "compare only the distributions of the classical bits the final measurements write, for every input (of all qubits if neither file measures); certified, or refused as undecided")
	fs.StringVar(&f.ancillas, "ancillas", "", "qubits `Q,...` of B borrowed as ancillas (clean: start and end in |0⟩); A may omit them")
	fs.BoolVar(&f.dirty, "dirty", false, "the -ancillas start in any state and must be restored")
	fs.StringVar(&f.measure, "measure", "operator", "`MEASURE` that decides: operator (norm), diamond, or fidelity (average infidelity)")
	fs.BoolVar(&f.program, "program", false, "compare as programs: the distributions of the classical bits at the end (the default when a file measures, resets or has an if)")
	fs.BoolVar(&f.fromZero, "from-zero", false, "compare on the input |0…0⟩ only (with -measured: the distributions of the measured qubits from there)")
	fs.TextVar(&f.engine, "engine", qcheck.Auto, "`ENGINE` that answers: auto, dense, tableau (Clifford circuits) or matrix-free (see above)")
	fs.Float64Var(&f.work, "work", 0, "refuse, before starting, a comparison estimated to take more than `UNITS` amplitude updates (0: the library's default, 10¹²)")
	fs.DurationVar(&f.timeout, "timeout", 0, "give up on a comparison after `DURATION` (such as 30s or 5m; 0: no limit), exit 2")
	f.limits.register(fs)
}

// options turns the flags into qcheck options.
func (f *compareFlags) options() ([]qcheck.Option, error) {
	opts := []qcheck.Option{qcheck.Tolerance(f.tol)}
	if f.work != 0 {
		opts = append(opts, qcheck.WorkLimit(f.work))
	}
	if f.timeout < 0 {
		return nil, fmt.Errorf("-timeout %v: the timeout must not be negative", f.timeout)
	}
	if f.exactPhase {
		opts = append(opts, qcheck.ExactPhase())
	}
	if f.perm != "" {
		perm, err := intList(f.perm)
		if err != nil {
			return nil, fmt.Errorf("-perm: %v", err)
		}
		opts = append(opts, qcheck.OutputPermutation(perm))
	}
	if f.ancillas != "" {
		qs, err := intList(f.ancillas)
		if err != nil {
			return nil, fmt.Errorf("-ancillas: %v", err)
		}
		state := qcheck.Clean
		if f.dirty {
			state = qcheck.Dirty
		}
		opts = append(opts, qcheck.Ancillas(qs, state))
	} else if f.dirty {
		return nil, fmt.Errorf("-dirty needs -ancillas")
	}
	if f.measured {
		opts = append(opts, qcheck.Measured())
	}
	switch f.measure {
	case "operator":
	case "diamond":
		opts = append(opts, qcheck.UseMeasure(qcheck.Diamond))
	case "fidelity":
		opts = append(opts, qcheck.UseMeasure(qcheck.AverageFidelity))
	default:
		return nil, fmt.Errorf("-measure %q: choose operator, diamond or fidelity", f.measure)
	}
	switch {
	case f.program && f.fromZero:
		return nil, fmt.Errorf("-program and -from-zero are different meanings; choose one")
	case f.program:
		opts = append(opts, qcheck.AsProgram())
	case f.fromZero:
		opts = append(opts, qcheck.FromZero())
	}
	if f.engine != qcheck.Auto {
		opts = append(opts, qcheck.UseEngine(f.engine))
	}
	return opts, nil
}

// flagWords rewrites package qcheck's messages, which name its Go options, in the words of this
// command's flags, and A and B for want and got.
var flagWords = strings.NewReplacer(
	"Tolerance(", "-tol (",
	"ExactPhase()", "-exact-phase",
	"ExactPhase", "-exact-phase",
	"OutputPermutation", "-perm",
	"Ancillas(", "-ancillas (",
	"with Ancillas", "with -ancillas",
	"Measured with UseMeasure(", "-measured with -measure (",
	"UseMeasure(", "-measure (",
	"use OperatorNorm", "use -measure operator",
	"Measured", "-measured",
	"UseEngine(", "-engine (",
	"got's", "B's",
	"want's", "A's",
	"want is ", "A is ",
	"got is ", "B is ",
	"want has ", "A has ",
	"got has ", "B has ",
	"want must ", "A must ",
)

// intList reads "2,0,1".
func intList(s string) ([]int, error) {
	var out []int
	for _, part := range strings.Split(s, ",") {
		v, err := strconv.Atoi(strings.TrimSpace(part))
		if err != nil {
			return nil, fmt.Errorf("%q is not a comma-separated list of qubit indices", s)
		}
		out = append(out, v)
	}
	return out, nil
}

// compareFiles parses both files and compares them; errors name the file and line at fault.
func (f *compareFlags) compareFiles(a, b string) (qcheck.Result, error) {
	pa, err := f.limits.load(a)
	if err != nil {
		return qcheck.Result{}, err
	}
	pb, err := f.limits.load(b)
	if err != nil {
		return qcheck.Result{}, err
	}
	return f.comparePrograms(a, b, pa, pb)
}

// comparePrograms compares the programs read from files a and b.
func (f *compareFlags) comparePrograms(a, b string, pa, pb *qasm.Program) (qcheck.Result, error) {
	opts, err := f.options()
	if err != nil {
		return qcheck.Result{}, err
	}
	if f.fromZero {
		for _, x := range []struct {
			path string
			prog *qasm.Program
		}{{a, pa}, {b, pb}} {
			if err := refuseDirectives(x.path, x.prog, "without -from-zero, files that measure are compared as programs"); err != nil {
				return qcheck.Result{}, err
			}
		}
	}
	r, err := f.compareWithin(pa, pb, opts)
	var opErr *circuit.OpError
	switch {
	case errors.As(err, &opErr):
		path, prog := a, pa
		if opErr.Circuit == "got" {
			path, prog = b, pb
		}
		if opErr.Circuit != "" && opErr.Index < len(prog.Lines) {
			op := prog.Circuit.Ops[opErr.Index]
			return qcheck.Result{}, fmt.Errorf("%s:%d: %s: %s", path, prog.Lines[opErr.Index], op, flagWords.Replace(opErr.Err))
		}
		fallthrough
	case err != nil:
		return qcheck.Result{}, fmt.Errorf("%s vs %s: %s", a, b, flagWords.Replace(err.Error()))
	}
	return r, nil
}

// compareWithin runs the comparison, giving up after the -timeout. A comparison given up on keeps
// running on its goroutine until it ends (Compare cannot be interrupted); the command exits.
func (f *compareFlags) compareWithin(pa, pb *qasm.Program, opts []qcheck.Option) (qcheck.Result, error) {
	if f.timeout == 0 {
		return qcheck.Compare(pa.Circuit, pb.Circuit, opts...)
	}
	type answer struct {
		r   qcheck.Result
		err error
	}
	done := make(chan answer, 1)
	go func() {
		r, err := qcheck.Compare(pa.Circuit, pb.Circuit, opts...)
		done <- answer{r, err}
	}()
	timer := time.NewTimer(f.timeout)
	defer timer.Stop()
	select {
	case a := <-done:
		return a.r, a.err
	case <-timer.C:
		return qcheck.Result{}, fmt.Errorf("gave up after -timeout %v", f.timeout)
	}
}

const equivAbout = `
Compares the circuit of B.qasm (got) with that of A.qasm (want, the reference) and exits 0 when
they are equivalent within the tolerance, 1 when they are not, 2 on bad input or usage.

OpenQASM 3 files may declare free parameters, input float a; (no -input value for a): both files
must then declare the same ones, and the pair is compared for every real value of them (package
param): exit 0 when proved (the output says what the proof certifies: the grid, the degrees and
the certified bound on the distance), 1 when refuted (the output gives values of the parameters
and the distance there; check them with -input NAME=VALUE), 3 when neither (a randomized test
passed, labelled "not a proof", or the certified bound is above -tol). A parameter may appear
only in the angles of rx, ry, rz, crx, cry, crz, p, cp, U (and rxx, ryy, rzz), as sums and
rational multiples; input angle (reduced modulo 2π) cannot be free; other uses are refused at
their line and column. Only -tol and -exact-phase apply; -json writes the proof's result (keys
verdict, method, parameters, points, bound, certifies, counterexample, worst).

By
default the distance is the operator norm of the difference of the two unitaries, minimised over
a global phase. When either file measures, resets or has an if (and neither -measured nor
-from-zero says otherwise), the files are compared as programs, as OpenQASM 2.0 defines them:
every qubit and bit starts at 0, and the meaning is the joint distribution of the classical bits
at the end, compared exactly by total variation through the bits (so a routed program needs no
-perm); the first line of the output says so. Programs use the stabilizer-program engine when
both are Clifford (exact, any width), else the program engine (statevector branches, up to 24
qubits). Human output: a line naming A (want) and B (got), then the verdict with the
measure and distance; on a difference, a report with the input state that exposes it and a
measurement whose probabilities differ. The report numbers classical bits c0, c1, … as the
files lay them out; when both files declare the same classical registers, other than one
register c, it ends with those numbers in the registers' names (c5 is m[0]) and the outcome
that tells programs apart in them (m[0]=1 c[4]=0 …).

Cost: -engine auto (the default) uses the dense engine up to 12 qubits: exact, but it builds both
2^n × 2^n unitaries, and at 11-12 qubits circuits that differ take seconds to minutes (the
witness needs an eigendecomposition). Wider than 12 qubits it uses the tableau engine when both
circuits are Clifford (exact, thousands of qubits), else the matrix-free estimate up to 22
qubits (runs on statevectors; the witness certifies a lower bound, the upper bound holds with a
stated probability, and a pair neither bound settles is not counted as equivalent). The wide engines compare in operator norm up to global phase only, without
-exact-phase, -measured or clean -ancillas; -engine dense forces the dense engine at any width
its memory allows (16·4^n bytes a matrix, at most 4 GiB: 14 qubits). Before starting, the
command estimates the work of the chosen engine (dense: ops·4^n + 6·8^n amplitude updates;
matrix-free: 60·ops·2^n) and refuses more than -work (default 1e12, a few minutes), with the
estimate; -timeout gives up on a comparison after a wall-clock time.

With -json, one JSON object (the encoding of qcheck.Result; keys stay, text may change):
  equivalent         true when distance ≤ tolerance, as the engine certifies it
  undecided          present when the engine's bounds settle neither way: why (equivalent
                     is then false, meaning not shown equivalent)
  distance           the distance in the chosen measure
  measure            "operator norm", "diamond norm" or "average infidelity" ("total variation"
                     with -measured and for programs, "state distance from |0…0⟩" with
                     -from-zero)
  meaning            "unitary" (every input), "program" (the classical bits at the end) or
                     "from zero" (the input |0…0⟩ only)
  outcome            for programs (and -from-zero -measured) that differ: the outcome of the
                     classical bits whose probability differs most
    bits             the outcome, the highest bit first
    want             its probability after want
    got              its probability after got
  overlap            with -from-zero: ⟨0|want†·got|0⟩ as [re, im]
  tolerance          the tolerance used
  exact_phase        whether global phase counted
  phase              φ in radians with want ≈ e^{iφ}·got (0 with -exact-phase)
  lower_bound        true when distance is a certified lower bound, not the distance itself
  upper_bound        true when distance is a certified upper bound, not the distance itself
  operator_distance  the operator-norm distance whatever the measure
  witness            an input state that exposes the difference, as [re, im] amplitude pairs
                     indexed Σ b_q·2^q (qubit 0 is the least-significant bit); [] if none,
                     if it shows no gap, or if it has more than 4,096 amplitudes (12 qubits)
  witness_gap        the gap the witness shows: a certified lower bound on operator_distance
  engine             "tableau", "dense", "zx", "matrix-free", "stabilizer-program",
                     "program", "zero-state" or "final-measure": the engine that answered
  certifies          in words, what the engine's answer guarantees
  qubits             the width of the register that states and outcomes refer to (B's)
  measured           with -measured, the qubit of B's register each outcome bit reads (the
                     first the least significant; -1 for a bit B never writes)
  bits               with -measured and measure ops, the classical bit each outcome bit is
  measurement        omitted when the circuits are equivalent or differ only by a global phase
                     (no measurement tells them apart); else an experiment that does:
    input_basis      basis index of the input state when it is a basis state, else null
    basis            true: measure every qubit (with -measured: read the classical bits) in the
                     computational basis; false: test whether the output is want's output state
    outcome          with basis, the outcome index whose probability differs most; else null
    want             the probability of that outcome (or of passing the test) after want
    got              the same after got
  pauli              with the tableau engine, when the circuits differ: a Pauli generator
                     they conjugate differently
    generator        the generator, such as "+X0" (qubits with I are left out)
    want             its image under want, a Pauli string
    got              its image under got
    anticommute      whether the two images anticommute
  blame              omitted when the op lists are equal; else the ops that explain the
                     difference:
    found            true
    first_diff       the first op index at which the op lists differ
    want_ops         {start, end}: the half-open range of A's ops that differ once the common
                     start and end are removed
    got_ops          the same range of B's ops
    start            the first op of a range
    end              one past its last op
    prefix           the length of the shortest prefix of B that already differs from A's, or
                     0 when not computed`

func equiv(args []string, stdout, stderr io.Writer) int {
	c := newCommand("equiv", "equiv [flags] A.qasm B.qasm", equivAbout, stdout, stderr)
	var f compareFlags
	f.register(c.fs)
	asJSON := c.fs.Bool("json", false, "write the result as one JSON object")
	files, code, ok := c.parse(args, 2)
	if !ok {
		return code
	}
	f.limits.free = true
	pa, err := f.limits.load(files[0])
	if err != nil {
		return c.fail("%v", err)
	}
	pb, err := f.limits.load(files[1])
	if err != nil {
		return c.fail("%v", err)
	}
	if len(pa.Free) > 0 || len(pb.Free) > 0 {
		return f.proveFiles(c, files[0], files[1], pa, pb, *asJSON)
	}
	r, err := f.comparePrograms(files[0], files[1], pa, pb)
	if err != nil {
		return c.fail("%v", err)
	}
	if *asJSON {
		out, err := json.MarshalIndent(r, "", "  ")
		if err != nil {
			return c.fail("%v", err)
		}
		fmt.Fprintf(stdout, "%s\n", out)
	} else {
		switch r.Meaning {
		case "program":
			fmt.Fprintf(stdout, "%s (want) vs %s (got), as programs: the distributions of their classical bits at the end:\n", files[0], files[1])
		case "from zero":
			fmt.Fprintf(stdout, "%s (want) vs %s (got), from the input |0…0⟩ only:\n", files[0], files[1])
		default:
			fmt.Fprintf(stdout, "%s (want) vs %s (got):\n", files[0], files[1])
		}
		if r.Equivalent {
			fmt.Fprintln(stdout, r.Headline())
		} else {
			fmt.Fprint(stdout, r.Report())
			outcome := ""
			if r.Meaning == "program" {
				outcome = r.Outcome
			}
			fmt.Fprint(stdout, registerWords(pa, pb, outcome))
		}
	}
	if !r.Equivalent {
		return exitDiffer
	}
	return exitOK
}
