package peephole

import "qcheck.dev/qcheck/circuit"

// A Rewrite is one of the optimizer's rewrite rules written out as circuits: the pattern it
// matches and what it leaves, for the given angles. The list documents what Optimize does, and
// the tests check each entry twice: that the two sides have the same unitary (qcheck's rule
// check, which also embeds the pattern in random surroundings), and that Optimize turns the left
// side into the right one.
type Rewrite struct {
	// Name says what the rule does, such as "rz through cx control".
	Name string
	// Angles is how many angles Build takes.
	Angles int
	// Build returns the pattern and its rewrite for the given angles, on the same register.
	Build func(angles []float64) (before, after *circuit.Circuit)
}

// Catalogue returns the rewrite rules of Optimize, the simplest cases of each thing it does.
func Catalogue() []Rewrite {
	return []Rewrite{
		{"cancel h·h", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).H(0).H(0), circuit.New(1)
		}},
		{"cancel cx·cx", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).CX(0, 1).CX(0, 1), circuit.New(2)
		}},
		{"cancel s·sdg", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).S(0).Sdg(0), circuit.New(1)
		}},
		{"cancel cz·cz with operands exchanged", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).CZ(0, 1).CZ(1, 0), circuit.New(2)
		}},
		{"cancel x through cx target", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).X(1).CX(0, 1).X(1), circuit.New(2).CX(0, 1)
		}},
		{"cancel z through cx control", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).Z(0).CX(0, 1).Z(0), circuit.New(2).CX(0, 1)
		}},
		{"merge t·t into s", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).T(0).T(0), circuit.New(1).S(0)
		}},
		{"merge s·s into z", 0, func([]float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).S(0).S(0), circuit.New(1).Z(0)
		}},
		{"merge rz+rz", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).RZ(a[0], 0).RZ(a[1], 0), circuit.New(1).RZ(a[0]+a[1], 0)
		}},
		{"merge rx+rx", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).RX(a[0], 0).RX(a[1], 0), circuit.New(1).RX(a[0]+a[1], 0)
		}},
		{"merge p+p", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(1).P(a[0], 0).P(a[1], 0), circuit.New(1).P(a[0]+a[1], 0)
		}},
		{"merge cp+cp with operands exchanged", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).CP(a[0], 0, 1).CP(a[1], 1, 0), circuit.New(2).CP(a[0]+a[1], 0, 1)
		}},
		{"merge crz+crz", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).CRZ(a[0], 0, 1).CRZ(a[1], 0, 1), circuit.New(2).CRZ(a[0]+a[1], 0, 1)
		}},
		{"merge rzz+rzz", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).RZZ(a[0], 0, 1).RZZ(a[1], 1, 0), circuit.New(2).RZZ(a[0]+a[1], 0, 1)
		}},
		{"rz through cx control", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).RZ(a[0], 0).CX(0, 1).RZ(a[1], 0), circuit.New(2).CX(0, 1).RZ(a[0]+a[1], 0)
		}},
		{"rx through cx target", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(2).RX(a[0], 1).CX(0, 1).RX(a[1], 1), circuit.New(2).CX(0, 1).RX(a[0]+a[1], 1)
		}},
		{"p through cx control and cz", 2, func(a []float64) (*circuit.Circuit, *circuit.Circuit) {
			return circuit.New(3).P(a[0], 0).CX(0, 2).CZ(0, 1).P(a[1], 0), circuit.New(3).CX(0, 2).CZ(0, 1).P(a[0]+a[1], 0)
		}},
	}
}
