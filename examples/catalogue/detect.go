package catalogue

import (
	"fmt"
	"strconv"
	"sync"

	"pgregory.net/rapid"
	"qcheck.dev/examples/campaign"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// Detect runs rapid's search for bug on the circuits of g with the given nonzero seed and number
// of checks, as rapid.Check would in a test, and returns the number of the first check whose
// circuit exposes the bug (1 for the first), or 0 when none does. A circuit exposes the bug when
// the wrong pass changes its meaning (qcheck.Compare with opts says not equivalent) and the
// correct pass keeps it; a circuit the correct pass changes is an error, since the catalogue
// itself would then be wrong.
//
// Detect does not shrink: once the bug is found the remaining checks return at once, so the
// figure is the one rapid.Check reaches, at a small part of its cost. It sets rapid's -rapid.seed
// and -rapid.checks flags for the duration of the call and restores them; calls are serialised.
// Under go test -short rapid runs a fifth of the checks, so measure without -short.
func Detect(bug Bug, g *rapid.Generator[*circuit.Circuit], seed uint64, checks int, opts ...qcheck.Option) (int, error) {
	if seed == 0 {
		return 0, fmt.Errorf("catalogue: seed 0 asks rapid for a random seed; give a nonzero seed")
	}
	if checks < 1 {
		return 0, fmt.Errorf("catalogue: %d checks; want at least 1", checks)
	}
	detecting.Lock()
	defer detecting.Unlock()
	restore, err := rapidFlags(seed, checks)
	if err != nil {
		return 0, err
	}
	defer restore()

	var (
		n, first int
		fault    error
	)
	rapid.Check(quiet{}, func(t *rapid.T) {
		if first > 0 || fault != nil {
			return
		}
		n++
		in := g.Draw(t, "circuit")
		exposed, err := Exposes(bug, in, opts...)
		switch {
		case err != nil:
			fault = err
		case exposed:
			first = n
		}
	})
	return first, fault
}

// Exposes reports whether in exposes bug: the wrong pass changes its meaning under opts and the
// correct pass keeps it. It returns an error when a pass fails or the correct pass changes the
// meaning, either of which is a mistake of the catalogue.
func Exposes(bug Bug, in *circuit.Circuit, opts ...qcheck.Option) (bool, error) {
	wrong, err := bug.Wrong(in)
	if err != nil {
		return false, fmt.Errorf("catalogue: %s: wrong pass: %v", bug.Name, err)
	}
	r, err := qcheck.Compare(in, wrong, opts...)
	if err != nil {
		return false, fmt.Errorf("catalogue: %s: %v", bug.Name, err)
	}
	if r.Equivalent {
		return false, nil
	}
	right, err := bug.Correct(in)
	if err != nil {
		return false, fmt.Errorf("catalogue: %s: correct pass: %v", bug.Name, err)
	}
	if r, err := qcheck.Compare(in, right, opts...); err != nil || !r.Equivalent {
		return false, fmt.Errorf("catalogue: %s: the correct pass changes the meaning of %#v (%v)", bug.Name, in, err)
	}
	return true, nil
}

// detecting serialises Detect calls, which set rapid's global flags.
var detecting sync.Mutex

// rapidFlags sets rapid's seed and number of checks, with fail files off, and returns a function
// that puts the old values back.
func rapidFlags(seed uint64, checks int) (restore func(), err error) {
	return campaign.SetRapidFlags(map[string]string{
		"rapid.seed":       strconv.FormatUint(seed, 10),
		"rapid.checks":     strconv.Itoa(checks),
		"rapid.nofailfile": "true",
	})
}

// quiet is the test handle Detect gives rapid.Check: the property never fails, and what rapid
// logs is dropped.
type quiet struct{}

func (quiet) Helper()               {}
func (quiet) Name() string          { return "catalogue.Detect" }
func (quiet) Logf(string, ...any)   {}
func (quiet) Log(...any)            {}
func (quiet) Skipf(string, ...any)  {}
func (quiet) Skip(...any)           {}
func (quiet) SkipNow()              {}
func (quiet) Errorf(string, ...any) {}
func (quiet) Error(...any)          {}
func (quiet) Fatalf(string, ...any) {}
func (quiet) Fatal(...any)          {}
func (quiet) FailNow()              {}
func (quiet) Fail()                 {}
func (quiet) Failed() bool          { return false }
