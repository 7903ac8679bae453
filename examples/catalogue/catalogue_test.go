package catalogue_test

import (
	"flag"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"qcheck.dev/examples/catalogue"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

var (
	detect = flag.Bool("catalogue.detect", false, "measure each bug's detection rate over 100 seeds and write "+table)
	seeds  = flag.Int("catalogue.seeds", 100, "seeds per bug for -catalogue.detect")
)

// table is where -catalogue.detect writes its measurement.
const table = "../../testdata/catalogue/detection.txt"

// Broad is the generator the detection table is measured on: what a user who does not tune the
// generator to the bug writes, the default gate set (24 gates) on 4 qubits, up to 20 ops.
var broad = gen.Circuit(gen.Options{Qubits: 4})

// Every correct pass keeps the meaning of the circuits the wrong one is hunted on.
func TestCorrectPassesKeepMeaning(t *testing.T) {
	for _, b := range catalogue.Bugs() {
		t.Run(b.Name, func(t *testing.T) {
			qcheck.Preserves(t, b.Correct, broad)
		})
	}
}

// smallest gives, for each bug, a small circuit that exposes it, with the identity that makes the
// wrong pass wrong; each is checked with Exposes (the wrong pass changes its meaning, the correct
// one keeps it).
var smallest = map[string]*circuit.Circuit{
	// rz(α) on a cx target does not commute: cx·(I⊗Z_t)·cx = Z_c⊗Z_t (N&C §10.5.2).
	"ZThroughTarget": circuit.New(2).RZ(0.5, 1).CX(0, 1).RZ(0.25, 1),
	// x on a cx control: cx·(X_c⊗I)·cx = X_c⊗X_t (N&C §10.5.2).
	"XThroughControl": circuit.New(2).X(0).CX(0, 1).X(0),
	// h·z·h = x (N&C exercise 4.14): h does not commute with z.
	"HAsDiagonal": circuit.New(1).Z(0).H(0).Z(0),
	// cx(0,1)·cx(1,0) is two thirds of a swap (N&C Fig. 1.7), not the identity.
	"CXCancelBlind": circuit.New(2).CX(0, 1).CX(1, 0),
	// s·s = z (N&C Fig. 4.2).
	"SSelfInverse": circuit.New(1).S(0).S(0),
	// rz(π/2)·rx(π/2) is not a rotation about z.
	"RZRXMerge": circuit.New(1).RZ(math.Pi/2, 0).RX(math.Pi/2, 0),
	// crz(θ) = cp(θ)·p(−θ/2) on the control (matrices of N&C §4.3).
	"CPAsCRZ": circuit.New(2).CP(math.Pi/2, 0, 1).CRZ(math.Pi/2, 0, 1),
	// sdg = p(−π/2): s·sdg = I, not z.
	"SdgAsS": circuit.New(1).S(0).Sdg(0),
	// s·s = z = p(π), not p(0).
	"PhaseModPi": circuit.New(1).S(0).S(0),
	// crz(π)·crz(π) = crz(2π) = z on the control (eq. 4.6: rz has period 4π).
	"ControlledPeriod2Pi":  circuit.New(2).CRZ(math.Pi, 0, 1).CRZ(math.Pi, 0, 1),
	"DropRotation2Pi":      circuit.New(2).CRZ(2*math.Pi, 0, 1),
	"CPLoweringDropsPhase": circuit.New(2).CP(math.Pi/2, 0, 1),
	"CXToCZMissingH":       circuit.New(2).CX(0, 1),
	"EulerOrder":           circuit.New(1).U(math.Pi/2, math.Pi/2, 0, 0),
	"RZZOnControl":         circuit.New(2).RZZ(math.Pi/2, 0, 1),
	"CCXMissingTdg":        circuit.New(3).CCX(0, 1, 2),
	"CCXOffByOne":          circuit.New(3).CCX(0, 1, 2),
	// x on another qubit between two h is not absorbed: h(0)·x(1)·h(0) = x(1).
	"HXHWrongQubit": circuit.New(2).H(0).X(1).H(0),
	// swap·cx(0,1) = cx(1,0)·swap.
	"SwapSlideKeepsDirection": circuit.New(2).SWAP(0, 1).CX(0, 1),
}

func TestWrongPassesFailOnTheirSmallestCircuit(t *testing.T) {
	bugs := catalogue.Bugs()
	if len(bugs) < 15 {
		t.Errorf("the catalogue has %d bugs; issue 16 asks for at least 15", len(bugs))
	}
	for _, b := range bugs {
		c, ok := smallest[b.Name]
		if !ok {
			t.Errorf("%s: no smallest circuit", b.Name)
			continue
		}
		exposed, err := catalogue.Exposes(b, c)
		if err != nil || !exposed {
			t.Errorf("%s: %#v exposes the bug: %v, %v; want true", b.Name, c, exposed, err)
		}
	}
}

// The interval is checked against its definition (Clopper & Pearson 1934): at lo the binomial
// probability of k or more successes is α/2, and at hi that of k or fewer is α/2; for k = 0
// the upper end has the closed form 1 − (α/2)^{1/n} (0.3085 for n = 10).
func TestClopperPearson(t *testing.T) {
	lo, hi, err := catalogue.ClopperPearson(0, 10, 0.95)
	if err != nil || lo != 0 || math.Abs(hi-(1-math.Pow(0.025, 0.1))) > 1e-9 || math.Abs(hi-0.3085) > 5e-5 {
		t.Errorf("0 of 10: [%v, %v], %v; want [0, 1 − 0.025^0.1 ≈ 0.3085]", lo, hi, err)
	}
	for _, c := range []struct{ k, n int }{{5, 10}, {1, 100}, {99, 100}, {100, 100}, {37, 40}} {
		lo, hi, err := catalogue.ClopperPearson(c.k, c.n, 0.95)
		if err != nil {
			t.Fatal(err)
		}
		if c.k > 0 {
			if p := binomialTail(c.k, c.n, lo, true); math.Abs(p-0.025) > 1e-9 {
				t.Errorf("%d of %d: P(X ≥ k; lo = %v) = %v, want 0.025", c.k, c.n, lo, p)
			}
		}
		if c.k < c.n {
			if p := binomialTail(c.k, c.n, hi, false); math.Abs(p-0.025) > 1e-9 {
				t.Errorf("%d of %d: P(X ≤ k; hi = %v) = %v, want 0.025", c.k, c.n, hi, p)
			}
		} else if hi != 1 || math.Abs(lo-math.Pow(0.025, 1/float64(c.n))) > 1e-9 {
			t.Errorf("%d of %d: [%v, %v]; want [0.025^{1/n}, 1]", c.k, c.n, lo, hi)
		}
	}
	if _, _, err := catalogue.ClopperPearson(3, 2, 0.95); err == nil {
		t.Error("3 of 2: no error")
	}
}

// binomialTail returns P(X ≥ k) (upper) or P(X ≤ k) for X binomial(n, p), summed term by term.
func binomialTail(k, n int, p float64, upper bool) float64 {
	sum := 0.0
	for i := 0; i <= n; i++ {
		if upper && i < k || !upper && i > k {
			continue
		}
		lg, _ := math.Lgamma(float64(n + 1))
		li, _ := math.Lgamma(float64(i + 1))
		lr, _ := math.Lgamma(float64(n - i + 1))
		sum += math.Exp(lg - li - lr + float64(i)*math.Log(p) + float64(n-i)*math.Log1p(-p))
	}
	return sum
}

// A setting is the options of a generator the detection table is measured on.
type setting struct {
	name string
	opts gen.Options
}

// settings are what a user who does not tune the generator to the bug writes: the default gate
// set (24 gates) on 4 qubits with the default length, and the 16 gates the catalogue's passes
// act on, on 5 qubits, up to 30 ops.
var settings = []setting{
	{"gen.Options{Qubits: 4}: the 24 gates of gen.DefaultGateSet, 4 qubits, up to 20 ops", gen.Options{Qubits: 4}},
	{"gen.Options{Qubits: 5, MaxOps: 30, GateSet: h x z s sdg t rz rx u cx cz swap cp crz rzz ccx}", gen.Options{Qubits: 5, MaxOps: 30, GateSet: []string{
		"h", "x", "z", "s", "sdg", "t", "rz", "rx", "u", "cx", "cz", "swap", "cp", "crz", "rzz", "ccx"}}},
}

// TestDetectionRate measures, for each bug and setting, in how many of 100 fixed seeds rapid's
// search finds it within rapid's default 100 checks, with the 95% Clopper–Pearson interval, and
// writes the table to testdata/catalogue/detection.txt. It runs only with -catalogue.detect (a
// minute), and never with -short, under which rapid runs a fifth of the checks:
//
//	go test ./examples/catalogue -run TestDetectionRate -catalogue.detect -v -timeout 60m
func TestDetectionRate(t *testing.T) {
	if !*detect {
		t.Skip("slow measurement; run with -catalogue.detect")
	}
	if testing.Short() {
		t.Skip("rapid runs a fifth of its checks under -short")
	}
	const checks = 100
	var out strings.Builder
	fmt.Fprintf(&out, "Detection of the catalogue's bugs (examples/catalogue) by rapid's search at its default %d checks, seeds 1..%d.\n", checks, *seeds)
	fmt.Fprintf(&out, "found: seeds whose first %d circuits include one the wrong pass changes and the correct pass keeps;\n", checks)
	fmt.Fprintf(&out, "interval: 95%% Clopper–Pearson; median: the check that found it, over the seeds that did.\n")
	fmt.Fprintf(&out, "Command: go test ./examples/catalogue -run TestDetectionRate -catalogue.detect -v -timeout 60m\n")
	worst, worstSetting := 1.0, "" // over every setting: the goal holds on each
	start := time.Now()
	for _, s := range settings {
		g := gen.Circuit(s.opts)
		fmt.Fprintf(&out, "\n%s\n", s.name)
		fmt.Fprintf(&out, "%-24s %-14s %8s %17s %7s\n", "bug", "kind", "found", "95% interval", "median")
		for _, b := range catalogue.Bugs() {
			found := 0
			var firsts []int
			for seed := uint64(1); seed <= uint64(*seeds); seed++ {
				first, err := catalogue.Detect(b, g, seed, checks)
				if err != nil {
					t.Fatalf("%s, seed %d: %v", b.Name, seed, err)
				}
				if first > 0 {
					found++
					firsts = append(firsts, first)
				}
			}
			lo, hi, _ := catalogue.ClopperPearson(found, *seeds, 0.95)
			if f := float64(found) / float64(*seeds); f < worst {
				worst, worstSetting = f, s.name
			}
			line := fmt.Sprintf("%-24s %-14s %4d/%-3d [%.3f, %.3f] %7s", b.Name, b.Kind, found, *seeds, lo, hi, median(firsts))
			t.Log(line)
			fmt.Fprintln(&out, line)
		}
	}
	t.Logf("measured in %v", time.Since(start).Round(time.Second))
	path := filepath.FromSlash(table)
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, []byte(out.String()), 0o644); err != nil {
		t.Fatal(err)
	}
	// Issue 16's goal, on both settings.
	if worst < 0.99 {
		t.Errorf("on %s the worst bug is found in %.0f%% of seeds; issue 16 asks for at least 99%%", worstSetting, 100*worst)
	}
}

// median returns the median of xs as text, or "-" for none.
func median(xs []int) string {
	if len(xs) == 0 {
		return "-"
	}
	s := slices.Sorted(slices.Values(xs))
	return fmt.Sprint(s[len(s)/2])
}
