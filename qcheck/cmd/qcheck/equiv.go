package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"strconv"
	"strings"

	"qcheck.dev/qcheck"
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
	engine     string
	limits     readLimits
}

func (f *compareFlags) register(fs *flag.FlagSet) {
	fs.Float64Var(&f.tol, "tol", qcheck.DefaultTolerance, "largest distance `EPS` that still counts as equivalent")
	fs.BoolVar(&f.exactPhase, "exact-phase", false, "count a global phase as a difference")
	fs.StringVar(&f.perm, "perm", "", "output permutation `P0,P1,...`: logical qubit i of A ends on qubit Pi of B")
	fs.BoolVar(&f.measured, "measured", false, "compare only the distributions of the classical bits the final measurements write, for every input (of all qubits if neither file measures); certified, or refused as undecided")
	fs.StringVar(&f.ancillas, "ancillas", "", "qubits `Q,...` of B borrowed as ancillas (clean: start and end in |0⟩); A may omit them")
	fs.BoolVar(&f.dirty, "dirty", false, "the -ancillas start in any state and must be restored")
	fs.StringVar(&f.measure, "measure", "operator", "`MEASURE` that decides: operator (norm), diamond, or fidelity (average infidelity)")
	fs.StringVar(&f.engine, "engine", "auto", "`ENGINE` that answers: auto, dense, tableau (Clifford circuits) or matrix-free (see above)")
	f.limits.register(fs)
}

// engines maps the -engine names to qcheck's engines.
var engines = map[string]qcheck.Engine{
	qcheck.Auto.String(): qcheck.Auto, qcheck.Dense.String(): qcheck.Dense,
	qcheck.Tableau.String(): qcheck.Tableau, qcheck.MatrixFree.String(): qcheck.MatrixFree,
}

// options turns the flags into qcheck options.
func (f *compareFlags) options() ([]qcheck.Option, error) {
	opts := []qcheck.Option{qcheck.Tolerance(f.tol)}
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
	e, ok := engines[f.engine]
	if !ok {
		return nil, fmt.Errorf("-engine %q: choose auto, dense, tableau or matrix-free", f.engine)
	}
	if e != qcheck.Auto {
		opts = append(opts, qcheck.UseEngine(e))
	}
	return opts, nil
}

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
	opts, err := f.options()
	if err != nil {
		return qcheck.Result{}, err
	}
	pa, err := f.limits.load(a)
	if err != nil {
		return qcheck.Result{}, err
	}
	pb, err := f.limits.load(b)
	if err != nil {
		return qcheck.Result{}, err
	}
	if !f.measured {
		for _, x := range []struct {
			path string
			prog *qasm.Program
		}{{a, pa}, {b, pb}} {
			if err := refuseDirectives(x.path, x.prog, "use -measured to compare measured distributions"); err != nil {
				return qcheck.Result{}, err
			}
		}
	}
	r, err := qcheck.Compare(pa.Circuit, pb.Circuit, opts...)
	if err != nil {
		return qcheck.Result{}, fmt.Errorf("%s vs %s: %v", a, b, err)
	}
	return r, nil
}

const equivAbout = `
Compares the circuit of B.qasm (got) with that of A.qasm (want, the reference) and exits 0 when
they are equivalent within the tolerance, 1 when they are not, 2 on bad input or usage. By
default the distance is the operator norm of the difference of the two unitaries, minimised over
a global phase. Human output: a line naming A (want) and B (got), then the verdict with the
measure and distance; on a difference, a report with the input state that exposes it and a
measurement whose probabilities differ.

Cost: -engine auto (the default) uses the dense engine up to 12 qubits: exact, but it builds both
2^n × 2^n unitaries, and at 11-12 qubits circuits that differ take seconds to minutes (the
witness needs an eigendecomposition). Wider than 12 qubits it uses the tableau engine when both
circuits are Clifford (exact, thousands of qubits), else the matrix-free estimate up to 22
qubits (runs on statevectors; the witness certifies a lower bound, the upper bound holds with a
stated probability, and a pair neither bound settles is not counted as equivalent). The wide engines compare in operator norm up to global phase only, without
-exact-phase, -measured or clean -ancillas; -engine dense forces the dense engine at any width
its memory allows (16·4^n bytes a matrix, at most 4 GiB: 14 qubits), which may take hours.

With -json, one JSON object:
  equivalent         true when distance ≤ tolerance
  distance           the distance in the chosen measure
  measure            "operator norm", "diamond norm" or "average infidelity" ("total variation"
                     with -measured)
  tolerance          the tolerance used
  exact_phase        whether global phase counted
  phase              φ in radians with want ≈ e^{iφ}·got (0 with -exact-phase)
  operator_distance  the operator-norm distance whatever the measure
  witness            an input state that exposes the difference, as [re, im] amplitude pairs
                     indexed Σ b_q·2^q (qubit 0 is the least-significant bit); [] if none
  witness_gap        the gap the witness shows: a certified lower bound on operator_distance
  engine             "dense", "tableau" or "matrix-free": the engine that answered
  certifies          in words, what the engine's answer guarantees
  measurement        omitted when the circuits are equivalent or differ only by a global phase
                     (no measurement tells them apart); else an experiment that does:
    input_basis      basis index of the input state when it is a basis state, else null
    basis            true: measure every qubit (with -measured: read the classical bits) in the
                     computational basis; false: test whether the output is want's output state
    outcome          with basis, the outcome index whose probability differs most; else null
    want             the probability of that outcome (or of passing the test) after want
    got              the same after got`

