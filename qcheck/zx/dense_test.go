package zx

import (
	"flag"
	"fmt"
	"math/rand/v2"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// Check and Compare against the dense engine (sim.Unitary and metric.PhaseDistance) on random
// pairs up to 10 qubits: compiler-style rewrites, one-gate bugs and near misses of 1e-7. An
// "equivalent" verdict must hold within Bound; a known distance must match the dense one; an
// undecided pair is counted.
func TestAgainstDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(5, 6))
	undecided, total := 0, 0
	trials := 60
	if testing.Short() {
		trials = 24
	}
	for trial := range trials {
		n := 2 + trial%maxDenseQubits()
		var c *circuit.Circuit
		switch trial % 3 {
		case 0:
			c = qft(n)
		case 1:
			c = adder(max(1, (n-2)/2))
		default:
			c = volume(n, max(2, n/2), rng)
		}
		rewritten := route(reorder(translate(c), 20*len(c.Ops), rng), rng)
		cases := map[string]*circuit.Circuit{"rewrite": rewritten}
		for kind, name := range []string{"angle", "flip", "drop"} {
			if b := bug(rewritten, kind, 0.3, rng); b != nil {
				cases[name] = b
			}
		}
		if b := bug(rewritten, 0, 1e-7, rng); b != nil {
			cases["near"] = b
		}
		for name, v := range cases {
			total++
			want := metric.PhaseDistance(dense(t, c), dense(t, v))
			for _, f := range []struct {
				name string
				run  func(u, v *circuit.Circuit, o Options) (Result, error)
			}{{"Check", Check}, {"Compare", Compare}} {
				r, err := f.run(c, v, Options{})
				if err != nil {
					t.Fatal(err)
				}
				where := fmt.Sprintf("%s trial %d (%d qubits, %s)", f.name, trial, n, name)
				switch {
				case r.Verdict == Equivalent && want > r.Bound+1e-12:
					t.Errorf("%s: equivalent within %g, dense distance %g", where, r.Bound, want)
				case r.Known && abs(r.Distance-want) > r.Bound+1e-9:
					t.Errorf("%s: distance %g, dense %g", where, r.Distance, want)
				case r.Verdict == Different && want < 1e-12:
					t.Errorf("%s: different, dense distance %g", where, want)
				case r.Verdict == Undecided:
					undecided++
				}
				if name == "rewrite" && f.name == "Check" && r.Verdict != Equivalent {
					t.Errorf("%s: a correct rewrite was not proved: %v %s", where, r.Verdict, r.Reason)
				}
			}
		}
	}
	t.Logf("%d of %d verdicts undecided", undecided, 2*total)
}

var wide = flag.Bool("zx.wide", false, "run the wide cases: dense checks up to 10 qubits, 64+-qubit proofs")

// maxDenseQubits is the range of widths of TestAgainstDense beyond 2: up to 10 qubits with
// -zx.wide, 7 otherwise.
func maxDenseQubits() int {
	if *wide {
		return 9
	}
	return 6
}
