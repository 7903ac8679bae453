package qcheck

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// Issue 12: with Measured, the classical bits the measurements write are the result (the
// OpenQASM 2.0 paper, Cross et al., arXiv:1707.03429, §3: measure q -> c records the outcome in
// c). Each distribution below is derived by hand.
func TestMeasuredReadsClassicalBits(t *testing.T) {
	// X(0) then q0 → c0, q1 → c1 gives c1c0 = 01 with certainty; q0 → c1, q1 → c0 gives 10:
	// total variation 1.
	r := mustCompare(t, circuit.New(2).X(0).Measure(0, 0).Measure(1, 1), circuit.New(2).X(0).Measure(0, 1).Measure(1, 0), Measured())
	if r.Equivalent || math.Abs(r.Distance-1) > 1e-12 {
		t.Errorf("swapped classical bits: %s", r.Headline())
	}
	if m := r.Measurement; !m.Basis || math.Abs(m.Want-m.Got) < 1-1e-12 {
		t.Errorf("measurement %+v, want a certain difference", m)
	}

	// A router on the line 0–1–2 that swaps qubits 1 and 2 to bring logical 2 next to 0, then
	// measures every physical qubit into the bit of the logical qubit it holds: for every input
	// the classical bits agree with want's (got = want followed by SWAP(1,2), read back through
	// the swap), with or without the permutation stated.
	want := circuit.New(3).H(0).CX(0, 2).Measure(0, 0).Measure(1, 1).Measure(2, 2)
	routed := circuit.New(3).H(0).SWAP(1, 2).CX(0, 1).Measure(0, 0).Measure(2, 1).Measure(1, 2)
	for _, opts := range [][]Option{{Measured()}, {Measured(), OutputPermutation([]int{0, 2, 1})}} {
		if r := mustCompare(t, want, routed, opts...); !r.Equivalent {
			t.Errorf("routed program with measurements mapped back (options %v): %s", r.Options, r.Headline())
		}
	}

	// Logical qubits 0 and 1 swapped (perm 1,0,2) but measured as if they were not: from |000⟩
	// want X(0) H(1) CX(1,2) gives {001, 111} and the wrongly remapped got {010, 111}, total
	// variation ½ (other inputs show more).
	want = circuit.New(3).X(0).H(1).CX(1, 2).Measure(0, 0).Measure(1, 1).Measure(2, 2)
	body := circuit.New(3).SWAP(0, 1).X(1).H(0).CX(0, 2)
	wrong := body.Clone().Measure(0, 0).Measure(1, 1).Measure(2, 2)
	right := body.Clone().Measure(1, 0).Measure(0, 1).Measure(2, 2)
	perm := OutputPermutation([]int{1, 0, 2})
	if r := mustCompare(t, want, wrong, Measured(), perm); r.Equivalent || r.Distance < 0.5-1e-12 {
		t.Errorf("wrong remap with perm 1,0,2: %s", r.Headline())
	}
	if r := mustCompare(t, want, right, Measured(), perm); !r.Equivalent {
		t.Errorf("right remap with perm 1,0,2: %s", r.Headline())
	}
	// Naming want's qubits selects the bits want writes from them.
	if r := mustCompare(t, want, wrong, Measured(2)); !r.Equivalent {
		t.Errorf("bit c2 alone agrees (½ each): %s", r.Headline())
	}
	if r := mustCompare(t, want, wrong, Measured(0)); r.Equivalent {
		t.Errorf("bit c0 alone differs (1 against ½): %s", r.Headline())
	}
}

// What Measured cannot honour is refused with the reason.
func TestMeasuredRefusesWhatItCannotRead(t *testing.T) {
	cases := []struct {
		name      string
		want, got *circuit.Circuit
		opts      []Option
		msg       string
	}{
		{"one side measures", circuit.New(1).H(0).Measure(0, 0), circuit.New(1).H(0), []Option{Measured()}, "got measures nothing"},
		{"unmeasured qubit named", circuit.New(2).Measure(0, 0), circuit.New(2).Measure(0, 0), []Option{Measured(1)}, "want does not measure qubit 1"},
		{"mid-circuit measurement", circuit.New(1).Measure(0, 0).H(0), circuit.New(1).H(0).Measure(0, 0), []Option{Measured()}, "want's op 0 (measure): the measurement is followed by h q0"},
		{"gate after the only measurement", circuit.New(1).H(0).Measure(0, 0).X(0), circuit.New(1).H(0).Measure(0, 0), []Option{Measured()}, "want's op 1 (measure): the measurement is followed by x q0 on the same qubit, so it is not final"},
		{"reset", circuit.New(2).H(0).Measure(0, 0), circuit.New(2).H(0).Reset(1).Measure(0, 0), []Option{Measured()}, "got's op 1 (reset): a reset; Measured takes circuits whose measurements are all final"},
	}
	for _, c := range cases {
		_, err := Compare(c.want, c.got, c.opts...)
		if err == nil || !strings.Contains(err.Error(), c.msg) {
			t.Errorf("%s: error %v, want one containing %q", c.name, err, c.msg)
		}
	}
}

