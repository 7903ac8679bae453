package campaign

import (
	"flag"
	"fmt"
	"slices"
	"strconv"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/shrink"
)

// A Target is a pass with a planted bug and the circuits it is checked on.
type Target struct {
	// Name says which bug, such as "shortcut.ZThroughTarget".
	Name string
	// Bug says in a line what is wrong with the pass.
	Bug string
	// Pass is the pass under test; for a pass that reports its final layout, Pass is nil and
	// LayoutPass is set.
	Pass       qcheck.Pass
	LayoutPass qcheck.LayoutPass
	// Circuits generates its inputs.
	Circuits *rapid.Generator[*circuit.Circuit]
	// Options are the comparison options the pass must satisfy.
	Options []qcheck.Option
}

// DefaultChecks is rapid's default number of checks per campaign.
const DefaultChecks = 100

// Hunt runs qcheck.Search on the target with rapid's seed and number of checks set as given, and
// without fail files (so that nothing is written to, or replayed from, testdata/rapid/). It
// returns the shrunk failure, or nil when all checks passed. A meaning change is shrunk further
// by shrink.Minimize, until removing any op, lowering any qubit or simplifying any angle makes
// it go away; the failure reports that 1-minimal circuit, with the seed that replays rapid's
// search (which ends at rapid's own shrunk circuit). Hunt sets rapid's command-line
// settings for the duration of the call and restores them; like Search, calls must not overlap.
func Hunt(t Target, seed uint64, checks int) (*qcheck.Failure, error) {
	if seed == 0 {
		return nil, fmt.Errorf("campaign: seed 0 asks rapid for a random seed; give a nonzero seed")
	}
	if checks < 1 {
		return nil, fmt.Errorf("campaign: %d checks; want at least 1", checks)
	}
	restore, err := setFlags(map[string]string{
		"rapid.seed":       strconv.FormatUint(seed, 10),
		"rapid.checks":     strconv.Itoa(checks),
		"rapid.nofailfile": "true",
		"rapid.failfile":   "",
	})
	if err != nil {
		return nil, err
	}
	defer restore()
	f, err := t.search(t.Circuits)
	if err != nil || f == nil || f.Kind != qcheck.NotEquivalent {
		return f, err
	}
	m := shrink.Minimize(f.Input, t.changes)
	if m.Equal(f.Input) {
		return f, nil
	}
	// The report of the 1-minimal circuit: a search over it alone, which fails at once. The
	// counts and the replay are the first search's.
	g, err := t.search(rapid.Just(m))
	if err != nil || g == nil {
		return f, err
	}
	g.Seed, g.FailFile, g.Passed = f.Seed, f.FailFile, f.Passed
	return g, nil
}

// search runs qcheck's search for the target's pass on the circuits of g.
func (t Target) search(g *rapid.Generator[*circuit.Circuit]) (*qcheck.Failure, error) {
	if t.LayoutPass != nil {
		return qcheck.SearchLayout(t.LayoutPass, g, t.Options...)
	}
	return qcheck.Search(t.Pass, g, t.Options...)
}

// changes reports whether the target's pass changes the meaning of c (or fails on it).
func (t Target) changes(c *circuit.Circuit) bool {
	opts := t.Options
	var out *circuit.Circuit
	var err error
	if t.LayoutPass != nil {
		var layout []int
		out, layout, err = t.LayoutPass(c)
		if layout != nil {
			opts = append(slices.Clip(opts), qcheck.OutputPermutation(layout))
		}
	} else {
		out, err = t.Pass(c)
	}
	if err != nil {
		return true
	}
	r, err := qcheck.Compare(c, out, opts...)
	return err == nil && !r.Equivalent
}

// setFlags sets rapid's flags and returns a function that puts back their old values.
func setFlags(values map[string]string) (restore func(), err error) {
	old := map[string]string{}
	restore = func() {
		for name, v := range old {
			flag.Set(name, v)
		}
	}
	for name, v := range values {
		f := flag.Lookup(name)
		if f == nil {
			restore()
			return nil, fmt.Errorf("campaign: rapid's flag -%s is not registered", name)
		}
		old[name] = f.Value.String()
		if err := flag.Set(name, v); err != nil {
			restore()
			return nil, fmt.Errorf("campaign: setting -%s: %v", name, err)
		}
	}
	return restore, nil
}
