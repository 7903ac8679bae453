package qasm

import (
	"bufio"
	"flag"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/gen"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

const corpusDir = "../../testdata/identities"

// corpusEntry is one line of testdata/identities/manifest.txt, written by distances.py (NumPy).
type corpusEntry struct {
	name       string
	equivalent bool
	distance   float64
}

func readManifest(t *testing.T) []corpusEntry {
	t.Helper()
	f, err := os.Open(filepath.Join(corpusDir, "manifest.txt"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []corpusEntry
	s := bufio.NewScanner(f)
	for s.Scan() {
		line := strings.TrimSpace(s.Text())
		if line == "" || line[0] == '#' {
			continue
		}
		fields := strings.Fields(line)
		if len(fields) != 3 || (fields[1] != "equivalent" && fields[1] != "different") {
			t.Fatalf("manifest line %q: want name, verdict, distance", line)
		}
		d, err := strconv.ParseFloat(fields[2], 64)
		if err != nil {
			t.Fatalf("manifest line %q: %v", line, err)
		}
		out = append(out, corpusEntry{fields[0], fields[1] == "equivalent", d})
	}
	return out
}

// Every .qasm file of the corpus belongs to a pair listed in the manifest, and there are at least
// 25 equivalent pairs and a near miss for each kind of error the issue names.
func TestCorpusComplete(t *testing.T) {
	entries := readManifest(t)
	listed := map[string]bool{}
	equivalent := 0
	for _, e := range entries {
		listed[e.name] = true
		if e.equivalent {
			equivalent++
		}
	}
	if equivalent < 25 {
		t.Errorf("%d equivalent pairs, want at least 25", equivalent)
	}
	for _, miss := range []string{"toffoli_one_t_daggered", "cp_in_place_of_crz", "cnot_swapped_roles"} {
		if !listed[miss] {
			t.Errorf("near miss %s missing", miss)
		}
	}
	files, _ := filepath.Glob(filepath.Join(corpusDir, "*.qasm"))
	for _, f := range files {
		base := filepath.Base(f)
		name := strings.TrimSuffix(strings.TrimSuffix(base, ".before.qasm"), ".after.qasm")
		if name == base || !listed[name] {
			t.Errorf("%s is not half of a pair in the manifest", base)
		}
	}
	if len(files) != 2*len(entries) {
		t.Errorf("%d files for %d pairs", len(files), len(entries))
	}
}

func corpusUnitary(t *testing.T, name string) *mat.CDense {
	t.Helper()
	src, err := os.ReadFile(filepath.Join(corpusDir, name))
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(src), "Source:") {
		t.Errorf("%s does not name its source", name)
	}
	c, err := Parse(src)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	u, err := sim.Unitary(c)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return u
}

// Every pair parses, and its phase-free operator-norm distance (metric.PhaseDistance on the
// sim.Unitary matrices) agrees with the one NumPy computed independently (manifest.txt, written
// by testdata/identities/distances.py), to 1e-9: far above rounding for these few gates, far
// below the smallest near miss (0.17).
func TestCorpusDistances(t *testing.T) {
	for _, e := range readManifest(t) {
		u := corpusUnitary(t, e.name+".before.qasm")
		v := corpusUnitary(t, e.name+".after.qasm")
		d := metric.PhaseDistance(u, v)
		if math.Abs(d-e.distance) > 1e-9 {
			t.Errorf("%s: phase-free distance %.15g, NumPy gives %.15g", e.name, d, e.distance)
		}
		if e.equivalent != (d <= 1e-9) {
			t.Errorf("%s: distance %.3g contradicts the verdict %v in the manifest", e.name, d, e.equivalent)
		}
	}
}

// wideCorpus runs every pair of the corpus at width 20, the non-Clifford ones too (minutes of
// statevector work); by default those run at width 14.
var wideCorpus = flag.Bool("corpus.wide", false, "check every corpus pair at width 20 (slow)")

// Every pair of the corpus, embedded on a random choice of qubits of a wide register between two
// random 40-gate Clifford circuits (the same context on both sides), keeps its verdict under
// qcheck.Compare's automatic engine choice: the tableau for Clifford pairs, at width 20, and the
// matrix-free estimate otherwise, at width 14 (20 with -corpus.wide). Conjugating by a unitary
// and tensoring with the identity leave the phase-free distance unchanged, so a non-Clifford pair
// must show the manifest's distance (NumPy) again, and a differing Clifford pair a tableau lower
// bound no larger than it.
func TestCorpusAtWidth(t *testing.T) {
	if testing.Short() {
		t.Skip("statevector runs at width 14 and more")
	}
	rng := rand.New(rand.NewPCG(20, 26))
	engines := map[qcheck.Engine]int{}
	for i, e := range readManifest(t) {
		before := corpusCircuit(t, e.name+".before.qasm")
		after := corpusCircuit(t, e.name+".after.qasm")
		width := 20
		if !*wideCorpus && !(sim.IsClifford(before) && sim.IsClifford(after)) {
			width = 14
		}
		context := gen.Circuit(gen.Options{Qubits: width, MinOps: 40, MaxOps: 40, GateSet: []string{"h", "s", "sdg", "x", "cx", "cz", "swap"}})
		where := rng.Perm(width)[:before.Qubits()]
		pre := context.Example(2 * i)
		post := context.Example(2*i + 1)
		want := pre.Clone().Compose(embed(before, where, width)).Compose(post)
		got := pre.Clone().Compose(embed(after, where, width)).Compose(post)
		r, err := qcheck.Compare(want, got)
		if err != nil {
			t.Fatalf("%s: %v", e.name, err)
		}
		engines[r.Engine]++
		if r.Equivalent != e.equivalent {
			t.Errorf("%s at width %d (%v engine): equivalent %v, the manifest says %v (distance %.3g)", e.name, width, r.Engine, r.Equivalent, e.equivalent, r.Distance)
			continue
		}
		switch {
		case e.equivalent:
		case r.Engine == qcheck.Tableau && r.Distance > e.distance+1e-9:
			t.Errorf("%s: tableau lower bound %.6g exceeds the true distance %.6g", e.name, r.Distance, e.distance)
		case r.Engine == qcheck.Tableau && !r.LowerBound && math.Abs(r.Distance-e.distance) > 1e-8:
			t.Errorf("%s: tableau distance %.10g at width %d, NumPy gives %.10g", e.name, r.Distance, width, e.distance)
		case (r.Engine == qcheck.MatrixFree || r.Engine == qcheck.ZX) && math.Abs(r.Distance-e.distance) > 1e-8:
			t.Errorf("%s: %v distance %.10g at width %d, NumPy gives %.10g", e.name, r.Engine, r.Distance, width, e.distance)
		}
	}
	if engines[qcheck.Tableau] == 0 || engines[qcheck.ZX]+engines[qcheck.MatrixFree] == 0 {
		t.Errorf("engines used: %v; the corpus should exercise both the tableau and an engine for non-Clifford circuits", engines)
	}
}

// corpusCircuit parses one file of the corpus.
func corpusCircuit(t *testing.T, name string) *circuit.Circuit {
	t.Helper()
	src, err := os.ReadFile(filepath.Join(corpusDir, name))
	if err != nil {
		t.Fatal(err)
	}
	c, err := Parse(src)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return c
}

// embed returns c on a register of the given width, its qubit q placed on where[q].
func embed(c *circuit.Circuit, where []int, width int) *circuit.Circuit {
	out := circuit.New(width)
	for _, op := range c.Ops {
		op = op.Clone()
		for k, q := range op.Qubits {
			op.Qubits[k] = where[q]
		}
		out.AppendOp(op)
	}
	return out
}
