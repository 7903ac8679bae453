package gen_test

import (
	"fmt"
	"math"
	"math/cmplx"
	"strings"

	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
)

// A drawn circuit, as a property test would see it. Example(seed) draws one
// value outside a test; inside rapid.Check use Draw.
func ExampleCircuit() {
	g := gen.Circuit(gen.Options{Qubits: 3, MinOps: 6, MaxOps: 6, GateSet: []string{"h", "cx", "rz"}})
	c := g.Example(4)
	for _, op := range c.Ops {
		fmt.Println(op)
	}
	// Output:
	// cx q1,q2
	// h q2
	// h q2
	// cx q2,q0
	// h q2
	// rz(4.1768) q2
}

// The zero Options draw up to 20 ops on 3 qubits from DefaultGateSet.
func ExampleOptions() {
	c := gen.Circuit(gen.Options{}).Example(1)
	fmt.Println(c.Qubits(), c.Len() <= 20, c.Validate())
	fmt.Println(strings.Join(gen.DefaultGateSet()[:6], " "))
	// Output:
	// 3 true <nil>
	// h x cx s sdg t
}

// Weights and custom gates: a basis of rz, sx and cx where cx is three
// times as likely, with no motifs.
func ExampleOptions_weights() {
	opts := gen.Options{Qubits: 2, MaxOps: 100, MinOps: 100, GateSet: []string{"rz", "sx", "cx"},
		Weights: map[string]int{"cx": 3}, Motifs: -1}
	counts := map[string]int{}
	for seed := range 50 {
		for _, op := range gen.Circuit(opts).Example(seed).Ops {
			counts[op.Gate.Name]++
		}
	}
	fmt.Println(counts["cx"] > 2*counts["rz"], counts["cx"] > 2*counts["sx"])
	// Output: true true
}

func ExampleAngle() {
	for seed := range 8 {
		fmt.Print(circuit.FormatAngle(gen.Angle().Example(seed)), " ")
	}
	fmt.Println()
	// Output:
	// -6.2832 3π/4 -1e-09 4.6055 5.7136 -1e-10 -π 1.8845
}

// A Haar unitary: draws are unitary up to rounding.
func ExampleUnitary() {
	u := gen.Unitary(2).Example(1)
	d, _ := u.Dims()
	worst := 0.0
	for i := range d {
		for j := range d {
			var s complex128 // (U†U)_ij
			for k := range d {
				s += cmplx.Conj(u.At(k, i)) * u.At(k, j)
			}
			if i == j {
				s--
			}
			worst = math.Max(worst, cmplx.Abs(s))
		}
	}
	fmt.Println(d, worst < 1e-12)
	// Output: 4 true
}

func ExampleState() {
	psi := gen.State(3).Example(1)
	var norm float64
	for _, a := range psi {
		norm += real(a)*real(a) + imag(a)*imag(a)
	}
	fmt.Printf("%d amplitudes, norm %.12f\n", len(psi), norm)
	// Output: 8 amplitudes, norm 1.000000000000
}

// A uniformly random two-qubit Clifford, written with h, s, cx and Paulis.
func ExampleClifford() {
	c := gen.Clifford(2).Example(3)
	for _, op := range c.Ops {
		fmt.Println(op)
	}
	// Output:
	// x q0
	// x q1
	// s q1
	// cx q0,q1
	// s q0
}

// A placement of 5 logical qubits on 5 physical ones: layout[l] holds l.
func ExampleLayout() {
	fmt.Println(gen.Layout(5).Example(2))
	// Output:
	// [4 2 1 0 3]
}

// A small circuit placed on 3 of 6 qubits.
func ExampleEmbed() {
	small := circuit.New(2).H(0).CX(0, 1)
	e := gen.Embed(small, 6).Example(1)
	fmt.Println(e.Qubits)
	for _, op := range e.Circuit.Ops {
		fmt.Println(op)
	}
	// Output:
	// [2 3]
	// h q2
	// cx q2,q3
}

// A ring of 6 qubits, numbered at random.
func ExampleCoupling() {
	g := gen.Coupling(gen.Ring, 6).Example(1)
	fmt.Println(g.Edges)
	fmt.Println(g.Distance(g.Edges[0][0], g.Edges[0][1]))
	// Output:
	// [[0 4] [0 5] [1 2] [1 5] [2 3] [3 4]]
	// 1
}

func ExampleShape_Graph() {
	g, err := gen.Grid.Graph(6) // 3 wide: rows 0 1 2 and 3 4 5
	fmt.Println(g.Edges, err)
	fmt.Println(g.Distance(0, 5), g.Neighbours(4))
	// Output:
	// [[0 1] [0 3] [1 2] [1 4] [2 5] [3 4] [4 5]] <nil>
	// 3 [1 3 5]
}
