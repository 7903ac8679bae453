package sim

import (
	"math"
	"os"
	"path/filepath"
	"testing"

	"qcheck.dev/qcheck/qasm"
)

// TestPaperPrograms reads the OpenQASM files of testdata/programs, written from the OpenQASM 2.0
// paper's description (arXiv:1707.03429) with if statements as the reader produces them, and
// checks the hand-derived distributions in their comments, and teleportation against the same
// program built in Go.
func TestPaperPrograms(t *testing.T) {
	read := func(name string) *qasm.Program {
		src, err := os.ReadFile(filepath.Join("..", "..", "testdata", "programs", name))
		if err != nil {
			t.Fatal(err)
		}
		p, err := qasm.ParseProgram(src)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		return p
	}
	tele := read("teleport.qasm").Circuit
	s := math.Pow(math.Sin(0.15), 2)
	want := map[string]float64{}
	for _, ab := range []string{"00", "01", "10", "11"} {
		want["0"+ab] = (1 - s) / 4
		want["1"+ab] = s / 4
	}
	checkDistribution(t, outcomes(t, tele), want)
	if g, err := ComparePrograms(tele, teleport(t, 0.3, 0.2, 0.1, true), ProgramOptions{}); err != nil || g.Distance > 1e-12 {
		t.Errorf("teleport.qasm against the program built in Go: %+v, %v", g, err)
	}
	checkDistribution(t, outcomes(t, read("semiclassical_qft.qasm").Circuit), map[string]float64{"101": 1})
}
