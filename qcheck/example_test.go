package qcheck_test

import (
	"fmt"
	"math"
	"strings"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// Compare two circuits that differ only by a global phase, then two that do not.
func ExampleCompare() {
	// p(θ) = e^{iθ/2}·rz(θ): the same up to global phase.
	r, err := qcheck.Compare(circuit.New(1).P(0.5, 0), circuit.New(1).RZ(0.5, 0))
	if err != nil {
		panic(err)
	}
	fmt.Printf("%v, phase %.2f\n", r.Equivalent, r.Phase)

	// A T gate turned into T† after an entangling gate.
	want := circuit.New(2).H(0).CX(0, 1).T(1)
	got := circuit.New(2).H(0).CX(0, 1).Tdg(1)
	r, _ = qcheck.Compare(want, got)
	fmt.Println(r.Headline())
	fmt.Println("witness:", qcheck.Ket(r.Witness, r.Qubits))
	fmt.Println("meaning first changes at op", r.Blame.Prefix-1)
	// Output:
	// true, phase 0.25
	// qcheck: got differs from want: operator norm 0.7654 > tolerance 1e-09
	// witness: |00⟩
	// meaning first changes at op 2
}

// A router leaves its qubits permuted; OutputPermutation says where each logical qubit ends.
func ExampleOutputPermutation() {
	want := circuit.New(3).CX(0, 2)
	// On a line 0–1–2, swap logical 0 next to 2: it ends on physical 1, logical 1 on physical 0.
	got := circuit.New(3).SWAP(0, 1).CX(1, 2)
	r, _ := qcheck.Compare(want, got, qcheck.OutputPermutation([]int{1, 0, 2}))
	fmt.Println(r.Equivalent)
	// Output: true
}

// A Toffoli computed through a clean ancilla (qubit 3), which is returned to |0⟩.
func ExampleAncillas() {
	want := circuit.New(3).CCX(0, 1, 2)
	got := circuit.New(4).CCX(0, 1, 3).CX(3, 2).CCX(0, 1, 3)
	clean, _ := qcheck.Compare(want, got, qcheck.Ancillas([]int{3}, qcheck.Clean))
	dirty, _ := qcheck.Compare(want, got, qcheck.Ancillas([]int{3}, qcheck.Dirty))
	fmt.Println(clean.Equivalent, dirty.Equivalent)
	// Output: true false
}

// printTB stands in for a test's *testing.T in these examples: it prints the first line of a
// failure.
type printTB struct{}

func (printTB) Helper()                         {}
func (printTB) Logf(format string, args ...any) {}
func (printTB) Errorf(format string, args ...any) {
	fmt.Println(firstLine(fmt.Sprintf(format, args...)))
}
func (printTB) Fatalf(format string, args ...any) {
	fmt.Println(firstLine(fmt.Sprintf(format, args...)))
}
func (printTB) Failed() bool { return false }

func firstLine(s string) string { return strings.SplitN(s, "\n", 2)[0] }

// In a test, Equivalent fails with the full report, and is silent when the circuits agree.
func ExampleEquivalent() {
	var t qcheck.TB = printTB{} // in a test: the *testing.T

	qcheck.Equivalent(t, circuit.New(2).CZ(0, 1), circuit.New(2).H(1).CX(0, 1).H(1))
	qcheck.Equivalent(t, circuit.New(2).CP(math.Pi/2, 0, 1), circuit.New(2).CRZ(math.Pi/2, 0, 1))
	// Output:
	// qcheck: got differs from want: operator norm 0.3902 > tolerance 1e-09
}

// circuits draws small circuits for the examples; real tests use gen.Circuit.
var circuits = rapid.Custom(func(t *rapid.T) *circuit.Circuit {
	c := circuit.New(2)
	for _, k := range rapid.SliceOfN(rapid.IntRange(0, 3), 0, 12).Draw(t, "gates") {
		q := rapid.IntRange(0, 1).Draw(t, "qubit")
		switch k {
		case 0:
			c.H(q)
		case 1:
			c.T(q)
		case 2:
			c.CX(q, 1-q)
		case 3:
			c.RZ(rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "angle"), q)
		}
	}
	return c
})

