package readout_test

import (
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/examples/readout"
	"qcheck.dev/examples/readout/careless"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// programs draws Sedge programs: phases, SWAPs and entangling gates, with mid-circuit
// measurements, resets and classical control, and every qubit measured at the end.
var programs = sedgePrograms(nil)

// sedgePrograms draws them with the given gate weights (see gen.Options.Weights).
func sedgePrograms(weights map[string]int) *rapid.Generator[*circuit.Circuit] {
	return gen.Program(gen.ProgramOptions{
		Options: gen.Options{Qubits: 3, MaxOps: 14, Motifs: -1, Weights: weights,
			GateSet: []string{"h", "cz", "swap", "s", "t", "rz", "cx", "z", "cp", "rzz", "ry"}},
		Measure: 1, Reset: 1, If: 1,
	})
}

// distance is the exact total-variation distance between the distributions of two programs.
func distance(t *rapid.T, want, got *circuit.Circuit) sim.OutcomeGap {
	g, err := sim.ComparePrograms(want, got, sim.ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	return g
}

type pass func(*circuit.Circuit) *circuit.Circuit

// preserves checks, as a property over random programs, that the pass keeps the distribution
// of the classical bits; rapid shrinks a failure to a minimal program. It also checks that the
// pass changed a fair share of the programs, so that the property is not vacuous.
func preserves(t *testing.T, p pass, programs *rapid.Generator[*circuit.Circuit]) {
	changed, total := 0, 0
	rapid.Check(t, func(t *rapid.T) {
		c := programs.Draw(t, "program")
		out := p(c)
		if err := out.Validate(); err != nil {
			t.Fatal(err)
		}
		total++
		if !out.Equal(c) {
			changed++
		}
		if g := distance(t, c, out); g.Distance > 1e-9 {
			t.Fatalf("distance %g: P(%s) = %g before, %g after\nbefore: %v\nafter:  %v", g.Distance, g.Outcome, g.Want, g.Got, c.Ops, out.Ops)
		}
	})
	if changed*10 < total {
		t.Errorf("the pass changed only %d of %d programs; the property says little", changed, total)
	}
}

// caught looks through fixed draws of the program generator for one whose distribution the pass
// changes, and returns it.
func caught(p pass) (*circuit.Circuit, sim.OutcomeGap, bool) {
	for seed := 0; seed < 10000; seed++ { // about 1 draw in 2000 shows DropDiagonals' bug
		c := programs.Example(seed)
		g, err := sim.ComparePrograms(c, p(c), sim.ProgramOptions{})
		if err == nil && g.Distance > 1e-6 {
			return c, g, true
		}
	}
	return nil, sim.OutcomeGap{}, false
}

func TestDropDiagonalsPreserves(t *testing.T) { preserves(t, readout.DropDiagonals, programs) }

// SWAPs weigh more here, so that a fair share of programs end in one.
func TestRelabelSwapsPreserves(t *testing.T) {
	preserves(t, readout.RelabelSwaps, sedgePrograms(map[string]int{"swap": 8}))
}

func TestCarelessVariantsAreCaught(t *testing.T) {
	for name, p := range map[string]pass{"DropDiagonals": careless.DropDiagonals, "RelabelSwaps": careless.RelabelSwaps} {
		c, g, ok := caught(p)
		if !ok {
			t.Errorf("careless.%s: no program among 10000 draws shows the bug", name)
			continue
		}
		t.Logf("careless.%s caught: distance %.3g, P(%s) = %.3g before, %.3g after, on %v", name, g.Distance, g.Outcome, g.Want, g.Got, c.Ops)
	}
}

func TestHandExamples(t *testing.T) {
	// By hand (N&C §4.2: cz = (I⊗H) cx (I⊗H)): on |++⟩ followed by measurements cz is
	// invisible, so DropDiagonals removes it; followed by h on qubit 1 it is a cx from qubit 0
	// into |0⟩, which correlates the bits: 00 and 11 with probability ½, where without it all
	// four outcomes have ¼, a distance of ½. The careless pass drops it anyway.
	blind := circuit.New(2).H(0).H(1).CZ(0, 1).Measure(0, 0).Measure(1, 1)
	if got := readout.DropDiagonals(blind); len(got.Ops) != 4 {
		t.Errorf("cz before measurements kept: %v", got.Ops)
	}
	visible := circuit.New(2).H(0).H(1).CZ(0, 1).H(1).Measure(0, 0).Measure(1, 1)
	if got := readout.DropDiagonals(visible); !got.Equal(visible) {
		t.Errorf("cz before h removed: %v", got.Ops)
	}
	g, err := sim.ComparePrograms(visible, careless.DropDiagonals(visible), sim.ProgramOptions{})
	if err != nil || g.Distance < 0.5-1e-12 || g.Distance > 0.5+1e-12 {
		t.Errorf("careless DropDiagonals: %+v, %v; want distance ½", g, err)
	}

	// x on qubit 0, swap, measure both: the swap moves the 1 to qubit 1, so bit 1 reads 1.
	// RelabelSwaps measures qubit 0 into bit 1 instead; the careless pass relabels only bit 0's
	// measurement, so both bits read qubit 1, which holds 0: 00 instead of 10, a distance of 1.
	swapped := circuit.New(2).X(0).SWAP(0, 1).Measure(0, 0).Measure(1, 1)
	want := circuit.New(2).X(0).Measure(1, 0).Measure(0, 1)
	if got := readout.RelabelSwaps(swapped); !got.Equal(want) {
		t.Errorf("RelabelSwaps = %v, want %v", got.Ops, want.Ops)
	}
	g, err = sim.ComparePrograms(swapped, careless.RelabelSwaps(swapped), sim.ProgramOptions{})
	if err != nil || g.Distance != 1 || g.Outcome != "00" && g.Outcome != "10" {
		t.Errorf("careless RelabelSwaps: %+v, %v; want distance 1 at 00 or 10", g, err)
	}
}
