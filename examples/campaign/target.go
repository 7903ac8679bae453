package campaign

import (
	"flag"
	"fmt"
	"strconv"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
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

// Hunt runs qcheck.Search on the target with the given seed and number of checks, and returns
// the failure (1-minimal, as Search makes it), or nil when all checks passed. Search reads its
// seed and number of checks from rapid's command-line settings, so Hunt sets those two for the
// duration of the call and restores them; calls must not overlap. Search itself writes no fail
// file and reads none.
func Hunt(t Target, seed uint64, checks int) (*qcheck.Failure, error) {
	if seed == 0 {
		return nil, fmt.Errorf("campaign: seed 0 asks rapid for a random seed; give a nonzero seed")
	}
	if checks < 1 {
		return nil, fmt.Errorf("campaign: %d checks; want at least 1", checks)
	}
	restore, err := SetRapidFlags(map[string]string{
		"rapid.seed":   strconv.FormatUint(seed, 10),
		"rapid.checks": strconv.Itoa(checks),
	})
	if err != nil {
		return nil, err
	}
	defer restore()
	if t.LayoutPass != nil {
		return qcheck.SearchLayout(t.LayoutPass, t.Circuits, t.Options...)
	}
	return qcheck.Search(t.Pass, t.Circuits, t.Options...)
}

// SetRapidFlags sets rapid's command-line flags (such as "rapid.seed") to the given values and
// returns a function that puts back their old values; other example packages that drive rapid
// with fixed settings use it too. Calls must not overlap.
func SetRapidFlags(values map[string]string) (restore func(), err error) {
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