// flipCX is a wrong pass: it writes every CX with control and target exchanged.
func flipCX(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits())
	for _, op := range c.Ops {
		if op.Gate.Name == "cx" {
			out.CX(op.Qubits[1], op.Qubits[0])
			continue
		}
		out.AppendOp(op)
	}
	return out, nil
}

// Preserves is one line in a test:
//
//	func TestOptimizer(t *testing.T) {
//		qcheck.Preserves(t, optimizer.Run, gen.Circuit(gen.Options{Qubits: 4, MaxOps: 40}))
//	}
//
// Outside a test, Search runs the same campaign and returns a 1-minimal counterexample: here a
// single cx, which flipCX turns around (which way round it is depends on the random seed).
func ExamplePreserves() {
	f, err := qcheck.Search(flipCX, circuits)
	if err != nil {
		panic(err)
	}
	fmt.Println(f.Kind)
	fmt.Println(f.Input.Len(), f.Input.Ops[0].Gate.Name)
	// Output:
	// changed the circuit's meaning
	// 1 cx
}

// Property is the same check as Preserves for rapid's own runners, among them rapid.MakeFuzz,
// which makes it a go test -fuzz target (see fuzz_test.go in this package for a complete one):
//
//	func FuzzOptimizer(f *testing.F) {
//		f.Fuzz(rapid.MakeFuzz(qcheck.Property(optimizer.Run, circuits)))
//	}
func ExampleProperty() {
	prop := qcheck.Property(flipCX, circuits)
	t := &recordingT{}
	rapid.Check(t, prop) // as rapid.MakeFuzz(prop) would, once per fuzz input
	fmt.Println("caught:", t.failed)
	// Output: caught: true
}

// recordingT stands in for the *testing.T that rapid.Check takes, recording whether the
// property failed.
type recordingT struct{ failed bool }

func (r *recordingT) Helper()               {}
func (r *recordingT) Name() string          { return "example" }
func (r *recordingT) Logf(string, ...any)   {}
func (r *recordingT) Log(...any)            {}
func (r *recordingT) Skipf(string, ...any)  {}
func (r *recordingT) Skip(...any)           {}
func (r *recordingT) SkipNow()              {}
func (r *recordingT) Errorf(string, ...any) { r.failed = true }
func (r *recordingT) Error(...any)          { r.failed = true }
func (r *recordingT) Fatalf(string, ...any) { r.failed = true }
func (r *recordingT) Fatal(...any)          { r.failed = true }
func (r *recordingT) FailNow()              { r.failed = true }
func (r *recordingT) Fail()                 { r.failed = true }
func (r *recordingT) Failed() bool          { return r.failed }

// CheckRule checks a rewrite rule, then the pass that applies it inside random circuits.
//
//	func TestMergeRZ(t *testing.T) {
//		qcheck.CheckRule(t, mergeRZ, optimizer.MergeRotations)
//	}
func ExampleCheckRule() {
	mergeRZ := func(t *rapid.T) (left, right *circuit.Circuit) {
		a := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "a")
		b := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "b")
		return circuit.New(1).RZ(a, 0).RZ(b, 0), circuit.New(1).RZ(a+b, 0)
	}
	// A pass whose matcher merges neighbouring rz gates without looking at their qubits.
	sloppy := func(c *circuit.Circuit) (*circuit.Circuit, error) {
		out := circuit.New(c.Qubits())
		for _, op := range c.Ops {
			if n := len(out.Ops); n > 0 && op.Gate.Name == "rz" && out.Ops[n-1].Gate.Name == "rz" {
				out.Ops[n-1].Gate.Params[0] += op.Gate.Params[0]
				continue
			}
			out.AppendOp(op)
		}
		return out, nil
	}
	// The matcher bug shows in about 30% of the embeddings (measured over 3000 draws), so
	// rapid's 100 checks miss it with probability about 0.7^100 ≈ 1e-16.
	t := &recordingT{}
	qcheck.CheckRule(t, mergeRZ, nil) // the rule alone holds
	fmt.Println("rule wrong:", t.failed)
	qcheck.CheckRule(t, mergeRZ, sloppy) // the pass applying it does not
	fmt.Println("pass wrong:", t.failed)
	// Output:
	// rule wrong: false
	// pass wrong: true
}
