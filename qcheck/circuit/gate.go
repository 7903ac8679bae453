package circuit

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"gonum.org/v1/gonum/mat"
)

// Gate is a unitary operation on a fixed number of qubits: one of the standard library's gates
// with its angles, or a user's own matrix made by Custom. Gates are values; the zero Gate is
// invalid.
type Gate struct {
	// Name is the lower-case OpenQASM name of a standard gate, or the name given to Custom.
	Name string
	// Params are the gate's angles in radians, in OpenQASM order (u takes θ, φ, λ).
	Params []float64

	custom *customGate
}

// Spec describes a gate of the standard library: its name, how many qubits it acts on, and how
// many angles it takes.
type Spec struct {
	Name   string
	Qubits int
	Params int
	// Clifford reports whether the gate is a Clifford gate for every value of its angles; gates
	// with angles are Clifford only at multiples of π/2 and report false here.
	Clifford bool
}

// Standard returns the specs of every gate in the standard library, sorted by name.
func Standard() []Spec {
	out := make([]Spec, 0, len(library))
	for _, d := range library {
		out = append(out, d.spec)
	}
	sort.Slice(out, func(i, j int) bool { return out[i].Name < out[j].Name })
	return out
}

// AngleName returns the textbook name of the gate's angle k, counting from 0 (θ, φ or λ), so that
// an error can say which angle is wrong; it returns "" when the gate has no angle k. Messages
// count angles from 1, as people do: "angle 1 (θ)".
func (s Spec) AngleName(k int) string {
	d, ok := library[s.Name]
	if !ok || k < 0 || k >= len(d.angles) {
		return ""
	}
	return d.angles[k]
}

// Lookup returns the spec of the standard gate with the given name.
func Lookup(name string) (Spec, bool) {
	d, ok := library[name]
	if !ok {
		return Spec{}, false
	}
	return d.spec, true
}

// NewGate returns the standard gate with the given name and angles. It fails when the name is not
// in the library or the number of angles is wrong; non-finite angles are accepted here and
// reported by Validate, like every other builder input.
func NewGate(name string, params ...float64) (Gate, error) {
	d, ok := library[name]
	if !ok {
		return Gate{}, fmt.Errorf("circuit: unknown gate %q", name)
	}
	if len(params) != d.spec.Params {
		return Gate{}, fmt.Errorf("circuit: gate %s takes %d angle(s), got %d", name, d.spec.Params, len(params))
	}
	return Gate{Name: name, Params: append([]float64(nil), params...)}, nil
}

// Qubits returns the number of qubits the gate acts on, or 0 for a gate that is not in the
// library.
func (g Gate) Qubits() int {
	if g.custom != nil {
		return g.custom.qubits
	}
	if d, ok := library[g.Name]; ok {
		return d.spec.Qubits
	}
	return 0
}

// IsCustom reports whether the gate was made by Custom.
func (g Gate) IsCustom() bool { return g.custom != nil }

// Unitary reports whether the gate is a unitary operation. Barrier, measure and reset are
// directives recorded in a circuit (for OpenQASM and measured comparisons) but are not unitary.
func (g Gate) Unitary() bool {
	if g.custom != nil {
		return true
	}
	d, ok := library[g.Name]
	return ok && d.matrix != nil
}

// Matrix returns the gate's 2^k × 2^k matrix in the textbook order of its operands (the first
// operand is the most significant bit). It returns nil for a gate with no matrix (an unknown name,
// the wrong number of angles, or a directive such as measure).
func (g Gate) Matrix() *mat.CDense {
	data := g.Elements()
	if data == nil {
		return nil
	}
	d := 1 << g.Qubits()
	return mat.NewCDense(d, d, data)
}

// Elements returns the gate's matrix as a fresh row-major slice of 4^k entries, in the same order
// as Matrix, or nil where Matrix returns nil. Engines use it to avoid the mat wrapper. Angles are
// reduced modulo 4π exactly first (see ReduceAngle), so every finite angle gives a finite matrix.
func (g Gate) Elements() []complex128 {
	if g.custom != nil {
		return append([]complex128(nil), g.custom.data...)
	}
	d, ok := library[g.Name]
	if !ok || d.matrix == nil || len(g.Params) != d.spec.Params {
		return nil
	}
	return d.matrix(reduceAngles(g.Params))
}

// Inverse returns the exact inverse of the gate: self-inverse gates return themselves, pairs such
// as s and sdg swap, angles are negated where that inverts the gate, and u(θ, φ, λ) becomes
// u(−θ, −λ, −φ). The inverse of a custom gate is a custom gate holding the conjugate transpose,
// named name+"dg", or name without its "dg" when it ends so (Custom refuses names for which either
// would be a library gate's name). An ill-formed gate (an unknown name, or the wrong number of
// angles) is returned unchanged, and Validate reports it wherever it is used.
func (g Gate) Inverse() Gate {
	if g.custom != nil {
		return g.custom.inverse(g.Name)
	}
	d, ok := library[g.Name]
	if !ok || d.inverse == nil || len(g.Params) != d.spec.Params {
		return g.Clone() // an ill-formed gate stays as it is, for Validate to report
	}
	name, params := d.inverse(g.Params)
	return Gate{Name: name, Params: params}
}

// Clone returns a deep copy of the gate.
func (g Gate) Clone() Gate {
	g.Params = append([]float64(nil), g.Params...)
	if len(g.Params) == 0 {
		g.Params = nil
	}
	return g
}

// Equal reports whether two gates are the same operation with identical angles; custom gates are
// equal when their names and matrices are.
func (g Gate) Equal(h Gate) bool {
	if g.Name != h.Name || len(g.Params) != len(h.Params) || (g.custom == nil) != (h.custom == nil) {
		return false
	}
	for i := range g.Params {
		if g.Params[i] != h.Params[i] && !(math.IsNaN(g.Params[i]) && math.IsNaN(h.Params[i])) {
			return false
		}
	}
	if g.custom != nil {
		if g.custom.qubits != h.custom.qubits {
			return false
		}
		for i := range g.custom.data {
			if g.custom.data[i] != h.custom.data[i] {
				return false
			}
		}
	}
	return true
}

// String writes the gate as its name followed by its angles, such as rz(0.25) or u(1.5708,0,3.1416).
func (g Gate) String() string {
	if len(g.Params) == 0 {
		return g.Name
	}
	parts := make([]string, len(g.Params))
	for i, p := range g.Params {
		parts[i] = FormatAngle(p)
	}
	return g.Name + "(" + strings.Join(parts, ",") + ")"
}

// FormatAngle writes an angle briefly for people: multiples of π/8 up to ±4π as such (π/2, -3π/4,
// 2π), other values (tiny ones too: -1.8e-15, never 0π) with at most five significant digits.
func FormatAngle(a float64) string {
	if a == 0 {
		return "0"
	}
	k := a / (math.Pi / 8)
	// A tiny nonzero angle is not written as 0: it is the difference a verdict may be about.
	if r := math.Round(k); r != 0 && math.Abs(k-r) < 1e-12 && math.Abs(r) <= 32 {
		n, d := int(r), 8
		for d > 1 && n%2 == 0 {
			n, d = n/2, d/2
		}
		sign := ""
		if n < 0 {
			sign, n = "-", -n
		}
		num := "π"
		if n != 1 {
			num = strconv.Itoa(n) + "π"
		}
		if d == 1 {
			return sign + num
		}
		return sign + num + "/" + strconv.Itoa(d)
	}
	return strconv.FormatFloat(a, 'g', 5, 64)
}
