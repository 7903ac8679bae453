package zx

import (
	"bufio"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/qasm"
)

const corpusDir = "../../testdata/identities"

// manifest reads testdata/identities/manifest.txt: each pair's name and its phase-free distance,
// computed with NumPy by distances.py.
func manifest(t *testing.T) map[string]float64 {
	t.Helper()
	f, err := os.Open(filepath.Join(corpusDir, "manifest.txt"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	out := map[string]float64{}
	s := bufio.NewScanner(f)
	for s.Scan() {
		fields := strings.Fields(s.Text())
		if len(fields) != 3 || strings.HasPrefix(fields[0], "#") {
			continue
		}
		d, err := strconv.ParseFloat(fields[2], 64)
		if err != nil {
			t.Fatal(err)
		}
		out[fields[0]] = d
	}
	return out
}

func parseFile(t *testing.T, name string) *circuit.Circuit {
	t.Helper()
	src, err := os.ReadFile(filepath.Join(corpusDir, name))
	if err != nil {
		t.Fatal(err)
	}
	c, err := qasm.Parse(src)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return c
}

// embed places c on the given qubits of a wide circuit, between a random prefix and suffix.
func embed(c *circuit.Circuit, width int, at []int, pre, post *circuit.Circuit) *circuit.Circuit {
	out := pre.Clone()
	for _, op := range c.Ops {
		op = op.Clone()
		for k, q := range op.Qubits {
			op.Qubits[k] = at[q]
		}
		out.AppendOp(op)
	}
	return out.Compose(post)
}

// The published identity corpus (testdata/identities, distances from NumPy in manifest.txt),
// each pair embedded at random qubits of a 30-qubit random circuit, the second side rewritten
// (basis translation, commuting reorder, routing): ZX must prove the equivalent pairs and, for the
// different ones, either give the manifest's distance or stay undecided; Compare must give the
// manifest's distance for all, through the difference window.
func TestIdentityCorpusEmbedded(t *testing.T) {
	const width = 30
	rng := rand.New(rand.NewPCG(8, 9))
	proved, refuted, undecided := 0, 0, 0
	var unproved []string
	for name, want := range manifest(t) {
		before, after := parseFile(t, name+".before.qasm"), parseFile(t, name+".after.qasm")
		at := rng.Perm(width)[:before.Qubits()]
		pre, post := volume(width, 2, rng), volume(width, 2, rng)
		u := embed(before, width, at, pre, post)
		v := embed(after, width, at, pre, post)
		r, err := Compare(u, v, Options{})
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if !r.Known || math.Abs(r.Distance-want) > 1e-9 {
			t.Errorf("%s: Compare gave %v (known %v), manifest %g", name, r.Distance, r.Known, want)
		}
		rv := route(reorder(translate(v), 10*len(v.Ops), rng), rng)
		r, err = Check(u, rv, Options{})
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		switch {
		case r.Verdict == Equivalent && want > r.Bound+1e-12:
			t.Errorf("%s: proved equivalent within %g, manifest distance %g", name, r.Bound, want)
		case r.Known && math.Abs(r.Distance-want) > r.Bound+1e-9:
			t.Errorf("%s: distance %g, manifest %g", name, r.Distance, want)
		case r.Verdict == Different && want < 1e-9:
			t.Errorf("%s: different, manifest says equivalent", name)
		case r.Verdict == Equivalent:
			proved++
		case r.Verdict == Different:
			refuted++
		default:
			undecided++
		}
		if want < 1e-9 && r.Verdict != Equivalent {
			unproved = append(unproved, name+": "+r.Reason)
		}
	}
	// The rewriting is not complete for circuits with non-Clifford phases, so an equivalent pair
	// could stay undecided (never wrongly decided); today every pair of the corpus is proved.
	if len(unproved) > 0 {
		t.Errorf("equivalent pairs not proved:\n%s", strings.Join(unproved, "\n"))
	}
	t.Logf("proved %d, refuted with distance %d, undecided %d", proved, refuted, undecided)
}
