package campaign_test

import (
	"bytes"
	"flag"
	"math"
	"math/cmplx"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"qcheck.dev/examples/ancilla"
	"qcheck.dev/examples/campaign"
	"qcheck.dev/examples/peephole"
	"qcheck.dev/examples/route"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

var (
	update = flag.Bool("update", false, "rewrite testdata/examples/demo-seed1.txt from the demo's output")
	detect = flag.Bool("detect", false, "measure each planted bug's detection rate over 100 seeds (minutes)")
)

const golden = "../../testdata/examples/demo-seed1.txt"

// The demo's output for seed 1 is kept in testdata as a sample of what a newcomer sees
// (rewrite it with -update). The test holds the parts that belong to this package to it: the
// scenario, the count of circuits, and the shrunk circuit (its "as Go:" line); the wording of the
// report belongs to package qcheck and may change. Two runs must print the same.
func TestRunMatchesGolden(t *testing.T) {
	var b bytes.Buffer
	if err := campaign.Run(&b, 1); err != nil {
		t.Fatal(err)
	}
	out := b.String()
	if *update {
		if err := os.WriteFile(filepath.FromSlash(golden), []byte(out), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	data, err := os.ReadFile(filepath.FromSlash(golden))
	if err != nil {
		t.Fatal(err)
	}
	want := stableLines(string(data))
	if got := stableLines(out); got != want {
		t.Errorf("demo output for seed 1 has\n%s\nwhere %s has\n%s\n(rerun with -update if intended); whole output:\n%s", got, golden, want, out)
	}
	var again bytes.Buffer
	if err := campaign.Run(&again, 1); err != nil {
		t.Fatal(err)
	}
	if again.String() != out {
		t.Error("two runs with seed 1 printed different output")
	}
}

// stableLines returns the first four lines of the demo's output and its "as Go:" line.
func stableLines(out string) string {
	lines := strings.Split(out, "\n")
	keep := lines[:min(4, len(lines))]
	for _, l := range lines {
		if strings.HasPrefix(strings.TrimSpace(l), "as Go:") {
			keep = append(keep, l)
		}
	}
	return strings.Join(keep, "\n")
}

func TestHuntBadInput(t *testing.T) {
	if _, err := campaign.Hunt(campaign.Peephole(), 0, 100); err == nil || !strings.Contains(err.Error(), "seed 0") {
		t.Errorf("seed 0: got %v", err)
	}
	if _, err := campaign.Hunt(campaign.Peephole(), 1, 0); err == nil || !strings.Contains(err.Error(), "0 checks") {
		t.Errorf("0 checks: got %v", err)
	}
}

// correct gives, for each planted target, the correct pass the bug was planted in, so that a
// failure can be confirmed to be the planted bug: the correct pass must keep the same input.
func correct(name string) qcheck.LayoutPass {
	switch name {
	case "leak.Lower":
		return withoutLayout(ancilla.Lowering{Build: ancilla.Chain, Ancillas: 3, Clean: true}.Apply)
	case "inverted.Route":
		return func(c *circuit.Circuit) (*circuit.Circuit, []int, error) { return route.Route(c, route.Line(5)) }
	}
	return withoutLayout(peephole.Optimize)
}

func withoutLayout(p qcheck.Pass) qcheck.LayoutPass {
	return func(c *circuit.Circuit) (*circuit.Circuit, []int, error) {
		out, err := p(c)
		return out, nil, err
	}
}

// TestDetectionRate measures, for each planted bug, in how many of 100 seeds qcheck's search
// finds it within rapid's default 100 checks; issue 5 asks for at least 95. It takes minutes
// (every found failure is also shrunk), so it runs only with -detect:
//
//	go test ./examples/campaign/ -run TestDetectionRate -detect -v -timeout 60m
//
// A seed counts only if the failure is of kind NotEquivalent and the correct pass keeps the
// meaning of the same shrunk input, so noise or a bug of the checker cannot count as detection.
func TestDetectionRate(t *testing.T) {
	if !*detect {
		t.Skip("slow measurement; run with -detect")
	}
	const seeds = 100
	for _, target := range campaign.Planted() {
		t.Run(target.Name, func(t *testing.T) {
			start := time.Now()
			found, checks := 0, 0
			var missed []uint64
			for seed := uint64(1); seed <= seeds; seed++ {
				f, err := campaign.Hunt(target, seed, campaign.DefaultChecks)
				if err != nil {
					t.Fatalf("seed %d: %v", seed, err)
				}
				if f == nil || f.Kind != qcheck.NotEquivalent || !keeps(t, correct(target.Name), f.Input, target.Options) {
					missed = append(missed, seed)
					checks += campaign.DefaultChecks
					continue
				}
				found++
				checks += f.Passed + 1
			}
			t.Logf("%s (%s): found in %d of %d seeds, %.1f circuits checked per seed on average, missed seeds %v, %v",
				target.Name, target.Bug, found, seeds, float64(checks)/seeds, missed, time.Since(start).Round(time.Second))
			if found < 95 {
				t.Errorf("%s found in %d of %d seeds, want at least 95", target.Name, found, seeds)
			}
		})
	}
}

// keeps reports whether pass keeps the meaning of in under opts, up to the layout it reports.
func keeps(t *testing.T, pass qcheck.LayoutPass, in *circuit.Circuit, opts []qcheck.Option) bool {
	t.Helper()
	out, perm, err := pass(in)
	if err != nil {
		return false
	}
	if perm != nil {
		opts = append(append([]qcheck.Option(nil), opts...), qcheck.OutputPermutation(perm))
	}
	r, err := qcheck.Compare(in, out, opts...)
	return err == nil && r.Equivalent
}

// The demo's shrunk counterexample is a real bug, checked by hand. Its input is A_t·CX·B_t (A
// first) with A and B phase gates on the CX's target, and the wrong pass slides A through the
// target and merges it with B, leaving (BA)_t·CX. The rule it breaks: with the control at 1, CX
// applies X to the target, and X·P(a)·X = e^{ia}·P(−a) (multiply X by diag(1, e^{ia}); Nielsen &
// Chuang §4.2 defines both, and for a = π this is CX·Z_t·CX = Z_c·Z_t, §10.5.2's conjugation of
// Paulis by CNOT). So output†·input = CX·P_t(−a)·CX·P_t(a) is I where the control is 0 and
// e^{−ia}·P(2a) on the target where it is 1: its eigenphases are 0, −a and +a. The shortest arc θ
// holding them is 2π less the largest gap between them, and the phase-free distance is 2·sin(θ/4)
// (package metric's documentation). The same bug also shrinks to CX·A_t·CX: the wrong pass slides
// A out through the first CX's target, and the two CX cancel, leaving A_t. Then output†·input =
// P_t(−a)·CX·P_t(a)·CX is I where the control is 0 and e^{ia}·P(−2a) where it is 1: the same
// eigenphases 0, −a, +a, so the same distance. For seed 1, A = T (a = π/4): θ = π/2, so the
// distance is 2·sin(π/8) ≈ 0.7654.
func TestDemoCounterexampleIsReal(t *testing.T) {
	f, err := campaign.Hunt(campaign.Peephole(), 1, campaign.DefaultChecks)
	if err != nil {
		t.Fatal(err)
	}
	if f == nil || f.Result == nil {
		t.Fatalf("seed 1 found no meaning change: %v", f)
	}
	in := f.Input
	phase := map[string]bool{"z": true, "s": true, "t": true, "p": true, "rz": true}
	if len(in.Ops) != 3 {
		t.Fatalf("shrunk input has %d ops, want 3: %#v", len(in.Ops), in)
	}
	o := in.Ops
	var a0 circuit.Op // A, the phase gate the wrong pass slides through the target
	switch {
	case phase[o[0].Gate.Name] && o[1].Gate.Name == "cx" && phase[o[2].Gate.Name] &&
		o[0].Qubits[0] == o[1].Qubits[1] && o[2].Qubits[0] == o[1].Qubits[1]:
		a0 = o[0] // A_t·CX·B_t
	case o[0].Gate.Name == "cx" && phase[o[1].Gate.Name] && o[2].Gate.Name == "cx" &&
		o[1].Qubits[0] == o[0].Qubits[1] && slices.Equal(o[0].Qubits, o[2].Qubits):
		a0 = o[1] // CX·A_t·CX
	default:
		t.Fatalf("shrunk input is neither A_t·CX·B_t nor CX·A_t·CX with phase gates A and B: %#v", in)
	}
	m := a0.Gate.Elements()
	a := math.Abs(cmplx.Phase(m[3] / m[0])) // P(a) up to global phase; the arc depends on |a| only
	theta := 2*math.Pi - max(a, 2*math.Pi-2*a)
	want := 2 * math.Sin(theta/4)
	if d := f.Result.Distance; math.Abs(d-want) > 1e-12 {
		t.Errorf("distance %.15g, want 2·sin(θ/4) = %.15g for a = %.6g", d, want, a)
	}
	// Seed 1 is the case worked above, so the general formula is checked against a number.
	if a0.Gate.Name != "t" || math.Abs(want-2*math.Sin(math.Pi/8)) > 1e-15 {
		t.Errorf("seed 1 gave %#v, not the T-first case worked in the comment", in)
	}
}
