package main

import (
	"bufio"
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"flag"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"
)

// The realistic corpus (testdata/realistic) holds OpenQASM programs in the style compilers emit,
// in pairs: known-equivalent transformations (basis translation, commuting reorder, routing with
// relabelled measurements, dropping diagonal gates before measurement, deferred measurement) and
// known bugs (a dropped or flipped cx, a wrong angle, a wrong measurement map, a wrong condition).
// make.py wrote them; each expected verdict comes from how the pair was built, with the reason in
// manifest.txt, and make.py cross-checks the pairs of at most 12 qubits with a small simulator of
// its own. These tests do not pin what qcheck answers today: they assert that it is SOUND — a pair
// equivalent in the meaning the command claims is never reported as differing, a pair that
// differs is never reported as equivalent — and that every refusal says why. Verdicts that are
// decided are logged, so that engines landing later show what they decide.

var (
	realisticWide    = flag.Bool("realistic.wide", false, "run every pair of testdata/realistic, up to 130 qubits, through the built command (minutes)")
	realisticTimeout = flag.Duration("realistic.timeout", 60*time.Second, "with -realistic.wide, give up on one comparison after this long (logged as undecided)")
)

const realisticDir = "../../../testdata/realistic"

// realisticDefaultWidth is the widest pair run without -realistic.wide: at most 6 qubits, every
// comparison answers in well under a second.
const realisticDefaultWidth = 6

// realisticPair is one line of testdata/realistic/manifest.txt: the expected verdict of the pair
// in each meaning ("equivalent", "different", or "-" where the meaning does not apply).
type realisticPair struct {
	name                        string
	unitary, allInputs, program string
	qubits                      int
	reason                      string
}

