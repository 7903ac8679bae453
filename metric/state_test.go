package metric

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// Pure-state trace distance sqrt(1 − |⟨a|b⟩|²) and fidelity |⟨a|b⟩|²
// (Nielsen & Chuang §9.2; section numbers from memory) on states worked by hand.
func TestStateDistanceByHand(t *testing.T) {
	s := 1 / math.Sqrt2
	zero, one := []complex128{1, 0}, []complex128{0, 1}
	plus, iplus := []complex128{complex(s, 0), complex(s, 0)}, []complex128{complex(0, s), complex(0, s)}
	near(t, "StateDistance(0,1)", StateDistance(zero, one), 1, 1e-15)
	near(t, "StateDistance(0,+)", StateDistance(zero, plus), s, 1e-15)
	near(t, "StateDistance(+,i+)", StateDistance(plus, iplus), 0, 1e-15)
	near(t, "StateFidelity(0,+)", StateFidelity(zero, plus), 0.5, 1e-15)
	// Unnormalised input: only the direction counts.
	near(t, "StateDistance(2·0,+)", StateDistance([]complex128{2, 0}, plus), s, 1e-15)
	// Nearly equal states keep relative accuracy: the angle 1e-12 between
	// (1, 0) and (cos 1e-12, sin 1e-12) gives distance sin(1e-12).
	near(t, "StateDistance tiny", StateDistance(zero, []complex128{complex(math.Cos(1e-12), 0), complex(math.Sin(1e-12), 0)}), 1e-12, 1e-27)
}

// Trace distance of density matrices: ½ Σ|λ_i(ρ − σ)| (Nielsen & Chuang
// §9.2.1, from memory). |0⟩⟨0| vs |1⟩⟨1| is 1; |0⟩⟨0| vs I/2 is ½; for pure
// states it agrees with StateDistance (same section).
func TestTraceDistance(t *testing.T) {
	p0 := mat.NewCDense(2, 2, []complex128{1, 0, 0, 0})
	p1 := mat.NewCDense(2, 2, []complex128{0, 0, 0, 1})
	mixed := mat.NewCDense(2, 2, []complex128{0.5, 0, 0, 0.5})
	near(t, "TraceDistance(0,1)", TraceDistance(p0, p1), 1, 1e-15)
	near(t, "TraceDistance(0,I/2)", TraceDistance(p0, mixed), 0.5, 1e-15)
	rng := newRand(3)
	for _, n := range []int{2, 5, 16} {
		a, b := haarState(rng, n), haarState(rng, n)
		near(t, "TraceDistance(pure)", TraceDistance(projector(a), projector(b)), StateDistance(a, b), 1e-13)
	}
}

func projector(a []complex128) *mat.CDense {
	n := len(a)
	m := mat.NewCDense(n, n, nil)
	for i := range a {
		for j := range a {
			m.Set(i, j, a[i]*conj(a[j]))
		}
	}
	return m
}

// Size mismatches are programmer errors that panic with an *InputError.
func TestInputErrors(t *testing.T) {
	cases := map[string]func(){
		"non-square":     func() { PhaseDistance(mat.NewCDense(2, 3, nil), mat.NewCDense(2, 3, nil)) },
		"sizes":          func() { Distance(identity(2), identity(4)) },
		"states":         func() { StateDistance([]complex128{1}, []complex128{1, 0}) },
		"zero state":     func() { StateFidelity([]complex128{0, 0}, []complex128{1, 0}) },
		"witness sizes":  func() { Witness(identity(2), identity(3)) },
		"diamond square": func() { Diamond(mat.NewCDense(1, 2, nil), mat.NewCDense(1, 2, nil)) },
	}
	for name, f := range cases {
		func() {
			defer func() {
				r := recover()
				if _, ok := r.(*InputError); !ok {
					t.Errorf("%s: recovered %v (%T), want an *InputError", name, r, r)
				}
			}()
			f()
		}()
	}
}

// emptyMatrix is a 0×0 mat.CMatrix, which gonum's CDense cannot be.
type emptyMatrix struct{}

func (emptyMatrix) Dims() (int, int)                 { return 0, 0 }
func (emptyMatrix) At(int, int) complex128           { panic("empty") }
func (e emptyMatrix) H() mat.CMatrix                 { return e }
func (e emptyMatrix) T() mat.CMatrix                 { return e }
func (emptyMatrix) Conj(mat.CMatrix)                 {}
func (emptyMatrix) IsEmpty() bool                    { return true }
func (emptyMatrix) Slice(_, _, _, _ int) mat.CMatrix { return emptyMatrix{} }

func TestEmptyInputs(t *testing.T) {
	for name, f := range map[string]func(){
		"OperatorNorm":  func() { OperatorNorm(emptyMatrix{}) },
		"PhaseDistance": func() { PhaseDistance(emptyMatrix{}, emptyMatrix{}) },
		"StateDistance": func() { StateDistance(nil, nil) },
	} {
		func() {
			defer func() {
				if _, ok := recover().(*InputError); !ok {
					t.Errorf("%s on empty input did not panic with an *InputError", name)
				}
			}()
			f()
		}()
	}
}

// Any mat.CMatrix serves, not only *mat.CDense: an adjoint view gives the
// same distances as an explicit adjoint (a unitary and its adjoint have
// conjugate spectra, so distances between adjoints are unchanged).
func TestMatrixViews(t *testing.T) {
	rng := newRand(21)
	u, v := haar(rng, 8), haar(rng, 8)
	near(t, "PhaseDistance of views", PhaseDistance(u.H(), v.H()), PhaseDistance(adjoint(u), adjoint(v)), 1e-15)
	near(t, "Distance of views", Distance(u.H(), v.H()), Distance(u, v), 1e-14)
	near(t, "PhaseDistance of adjoints", PhaseDistance(u.H(), v.H()), PhaseDistance(u, v), 1e-14)
}

// Non-finite entries give NaN, not a hang or a plausible number.
func TestNonFinite(t *testing.T) {
	bad := identity(4)
	bad.Set(1, 2, complex(math.NaN(), 0))
	for name, got := range map[string]float64{
		"PhaseDistance": PhaseDistance(bad, identity(4)),
		"Diamond":       Diamond(identity(4), bad),
		"Distance":      Distance(bad, identity(4)),
	} {
		if !math.IsNaN(got) {
			t.Errorf("%s with a NaN entry = %v, want NaN", name, got)
		}
	}
	if _, d := Witness(bad, identity(4)); !math.IsNaN(d) {
		t.Errorf("Witness with a NaN entry gives deviation %v, want NaN", d)
	}
}
