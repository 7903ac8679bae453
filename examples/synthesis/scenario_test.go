package synthesis

import (
	"math"
	"math/rand"
	"sync"
	"testing"
	"time"

	"qcheck.dev/qcheck/budget"
	"qcheck.dev/qcheck/circuit"
)

// An invented scenario. The Fernhill Catalysis team simulates a 40-spin-orbital model of their
// (invented) cobalt catalyst: one Trotter step of a Hamiltonian in the Jordan–Wigner encoding,
// with hopping terms X Z…Z X and Y Z…Z Y between orbitals up to 12 apart and density terms Z Z.
// Each term exp(−iθP/2) is the textbook circuit: change each X or Y to Z (h, or sdg then h), a
// ladder of cx gathering the parity on the last qubit, rz(θ) there, and everything undone
// (Nielsen & Chuang §4.7.3, Fig. 4.19 generalised, from memory). Their fault-tolerant target
// takes only Clifford+T, so every rz goes through the synthesis pass.

// trotterStep returns the scenario's circuit: about 3000 gates, one rz per term.
func trotterStep(terms int, seed int64) *circuit.Circuit {
	const n = 40
	r := rand.New(rand.NewSource(seed))
	c := circuit.New(n)
	for k := 0; k < terms; k++ {
		i := r.Intn(n - 1)
		j := i + 1 + r.Intn(min(12, n-1-i))
		theta := (r.Float64()*2 - 1) * 0.2 // small coefficients times the time step
		var ends byte
		switch r.Intn(3) {
		case 0:
			ends = 'X'
		case 1:
			ends = 'Y'
		default:
			ends = 'Z'
		}
		var qubits []int
		if ends == 'Z' {
			qubits = []int{i, j} // density term Z_i Z_j
		} else {
			for q := i; q <= j; q++ {
				qubits = append(qubits, q)
			}
		}
		into := func(q int) {
			if q != i && q != j || ends == 'Z' {
				return
			}
			if ends == 'Y' {
				c.Sdg(q)
			}
			c.H(q)
		}
		out := func(q int) {
			if q != i && q != j || ends == 'Z' {
				return
			}
			c.H(q)
			if ends == 'Y' {
				c.S(q)
			}
		}
		for _, q := range qubits {
			into(q)
		}
		for a := 0; a+1 < len(qubits); a++ {
			c.CX(qubits[a], qubits[a+1])
		}
		c.RZ(theta, qubits[len(qubits)-1])
		for a := len(qubits) - 2; a >= 0; a-- {
			c.CX(qubits[a], qubits[a+1])
		}
		for _, q := range qubits {
			out(q)
		}
	}
	return c
}

// scenarioNet is the net for the scenario: words of up to 20 letters (37581 operators, a
// measured covering radius of about 0.07).
var scenarioNet = sync.OnceValue(func() *Net {
	n, err := NewNet(20)
	if err != nil {
		panic(err)
	}
	return n
})

// certify records the pass's rewrites into a fresh ledger from two goroutines and checks that
// their windows account for every change: the work of certification, without the synthesis.
func certify(before, after *circuit.Circuit, rewrites []budget.Rewrite) (*budget.Ledger, error) {
	l := new(budget.Ledger)
	errs := make([]error, 2)
	var wg sync.WaitGroup
	for w := 0; w < 2; w++ {
		wg.Add(1)
		go func(w int) {
			defer wg.Done()
			for k := w; k < len(rewrites); k += 2 {
				if err := l.Record(rewrites[k]); err != nil {
					errs[w] = err
					return
				}
			}
		}(w)
	}
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return nil, err
		}
	}
	return l, l.Covers(before, after)
}

// On 40 qubits no dense check is possible; the ledger certifies the budget from each rotation's
// own qubit. The default run uses ε = 0.1; -long uses ε = 0.02.
func TestScenarioCertified(t *testing.T) {
	eps := 0.1
	if *long {
		eps = 0.02
	}
	before := trotterStep(200, 2026)
	start := time.Now()
	net := scenarioNet()
	netTime := time.Since(start)
	var l budget.Ledger
	start = time.Now()
	after, err := Pass{Net: net, Epsilon: eps, MaxLevels: 5}.Run(before, &l)
	if err != nil {
		t.Fatal(err)
	}
	runTime := time.Since(start)
	budget.Within(t, &l, eps)
	rewrites := make([]budget.Rewrite, 0, l.Len())
	for _, e := range l.Entries() {
		rewrites = append(rewrites, e.Rewrite)
	}
	start = time.Now()
	again, err := certify(before, after, rewrites)
	if err != nil {
		t.Fatal(err)
	}
	certTime := time.Since(start)
	if math.Abs(again.Bound()-l.Bound()) > 1e-12 {
		t.Errorf("certified again: %.15g, first %.15g", again.Bound(), l.Bound())
	}
	// A pass that reports only its windows: the ledger is rebuilt from the two circuits.
	windows := make([]budget.Window, len(rewrites))
	for k, r := range rewrites {
		windows[k] = r.Window
	}
	start = time.Now()
	rebuilt, err := budget.FromWindows(before, after, windows)
	if err != nil {
		t.Fatal(err)
	}
	rebuildTime := time.Since(start)
	if math.Abs(rebuilt.Bound()-l.Bound()) > 1e-12 {
		t.Errorf("rebuilt from windows: %.15g, recorded %.15g", rebuilt.Bound(), l.Bound())
	}
	tcount := 0
	for _, op := range after.Ops {
		if op.Gate.Name == "t" || op.Gate.Name == "tdg" {
			tcount++
		}
	}
	t.Logf("40 qubits, %d ops (%d rotations) → %d ops, T-count %d; ε = %g, share %.3g each, certified Σδ = %.4g, probability bound %.4g",
		before.Len(), l.Len(), after.Len(), tcount, eps, l.Entries()[0].Share, l.Bound(), 2*l.Bound())
	t.Logf("net %v, synthesis with recording %v, certification alone (record %d entries + Covers) %v, rebuilt from windows %v",
		netTime, runTime, l.Len(), certTime, rebuildTime)
}

// BenchmarkCertify40Qubits times the certification of the scenario at ε = 0.1: recording every
// rewrite (δ from the dense 2×2 matrices) and checking that the windows cover every change.
func BenchmarkCertify40Qubits(b *testing.B) {
	before := trotterStep(200, 2026)
	var l budget.Ledger
	after, err := Pass{Net: scenarioNet(), Epsilon: 0.1, MaxLevels: 5}.Run(before, &l)
	if err != nil {
		b.Fatal(err)
	}
	rewrites := make([]budget.Rewrite, 0, l.Len())
	for _, e := range l.Entries() {
		rewrites = append(rewrites, e.Rewrite)
	}
	b.ResetTimer()
	for b.Loop() {
		if _, err := certify(before, after, rewrites); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(after.Len()), "ops-after")
}
