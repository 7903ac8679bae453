package sim

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// TestProgramsAgainstNumPy checks the distributions of 40 random programs with mid-circuit
// measurements, resets and classically controlled gates against testdata/programs/reference.py,
// which computes them with NumPy by another method (a density matrix for each value of the
// classical bits, Nielsen & Chuang §2.4).
func TestProgramsAgainstNumPy(t *testing.T) {
	data, err := os.ReadFile(filepath.Join("..", "..", "testdata", "programs", "reference.json"))
	if err != nil {
		t.Fatal(err)
	}
	var ref struct {
		NumPy string `json:"numpy"`
		Cases []struct {
			Name   string `json:"name"`
			Qubits int    `json:"qubits"`
			Bits   int    `json:"bits"`
			Ops    []struct {
				Gate   string             `json:"gate"`
				Params []float64          `json:"params"`
				Qubits []int              `json:"qubits"`
				Bits   []int              `json:"bits"`
				If     *circuit.Condition `json:"if"`
			} `json:"ops"`
			Distribution map[string]float64 `json:"distribution"`
		} `json:"cases"`
	}
	if err := json.Unmarshal(data, &ref); err != nil {
		t.Fatal(err)
	}
	if len(ref.Cases) < 40 {
		t.Fatalf("reference.json (NumPy %s) holds %d cases; regenerate it with testdata/programs/reference.py", ref.NumPy, len(ref.Cases))
	}
	for _, tc := range ref.Cases {
		c := circuit.New(tc.Qubits).SetBits(tc.Bits)
		for _, op := range tc.Ops {
			g, err := circuit.NewGate(op.Gate, op.Params...)
			if err != nil {
				t.Fatalf("%s: %v", tc.Name, err)
			}
			c.AppendOp(circuit.Op{Gate: g, Qubits: op.Qubits, Bits: op.Bits, If: op.If})
		}
		got, err := ProgramOutcomes(c, ProgramOptions{})
		if err != nil {
			t.Fatalf("%s: %v", tc.Name, err)
		}
		for _, k := range got.Support() {
			if _, ok := tc.Distribution[k]; !ok && got.Probability(k) > 1e-12 {
				t.Errorf("%s: P(%s) = %g, NumPy (%s) says 0", tc.Name, k, got.Probability(k), ref.NumPy)
			}
		}
		for k, p := range tc.Distribution {
			if math.Abs(got.Probability(k)-p) > 1e-12 {
				t.Errorf("%s: P(%s) = %.15g, NumPy (%s) says %.15g", tc.Name, k, got.Probability(k), ref.NumPy, p)
			}
		}
	}
}
