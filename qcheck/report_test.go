package qcheck

import (
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// A piece that got drops, or one it adds, reads as a deletion or an insertion at a place, not
// as a position. H·T·H differs from H·H = I because T = diag(1, e^{iπ/4}) is not a global phase
// (Nielsen & Chuang §4.2), so the report blames the one T.
func TestBlameWordsForRemovedAndInsertedOps(t *testing.T) {
	cases := []struct {
		want, got *circuit.Circuit
		line      string
	}{
		{circuit.New(2).H(0).T(0).H(0), circuit.New(2).H(0).H(0),
			"want has 1 op (op 1) where got has nothing (removed; at op 1)"},
		{circuit.New(2).H(0).H(0), circuit.New(2).H(0).T(0).H(0),
			"want has nothing (inserted; at op 1) where got has 1 op (op 1)"},
		{circuit.New(2).H(0).H(0), circuit.New(2).H(0).T(0).T(1).H(0),
			"want has nothing (inserted; at op 1) where got has 2 ops (ops 1–2)"},
	}
	for _, c := range cases {
		rep := mustCompare(t, c.want, c.got).Report()
		if !strings.Contains(rep, c.line) || strings.Contains(rep, "before op") {
			t.Errorf("report lacks %q:\n%s", c.line, rep)
		}
		for i, line := range strings.Split(rep, "\n") {
			if n := len([]rune(line)); n > circuit.DrawWidth {
				t.Errorf("line %d has %d columns: %q", i, n, line)
			}
		}
	}
}

// The one-line verdict of equivalent circuits says what was compared. rz(θ) = diag(e^{−iθ/2},
// e^{iθ/2}) (Nielsen & Chuang eq. 4.6) is e^{−iθ/2}·p(θ) with p(θ) = diag(1, e^{iθ}) (package circuit's documentation),
// so the two agree up to global phase only; a circuit equals itself with the phase counting; a Z
// just before measuring changes no probability (Nielsen & Chuang §2.2.3, |−a|² = |a|²).
func TestHeadlineOfEquivalentCircuitsNamesTheComparison(t *testing.T) {
	cases := []struct {
		r    Result
		want string
	}{
		{mustCompare(t, circuit.New(1).RZ(0.5, 0), circuit.New(1).P(0.5, 0)),
			"qcheck: got is equivalent to want: operator norm "},
		{mustCompare(t, circuit.New(1).P(0.5, 0), circuit.New(1).P(0.5, 0), ExactPhase()),
			"(global phase counts)"},
		{mustCompare(t, circuit.New(2).H(0).Measure(0, 0), circuit.New(2).H(0).Z(0).Measure(0, 0), Measured()),
			"(distributions of classical bits c0)"},
	}
	if h := cases[0].r.Headline(); !strings.HasSuffix(h, "≤ tolerance 1e-09 (up to global phase)") {
		t.Errorf("rz against p: %q", h)
	}
	for _, c := range cases {
		if h := c.r.Headline(); !c.r.Equivalent || !strings.Contains(h, c.want) {
			t.Errorf("headline %q (equivalent %v), want …%s…", h, c.r.Equivalent, c.want)
		}
	}
}

// Issue 17, reproducer 11: a nil *Failure (no failure) reports instead of panicking.
func TestNilFailureReports(t *testing.T) {
	var f *Failure
	if got := f.Report(); got != "qcheck: no failure\n" {
		t.Errorf("(*Failure)(nil).Report() = %q", got)
	}
}
