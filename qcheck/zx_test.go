package qcheck

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// zxPair returns a random circuit of two-qubit blocks and the same circuit with every H written
// as rz(π/2)·sx·rz(π/2) (equal up to a global phase), and, changed, with one rz angle moved by 0.3.
func zxPair(n int) (u, v, w *circuit.Circuit) {
	rng := rand.New(rand.NewPCG(uint64(n), 3))
	u, v = circuit.New(n), circuit.New(n)
	for range 4 * n {
		p, q := rng.IntN(n), rng.IntN(n-1)
		if q >= p {
			q++
		}
		a := rng.Float64() * 6
		u.H(p).CX(p, q).RZ(a, q).T(p)
		v.RZ(math.Pi/2, p).SX(p).RZ(math.Pi/2, p).CX(p, q).RZ(a, q).T(p)
	}
	w = v.Clone()
	for i := len(w.Ops) / 2; ; i++ {
		if w.Ops[i].Gate.Name == "rz" {
			w.Ops[i].Gate.Params[0] += 0.3
			break
		}
	}
	return u, v, w
}

// Above 22 qubits, where no other engine takes non-Clifford circuits, Auto gives the pair to the
// ZX engine: the rewrite is proved equivalent and the changed angle is found at its exact
// distance 2·sin(0.3/4) (an rz moved by 0.3 alone; unitary invariance).
func TestZXEngineWide(t *testing.T) {
	u, v, w := zxPair(30)
	r, err := Compare(u, v)
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != ZX || !r.Equivalent {
		t.Fatalf("rewrite: engine %s, equivalent %v: %s", r.Engine, r.Equivalent, r.Certifies)
	}
	r, err = Compare(u, w)
	if err != nil {
		t.Fatal(err)
	}
	want := 2 * math.Sin(0.3/4)
	if r.Engine != ZX || r.Equivalent || math.Abs(r.Distance-want) > 1e-9 {
		t.Fatalf("changed angle: engine %s, equivalent %v, distance %g, want %g: %s", r.Engine, r.Equivalent, r.Distance, want, r.Certifies)
	}
	if text := r.Report(); !strings.Contains(text, "zx") {
		t.Errorf("report does not name the engine:\n%s", text)
	}
}

// UseEngine(ZX) on small pairs agrees with the dense engine (sim.Unitary, metric.PhaseDistance).
func TestZXEngineAgainstDense(t *testing.T) {
	u, v, w := zxPair(6)
	for _, got := range []*circuit.Circuit{v, w} {
		r, err := Compare(u, got, UseEngine(ZX))
		if err != nil {
			t.Fatal(err)
		}
		a, _ := sim.Unitary(u)
		b, _ := sim.Unitary(got)
		d := metric.PhaseDistance(a, b)
		if r.Equivalent != (d <= DefaultTolerance) || !r.Equivalent && math.Abs(r.Distance-d) > 1e-9 {
			t.Errorf("zx: equivalent %v, distance %g; dense distance %g", r.Equivalent, r.Distance, d)
		}
	}
}