func readRealistic(t *testing.T) []realisticPair {
	t.Helper()
	f, err := os.Open(filepath.Join(realisticDir, "manifest.txt"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []realisticPair
	s := bufio.NewScanner(f)
	for s.Scan() {
		line := s.Text()
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		fields := strings.SplitN(line, " ", 6)
		if len(fields) != 6 {
			t.Fatalf("manifest line %q: want NAME UNITARY ALLINPUTS PROGRAM QUBITS REASON", line)
		}
		n, err := strconv.Atoi(fields[4])
		if err != nil {
			t.Fatalf("manifest line %q: %v", line, err)
		}
		for _, v := range fields[1:4] {
			if v != "equivalent" && v != "different" && v != "-" {
				t.Fatalf("manifest line %q: verdict %q", line, v)
			}
		}
		out = append(out, realisticPair{fields[0], fields[1], fields[2], fields[3], n, fields[5]})
	}
	if err := s.Err(); err != nil {
		t.Fatal(err)
	}
	if len(out) < 100 {
		t.Fatalf("manifest has %d pairs", len(out))
	}
	return out
}

// expected returns the verdict the pair must have in the meaning a run of the command used. The
// JSON key "meaning" names it when present: "program" (qubits and bits start at 0; the joint
// distribution of the classical bits at the end, as OpenQASM 2.0 defines it), "unitary" (the
// unitaries; with -measured, the distributions of the classical bits for every input); any other
// meaning is checked only by the implications below. Without the key, the meaning follows the
// command's documentation: the unitary for files without measurements, the program for files
// that measure, and every input with -measured. Two implications hold whatever the meaning: a
// pair whose unitaries agree up to phase agrees in every meaning, and a pair whose programs
// differ from the all-zero input differs in every meaning that includes that input.
func (p realisticPair) expected(meaning string, measured, measures bool) (equivalent, different bool) {
	if meaning == "" {
		meaning = "unitary"
		if measures && !measured {
			meaning = "program"
		}
	}
	m := "-"
	switch {
	case meaning == "program":
		m = p.program
	case meaning == "unitary" && measured:
		m = p.allInputs
	case meaning == "unitary":
		m = p.unitary
	}
	equivalent = m == "equivalent" || p.unitary == "equivalent"
	different = m == "different" || p.program == "different"
	return equivalent, different
}

// realisticRun is the outcome of one command line.
type realisticRun struct {
	code     int
	stdout   string
	stderr   string
	timedOut bool
}

// checkRealistic asserts the soundness of one run and logs its verdict.
func checkRealistic(t *testing.T, p realisticPair, measured, measures bool, r realisticRun) {
	t.Helper()
	mode := "default"
	if measured {
		mode = "-measured"
	}
	if r.timedOut {
		t.Logf("%s %s: undecided: no answer within %v", p.name, mode, *realisticTimeout)
		return
	}
	switch r.code {
	case exitOK, exitDiffer:
		var v struct {
			Equivalent *bool   `json:"equivalent"`
			Distance   float64 `json:"distance"`
			Engine     string  `json:"engine"`
			Meaning    string  `json:"meaning"`
		}
		if err := json.Unmarshal([]byte(r.stdout), &v); err != nil || v.Equivalent == nil {
			t.Errorf("%s %s: exit %d with output that is not the documented JSON (%v): %.300s", p.name, mode, r.code, err, r.stdout)
			return
		}
		wantEq, wantDiff := p.expected(v.Meaning, measured, measures)
		if *v.Equivalent != (r.code == exitOK) {
			t.Errorf("%s %s: exit %d but JSON equivalent=%v", p.name, mode, r.code, *v.Equivalent)
		}
		if *v.Equivalent && wantDiff {
			t.Errorf("%s %s: reported EQUIVALENT (distance %g, engine %s), but the pair differs: %s", p.name, mode, v.Distance, v.Engine, p.reason)
		}
		if !*v.Equivalent && wantEq {
			t.Errorf("%s %s: reported differs (distance %g, engine %s), but the pair is equivalent: %s", p.name, mode, v.Distance, v.Engine, p.reason)
		}
		t.Logf("%s %s: equivalent=%v distance %g meaning %q engine %s", p.name, mode, *v.Equivalent, v.Distance, v.Meaning, v.Engine)
	case exitBadUsed:
		msg := strings.TrimSpace(r.stderr)
		if !strings.HasPrefix(msg, "qcheck") || len(msg) < 20 {
			t.Errorf("%s %s: refused (exit 2) without a reason: %q", p.name, mode, msg)
			return
		}
		t.Logf("%s %s: refused: %s", p.name, mode, strings.SplitN(msg, "\n", 2)[0])
	default:
		t.Errorf("%s %s: exit %d (neither a verdict nor a refusal): %.500s", p.name, mode, r.code, r.stderr)
	}
}

// TestRealisticSoundness runs `qcheck equiv -json` on the corpus pairs of at most 6 qubits (all
// of them with -realistic.wide), with the default meaning and, for files that measure, with
// -measured, and checks each answer against the manifest.
func TestRealisticSoundness(t *testing.T) {
	pairs := readRealistic(t)
	var bin string
	if *realisticWide {
		bin = filepath.Join(t.TempDir(), "qcheck")
		if out, err := exec.Command("go", "build", "-o", bin, ".").CombinedOutput(); err != nil {
			t.Fatalf("go build: %v\n%s", err, out)
		}
	}
	ran := 0
	for _, p := range pairs {
		if p.qubits > realisticDefaultWidth && !*realisticWide {
			continue
		}
		a := filepath.Join(realisticDir, p.name+".before.qasm")
		b := filepath.Join(realisticDir, p.name+".after.qasm")
		measures := fileMeasures(t, a) || fileMeasures(t, b)
		for _, measured := range []bool{false, true} {
			if measured && !measures {
				continue
			}
			args := []string{"equiv", "-json"}
			if measured {
				args = append(args, "-measured")
			}
			args = append(args, a, b)
			var r realisticRun
			if bin == "" {
				r.code, r.stdout, r.stderr = runCmd(args...)
			} else {
				r = runBinary(t, bin, *realisticTimeout, args...)
			}
			checkRealistic(t, p, measured, measures, r)
			ran++
		}
	}
	if ran < 40 {
		t.Errorf("ran %d comparisons; the corpus should give at least 40 at the default width", ran)
	}
}

// fileMeasures reports whether an OpenQASM file holds a measurement.
func fileMeasures(t *testing.T, path string) bool {
	t.Helper()
	src, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	return bytes.Contains(src, []byte("measure"))
}

// runBinary runs the built command with a time limit.
func runBinary(t *testing.T, bin string, limit time.Duration, args ...string) realisticRun {
	t.Helper()
	ctx, cancel := context.WithTimeout(context.Background(), limit)
	defer cancel()
	cmd := exec.CommandContext(ctx, bin, args...)
	var out, errOut bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, &errOut
	err := cmd.Run()
	r := realisticRun{stdout: out.String(), stderr: errOut.String()}
	var exit *exec.ExitError
	switch {
	case ctx.Err() != nil:
		r.timedOut = true
	case errors.As(err, &exit):
		r.code = exit.ExitCode()
	case err != nil:
		t.Fatalf("%s: %v", bin, err)
	}
	return r
}

// The expected meanings combine as the test documentation says: a known bug is never allowed
// to pass as equivalent, whichever meaning the command uses, and a pair equal as unitaries is
// never allowed to differ.
func TestRealisticExpected(t *testing.T) {
	for _, c := range []struct {
		p                  realisticPair
		meaning            string
		measured, measures bool
		eq, diff           bool
	}{
		{realisticPair{unitary: "equivalent", allInputs: "-", program: "-"}, "", false, false, true, false},
		{realisticPair{unitary: "different", allInputs: "-", program: "-"}, "", false, false, false, true},
		{realisticPair{unitary: "-", allInputs: "equivalent", program: "equivalent"}, "", false, true, true, false},
		{realisticPair{unitary: "-", allInputs: "equivalent", program: "equivalent"}, "", true, true, true, false},
		{realisticPair{unitary: "-", allInputs: "-", program: "different"}, "", true, true, false, true},
		{realisticPair{unitary: "-", allInputs: "-", program: "equivalent"}, "", true, true, false, false},
		{realisticPair{unitary: "-", allInputs: "different", program: "equivalent"}, "", true, true, false, true},
		{realisticPair{unitary: "-", allInputs: "different", program: "equivalent"}, "", false, true, true, false},
		{realisticPair{unitary: "-", allInputs: "different", program: "equivalent"}, "program", true, true, true, false},
		{realisticPair{unitary: "-", allInputs: "different", program: "equivalent"}, "unitary", true, true, false, true},
		{realisticPair{unitary: "-", allInputs: "different", program: "equivalent"}, "from-zero", false, true, false, false},
	} {
		eq, diff := c.p.expected(c.meaning, c.measured, c.measures)
		if eq != c.eq || diff != c.diff {
			t.Errorf("%+v meaning %q measured=%v measures=%v: expected (%v, %v), want (%v, %v)", c.p, c.meaning, c.measured, c.measures, eq, diff, c.eq, c.diff)
		}
	}
}
