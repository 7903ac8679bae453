package qasm

import (
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// anyCircuit draws a circuit over every gate of the standard library, barriers, measures and
// resets, with angles that mix special values, awkward floats (tiny, huge, negative zero,
// subnormal) and arbitrary ones.
func anyCircuit() *rapid.Generator[*circuit.Circuit] {
	specs := circuit.Standard()
	angle := rapid.OneOf(
		rapid.SampledFrom([]float64{0, math.Copysign(0, -1), math.Pi, -math.Pi / 2, math.Pi / 4, 1e-300, 5e-324, 1e300, -1e21, 1e-5, 0.1}),
		rapid.Float64Range(-10, 10),
		rapid.Float64().Filter(func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }),
	)
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		n := rapid.IntRange(1, 6).Draw(t, "qubits")
		c := circuit.New(n)
		ops := rapid.IntRange(0, 30).Draw(t, "ops")
		for i := 0; i < ops; i++ {
			s := rapid.SampledFrom(specs).Draw(t, "gate")
			k := s.Qubits
			if s.Name == "barrier" {
				k = rapid.IntRange(1, n).Draw(t, "barrier width")
			}
			if k > n {
				continue
			}
			qs := rapid.Permutation(seq(n)).Draw(t, "qubits")[:k]
			switch s.Name {
			case "measure":
				c.Measure(qs[0], rapid.IntRange(0, 4).Draw(t, "bit"))
			case "reset":
				c.Reset(qs[0])
			case "barrier":
				c.Barrier(qs...)
			default:
				params := make([]float64, s.Params)
				for j := range params {
					params[j] = angle.Draw(t, "angle")
				}
				g, err := circuit.NewGate(s.Name, params...)
				if err != nil {
					t.Fatal(err)
				}
				c.Append(g, qs...)
			}
		}
		return c
	})
}

// roundTrip fails unless Parse(Format(c)) equals c op for op, with the same classical register.
func roundTrip(t interface{ Fatalf(string, ...any) }, c *circuit.Circuit) {
	src, err := Format(c)
	if err != nil {
		t.Fatalf("Format: %v", err)
	}
	back, err := Parse(src)
	if err != nil {
		t.Fatalf("Parse: %v\n%s", err, src)
	}
	if !back.Equal(c) || back.Bits() != c.Bits() {
		t.Fatalf("round trip changed the circuit\nbefore: %v\nwrote:\n%s\nread back: %v", c.Ops, src, back.Ops)
	}
}

func seq(n int) []int {
	out := make([]int, n)
	for i := range out {
		out[i] = i
	}
	return out
}

// Parse(Format(c)) equals c for every circuit over the standard library (the round trip the
// issue asks for; equality is op for op with identical float64 angles).
func TestFormatRoundTrip(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		c := anyCircuit().Draw(t, "circuit")
		roundTrip(t, c)
	})
}

// FormatProgram keeps register names and sizes through a round trip.
func TestFormatProgramRoundTrip(t *testing.T) {
	src := head + "qreg a[2];\nqreg anc[1];\ncreg m[2];\ncreg flag[1];\nccx a[0],a[1],anc[0];\nmeasure anc[0] -> flag[0];\nmeasure a -> m;\n"
	p := mustParse(t, src)
	out, err := FormatProgram(p)
	if err != nil {
		t.Fatal(err)
	}
	if string(out) != strings.Replace(src, "measure a -> m;", "measure a[0] -> m[0];\nmeasure a[1] -> m[1];", 1) {
		t.Errorf("FormatProgram wrote\n%s", out)
	}
}

// haar2 draws a 2×2 unitary e^{iα}·u(θ,φ,λ) with arbitrary angles; the matrix is built here
// from the definition of u (package circuit's documentation), not by the code under test.
func haar2(t *rapid.T) []complex128 {
	a := rapid.Float64Range(-4, 4).Draw(t, "alpha")
	th := rapid.SampledFrom([]float64{0, math.Pi, 1.1, 2 * math.Pi}).Draw(t, "theta")
	if rapid.Bool().Draw(t, "continuous") {
		th = rapid.Float64Range(0, math.Pi).Draw(t, "theta")
	}
	ph := rapid.Float64Range(-4, 4).Draw(t, "phi")
	la := rapid.Float64Range(-4, 4).Draw(t, "lambda")
	m := textbookU(th, ph, la)
	for i := range m {
		m[i] *= cmplx.Exp(complex(0, a))
	}
	return m
}