func equiv(args []string, stdout, stderr io.Writer) int {
	c := newCommand("equiv", "equiv [flags] A.qasm B.qasm", equivAbout, stdout, stderr)
	var f compareFlags
	f.register(c.fs)
	asJSON := c.fs.Bool("json", false, "write the result as one JSON object")
	files, code, ok := c.parse(args, 2)
	if !ok {
		return code
	}
	r, err := f.compareFiles(files[0], files[1])
	if err != nil {
		return c.fail("%v", err)
	}
	if *asJSON {
		out, err := json.MarshalIndent(resultJSON(r), "", "  ")
		if err != nil {
			return c.fail("%v", err)
		}
		fmt.Fprintf(stdout, "%s\n", out)
	} else {
		fmt.Fprintf(stdout, "%s (want) vs %s (got):\n", files[0], files[1])
		if r.Equivalent {
			fmt.Fprintln(stdout, r.Headline())
		} else {
			fmt.Fprint(stdout, r.Report())
		}
	}
	if !r.Equivalent {
		return exitDiffer
	}
	return exitOK
}

// verdict is the JSON form of a comparison.
type verdict struct {
	Equivalent       bool         `json:"equivalent"`
	Distance         float64      `json:"distance"`
	Measure          string       `json:"measure"`
	Tolerance        float64      `json:"tolerance"`
	ExactPhase       bool         `json:"exact_phase"`
	Phase            float64      `json:"phase"`
	OperatorDistance float64      `json:"operator_distance"`
	Witness          [][2]float64 `json:"witness"`
	WitnessGap       float64      `json:"witness_gap"`
	Engine           string       `json:"engine"`
	Certifies        string       `json:"certifies"`
	Measurement      *measurement `json:"measurement,omitempty"`
}

// measurement is the JSON form of qcheck.Measurement: prepare the input (input_basis when it is
// a basis state, else null), run, measure; basis tells a computational-basis measurement with
// outcome seen with probability want and got, otherwise a projection onto want's output (and
// outcome is null).
type measurement struct {
	InputBasis *int    `json:"input_basis"`
	Basis      bool    `json:"basis"`
	Outcome    *int    `json:"outcome"`
	Want       float64 `json:"want"`
	Got        float64 `json:"got"`
}

func resultJSON(r qcheck.Result) verdict {
	v := verdict{
		Equivalent: r.Equivalent, Distance: r.Distance, Measure: r.Measure.String(),
		Tolerance: r.Tolerance, ExactPhase: r.ExactPhase, Phase: r.Phase,
		OperatorDistance: r.OperatorDistance, WitnessGap: r.WitnessGap,
		Engine: r.Engine.String(), Certifies: r.Certifies, Witness: [][2]float64{},
	}
	for _, a := range r.Witness {
		v.Witness = append(v.Witness, [2]float64{real(a), imag(a)})
	}
	if m := r.Measurement; m.Input != nil {
		v.Measurement = &measurement{Basis: m.Basis, Want: m.Want, Got: m.Got}
		if m.InputBasis >= 0 {
			v.Measurement.InputBasis = &m.InputBasis
		}
		if m.Basis {
			v.Measurement.Outcome = &m.Outcome
		}
	}
	return v
}