// A circuit that measures before the end is refused by Measured with the op at fault, as an
// *OpError a caller can map to its source, and with the meaning to use instead: never by a
// complaint about the measured distributions the caller asked for.
func TestMeasuredRefusesProgramsWithTheirOp(t *testing.T) {
	want := circuit.New(2).H(0).Measure(0, 1).X(1).Measure(0, 0).Measure(1, 1)
	want.Ops[2].If = &circuit.Condition{Bits: []int{1}, Value: 1}
	got := circuit.New(2).H(0).CX(0, 1).Measure(0, 0).Measure(1, 1)
	_, err := Compare(want, got, Measured())
	var e *circuit.OpError
	if !errors.As(err, &e) {
		t.Fatalf("error %v, want a *circuit.OpError", err)
	}
	if e.Circuit != "want" || e.Index != 1 || e.Gate != "measure" {
		t.Errorf("OpError %+v, want want's op 1, measure q0 -> c1", e)
	}
	for _, s := range []string{"followed by measure q0 -> c0 on the same qubit", "Without Measured", "compared as programs"} {
		if !strings.Contains(err.Error(), s) {
			t.Errorf("error %q does not say %q", err, s)
		}
	}
	// Without Measured the same pair is a program pair, and equivalent: both give 00 or 11
	// with probability ½ (N&C §4.4: a classically controlled X after measuring the control
	// acts as the CNOT before it).
	if r := mustCompare(t, want, got); !r.Equivalent || r.Meaning != "program" {
		t.Errorf("as programs: %s (meaning %q)", r.Headline(), r.Meaning)
	}
}

// Issue 17, reproducer 2: h q0; measure q0 on 6 qubits against the same after a phase θ = 5e-8
// on |111111⟩. On the input (|111110⟩ + i|111111⟩)/√2, P(q0 = 0) is ½ after want and
// ½ − sin(θ)/2 after got (by hand: the amplitude of |111110⟩ after got is (1 + i·e^{iθ})/2), so
// the distributions differ by 2.5e-8 — far above the tolerance, which a search over a few inputs
// missed. The certified comparison must say different, with the bounds around sin(θ)/2.
func TestMeasuredIsCertifiedNotSearched(t *testing.T) {
	const n, theta = 6, 5e-8
	d := 1 << n
	diag := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		diag[i*d+i] = 1
	}
	diag[d*d-1] = complex(math.Cos(theta), math.Sin(theta))
	phase, err := circuit.Custom("c5p", mat.NewCDense(d, d, diag))
	if err != nil {
		t.Fatal(err)
	}
	want := circuit.New(n).H(0).Measure(0, 0)
	got := circuit.New(n).Append(phase, 5, 4, 3, 2, 1, 0).H(0).Measure(0, 0)
	r := mustCompare(t, want, got, Measured())
	half := math.Sin(theta) / 2
	lower := r.Distance
	if r.Equivalent || lower < half*(1-1e-6) {
		t.Fatalf("%s (certifies %s), want different by at least %.4g", r.Headline(), r.Certifies, half)
	}
	// Within the tolerance, the certified bound settles equivalence; the largest distance over
	// all inputs is sin(θ/2) = sin(θ)/2 to 1e-23 here (q0's Bloch vector turns by θ at most).
	r = mustCompare(t, want, got, Measured(), Tolerance(1e-7))
	upper := r.Distance
	if !r.Equivalent || upper < half || upper > half*(1+1e-5) {
		t.Errorf("at tolerance 1e-7: %s, want equivalent with a bound in [%.4g, %.4g]", r.Headline(), half, half*(1+1e-5))
	}
	// Between the bounds, the comparison is undecided and says so.
	if r := mustCompare(t, want, got, Measured(), Tolerance((lower+upper)/2)); r.Equivalent || !strings.Contains(r.Undecided, "lies between") {
		t.Errorf("between the bounds: equivalent %v, undecided %q", r.Equivalent, r.Undecided)
	}
}