// A single-qubit custom gate is written as an exact definition: the circuit read back has the
// same unitary, global phase included, to rounding.
func TestFormatCustomSingleQubit(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		m := haar2(t)
		g, err := circuit.Custom("mine", mat.NewCDense(2, 2, m))
		if err != nil {
			t.Fatal(err)
		}
		c := circuit.New(2).H(0).Append(g, 1).Append(g, 0).CX(1, 0)
		src, err := Format(c)
		if err != nil {
			t.Fatal(err)
		}
		back, err := Parse(src)
		if err != nil {
			t.Fatalf("%v\n%s", err, src)
		}
		want, err := sim.Unitary(c)
		if err != nil {
			t.Fatal(err)
		}
		got, err := sim.Unitary(back)
		if err != nil {
			t.Fatal(err)
		}
		n, _ := want.Dims()
		for i := 0; i < n; i++ {
			for j := 0; j < n; j++ {
				if d := cmplx.Abs(want.At(i, j) - got.At(i, j)); d > 1e-12 {
					t.Fatalf("entry (%d,%d) off by %.3g\n%s", i, j, d, src)
				}
			}
		}
	})
}

func TestFormatErrors(t *testing.T) {
	two, err := circuit.Custom("big", mat.NewCDense(4, 4, []complex128{1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 0, 1, 0, 0, 1, 0}))
	if err != nil {
		t.Fatal(err)
	}
	badName, err := circuit.Custom("u3", mat.NewCDense(2, 2, []complex128{0, 1, 1, 0}))
	if err != nil {
		t.Fatal(err)
	}
	a, _ := circuit.Custom("v", mat.NewCDense(2, 2, []complex128{0, 1, 1, 0}))
	b, _ := circuit.Custom("v", mat.NewCDense(2, 2, []complex128{1, 0, 0, 1}))
	cases := []struct {
		c     *circuit.Circuit
		words string
	}{
		{circuit.New(2).H(0).Append(two, 0, 1), "op 1 (big): custom gates on 2 qubits"},
		{circuit.New(1).Append(badName, 0), "op 0 (u3): custom gate name"},
		{circuit.New(1).Append(a, 0).Append(b, 0), "op 1: two different custom gates are named v"},
		{circuit.New(1).RZ(math.NaN(), 0), "op 0 (rz)"},
		{circuit.New(1).CX(0, 1), "op 0 (cx)"},
	}
	for _, tc := range cases {
		_, err := Format(tc.c)
		if err == nil {
			t.Errorf("Format accepted %v", tc.c.Ops)
			continue
		}
		if err == nil || !strings.Contains(err.Error(), tc.words) {
			t.Errorf("Format: error %v, want …%s…", err, tc.words)
		}
	}
}

// appendAngle must give the shortest decimal that reads back exactly, with a decimal point
// before any exponent as the OpenQASM 2.0 grammar wants (arXiv:1707.03429, real literals).
func TestAppendAngle(t *testing.T) {
	cases := map[float64]string{
		0.5: "0.5", -2: "-2", 1e-5: "1.0e-05", 1.5e-7: "1.5e-07", 1e21: "1.0e+21", 5e-324: "5.0e-324",
		math.Pi: "3.141592653589793",
	}
	for v, want := range cases {
		if got := string(appendAngle(nil, v)); got != want {
			t.Errorf("appendAngle(%v) = %s, want %s", v, got, want)
		}
	}
}

// The same round trip over the gen package's circuits, which add motifs (runs, inverse pairs,
// repeated blocks) and its own mix of special angles.
func TestFormatRoundTripGen(t *testing.T) {
	var set []string
	for _, s := range circuit.Standard() {
		if g, err := circuit.NewGate(s.Name, make([]float64, s.Params)...); err == nil && g.Unitary() && s.Qubits <= 4 {
			set = append(set, s.Name)
		}
	}
	circuits := gen.Circuit(gen.Options{Qubits: 4, MaxOps: 40, GateSet: set})
	rapid.Check(t, func(t *rapid.T) {
		c := circuits.Draw(t, "circuit")
		roundTrip(t, c)
	})
}

// A measure set into Ops directly may write past Bits(); Format sizes the classical register to
// hold it, and FormatProgram refuses a bit outside the registers it is given.
func TestFormatClassicalBits(t *testing.T) {
	c := circuit.New(1)
	c.Ops = append(c.Ops, circuit.Op{Gate: circuit.Gate{Name: "measure"}, Qubits: []int{0}, Bits: []int{3}})
	src, err := Format(c)
	if err != nil || !strings.Contains(string(src), "creg c[4];\nmeasure q[0] -> c[3];") {
		t.Errorf("Format: %v\n%s", err, src)
	}
	p := &Program{Circuit: c, Qregs: []Register{{"q", 1, 0}}, Cregs: []Register{{"c", 2, 0}}}
	if _, err := FormatProgram(p); err == nil || !strings.Contains(err.Error(), "op 0 (measure) writes classical bit 3") {
		t.Errorf("FormatProgram: %v", err)
	}
}
