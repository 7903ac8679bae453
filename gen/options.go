package gen

import (
	"fmt"
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// Options configure Circuit. The zero value is useful: circuits of up to 20
// ops on 3 qubits, drawn from DefaultGateSet with equal weights, with 95% of
// the draws spent on motifs.
type Options struct {
	// Qubits is the width of the drawn circuits; 0 means 3.
	Qubits int

	// MaxOps is the most ops a drawn circuit has; 0 means 20. MinOps is the
	// fewest (default 0); shrinking never goes below it. Lengths are spread
	// evenly over [MinOps, MaxOps] when no motifs are drawn, and lean toward
	// MaxOps with them, where more structure fits.
	MinOps, MaxOps int

	// GateSet names the standard gates to draw from (lower-case OpenQASM
	// names, as circuit.Lookup knows them), simplest first: a failing
	// circuit shrinks toward the gates listed earlier. Empty means
	// DefaultGateSet, minus the gates wider than Qubits.
	GateSet []string

	// Custom are gates made by circuit.Custom, drawn alongside GateSet and
	// after it in shrinking order. Their names must differ from each other
	// and from GateSet's.
	Custom []circuit.Gate

	// Weights gives each gate's relative frequency by name; a gate not
	// listed weighs 1, and a weight of 0 leaves a gate out.
	Weights map[string]int

	// Motifs is the percentage of draws that place a motif, a short stretch
	// of the structure that rewrite passes look for, instead of a single
	// op: the left-hand side of a textbook identity whose gates are all in
	// the set, or a near miss of it (one op moved to another qubit, its
	// operands exchanged or its angle moved by π); a sandwich, an op with
	// ops after it that share its qubits in every role (or act elsewhere),
	// each followed by the op again, its inverse, the op with its operands
	// reversed, or another gate of the same width; runs of gates on the
	// same qubits; runs of commuting diagonal gates; and a block of ops
	// repeated two or three times. Only gates of the set with a positive
	// weight appear, in motifs too. 0 means 95; a negative value means none;
	// at most 100.
	Motifs int
}

// DefaultGateSet returns the gate set Circuit uses when Options.GateSet is
// empty: Cliffords, T, rotations, phase gates, controlled gates (with cp and
// crz, which differ by a relative phase, side by side), two-qubit
// interactions and Toffoli, simplest first.
func DefaultGateSet() []string {
	return []string{
		"h", "x", "cx", "s", "sdg", "t", "tdg", "z", "y", "sx",
		"rz", "rx", "ry", "p", "u",
		"cz", "cy", "swap", "ch", "cp", "crz", "crx", "rzz", "ccx",
	}
}

// Defaults of the zero Options.
const (
	defaultQubits = 3
	defaultMaxOps = 20
	defaultMotifs = 95 // measured: testdata/catalogue/detection.txt
)

// choice is one gate Circuit may draw.
type choice struct {
	gate     circuit.Gate // template: Params are replaced by drawn angles
	name     string
	qubits   int
	params   int
	weight   int
	diagonal bool // diagonal in the computational basis: all such gates commute
	inverse  int  // index of the choice that inverts it, or −1
}

// plan is Options resolved and checked: what a draw needs.
type plan struct {
	qubits         int
	minOps, maxOps int
	choices        []choice
	weights        []int
	chunkWeights   []int     // single op, then each motif kind
	patterns       []pattern // the identities whose gates are all in the set
	motifs         bool      // whether any motif is drawn
	// blocks[i][j][pos] reports whether single-qubit choice i fails to
	// commute with choice j on j's operand pos (nil for wider choices i).
	blocks [][][]bool
}

// diagonalGates are the standard gates whose matrices are diagonal
// (circuit/library.go).
var diagonalGates = []string{"id", "z", "s", "sdg", "t", "tdg", "rz", "p", "cz", "cp", "crz", "rzz", "ccz"}

// resolve checks the options and fills in defaults. Its errors name the
// field and the value at fault.
func (o Options) resolve() (*plan, error) {
	p := &plan{qubits: o.Qubits, minOps: o.MinOps, maxOps: o.MaxOps}
	if p.qubits == 0 {
		p.qubits = defaultQubits
	}
	if p.maxOps == 0 {
		p.maxOps = defaultMaxOps
	}
	switch {
	case p.qubits < 0:
		return nil, fmt.Errorf("gen.Options: Qubits = %d, want > 0", o.Qubits)
	case p.maxOps < 0:
		return nil, fmt.Errorf("gen.Options: MaxOps = %d, want > 0", o.MaxOps)
	case p.minOps < 0 || p.minOps > p.maxOps:
		return nil, fmt.Errorf("gen.Options: MinOps = %d, want 0 ≤ MinOps ≤ MaxOps = %d", o.MinOps, p.maxOps)
	}

	names := o.GateSet
	if len(names) == 0 {
		for _, name := range DefaultGateSet() {
			if spec, _ := circuit.Lookup(name); spec.Qubits <= p.qubits {
				names = append(names, name)
			}
		}
	}
	seen := map[string]bool{}
	for i, name := range names {
		spec, ok := circuit.Lookup(name)
		g, err := circuit.NewGate(name, make([]float64, spec.Params)...)
		switch {
		case !ok || err != nil:
			return nil, fmt.Errorf("gen.Options: GateSet[%d] = %q is not a standard gate", i, name)
		case !g.Unitary():
			return nil, fmt.Errorf("gen.Options: GateSet[%d] = %q is not a unitary gate", i, name)
		case spec.Qubits > p.qubits:
			return nil, fmt.Errorf("gen.Options: GateSet[%d] = %q acts on %d qubits, more than Qubits = %d", i, name, spec.Qubits, p.qubits)
		case seen[name]:
			return nil, fmt.Errorf("gen.Options: GateSet[%d] = %q is listed twice", i, name)
		}
		seen[name] = true
		p.choices = append(p.choices, choice{gate: g, name: name, qubits: spec.Qubits, params: spec.Params,
			diagonal: slices.Contains(diagonalGates, name)})
	}
	for i, g := range o.Custom {
		switch {
		case !g.IsCustom():
			return nil, fmt.Errorf("gen.Options: Custom[%d] = %v was not made by circuit.Custom", i, g)
		case g.Qubits() > p.qubits:
			return nil, fmt.Errorf("gen.Options: Custom[%d] (%s) acts on %d qubits, more than Qubits = %d", i, g.Name, g.Qubits(), p.qubits)
		case seen[g.Name]:
			return nil, fmt.Errorf("gen.Options: Custom[%d] is named %q, a name already in the gate set", i, g.Name)
		}
		seen[g.Name] = true
		p.choices = append(p.choices, choice{gate: g, name: g.Name, qubits: g.Qubits(), diagonal: isDiagonal(g)})
	}
	if len(p.choices) == 0 {
		return nil, fmt.Errorf("gen.Options: the gate set is empty")
	}

	total := 0
	for name, w := range o.Weights {
		if !seen[name] {
			return nil, fmt.Errorf("gen.Options: Weights names %q, which is not in the gate set", name)
		}
		if w < 0 {
			return nil, fmt.Errorf("gen.Options: Weights[%q] = %d, want ≥ 0", name, w)
		}
	}
	for i := range p.choices {
		w, ok := o.Weights[p.choices[i].name]
		if !ok {
			w = 1
		}
		p.choices[i].weight = w
		p.weights = append(p.weights, w)
		total += w
	}
	if total == 0 {
		return nil, fmt.Errorf("gen.Options: every gate has weight 0")
	}

	for i := range p.choices {
		p.choices[i].inverse = p.inverseOf(i)
	}

	p.blocks = make([][][]bool, len(p.choices))
	for i, a := range p.choices {
		if a.qubits != 1 {
			continue
		}
		p.blocks[i] = make([][]bool, len(p.choices))
		for j, g := range p.choices {
			p.blocks[i][j] = blocks(a.gate, g.gate)
		}
	}

	motifs := o.Motifs
	switch {
	case motifs == 0:
		motifs = defaultMotifs
	case motifs < 0:
		motifs = 0
	case motifs > 100:
		return nil, fmt.Errorf("gen.Options: Motifs = %d, want a percentage ≤ 100", o.Motifs)
	}
	p.patterns = p.available()
	p.motifs = motifs > 0
	// Of the motifs, patterns get half, sandwiches a quarter and the
	// other kinds a twelfth each.
	p.chunkWeights = make([]int, chunkKinds)
	p.chunkWeights[chunkOp] = 12 * (100 - motifs)
	p.chunkWeights[chunkSandwich] = 3 * motifs
	p.chunkWeights[chunkPattern] = 6 * motifs
	p.chunkWeights[chunkSameRun] = motifs
	p.chunkWeights[chunkCommute] = motifs
	p.chunkWeights[chunkRepeat] = motifs
	if len(p.patterns) == 0 {
		p.chunkWeights[chunkSandwich] += p.chunkWeights[chunkPattern]
		p.chunkWeights[chunkPattern] = 0
	}
	return p, nil
}

// inverseOf returns the index of the choice whose gate inverts choice i, or
// −1 when the inverse is not in the set or weighs 0. A standard gate's
// inverse is found by name (circuit.Gate.Inverse keeps the name of rotations
// and negates their angles); a custom gate's by matrix, so a Hermitian custom
// gate is its own inverse.
func (p *plan) inverseOf(i int) int {
	c := p.choices[i]
	inv := c.gate.Inverse()
	for j, d := range p.choices {
		switch {
		case d.weight == 0:
		case !c.gate.IsCustom() && !d.gate.IsCustom() && d.name == inv.Name:
			return j
		case c.gate.IsCustom() && d.gate.IsCustom() && sameMatrix(d.gate, inv):
			return j
		}
	}
	return -1
}

// isDiagonal reports whether a custom gate's matrix is diagonal.
func isDiagonal(g circuit.Gate) bool {
	m := g.Elements()
	d := 1 << g.Qubits()
	for i, e := range m {
		if i/d != i%d && e != 0 {
			return false
		}
	}
	return true
}

// sameMatrix reports whether two gates have identical matrices.
func sameMatrix(g, h circuit.Gate) bool {
	return slices.Equal(g.Elements(), h.Elements())
}
