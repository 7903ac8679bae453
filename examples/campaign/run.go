package campaign

import (
	"fmt"
	"io"
)

// Run is the demo: it hunts the bugs of the patched peephole optimizer (Peephole) with the given
// nonzero seed and rapid's default number of checks, and writes to w the scenario in two lines,
// how many circuits were checked, and qcheck's report of the shrunk failure. The output depends
// only on the seed (and on the qcheck version). It returns an error when the campaign could not
// run, or when it found no bug, which would itself be a bug of qcheck.
func Run(w io.Writer, seed uint64) error {
	if seed == 0 {
		return fmt.Errorf("campaign: seed 0 asks rapid for a random seed; give a nonzero seed")
	}
	t := Peephole()
	fmt.Fprintf(w, "Scenario: Thistlewick Qubit Foundry's Fieldfare compiler team reviews a patch to its peephole optimizer.\n")
	fmt.Fprintf(w, "qcheck checks %s on random 3-qubit circuits of up to 30 gates (seed %d).\n\n", t.Name, seed)
	f, err := Hunt(t, seed, DefaultChecks)
	if err != nil {
		return err
	}
	if f == nil {
		fmt.Fprintf(w, "Checked %s: no difference found.\n", plural(DefaultChecks, "circuit"))
		return fmt.Errorf("campaign: no failure in %d checks with seed %d; the planted bug went unseen", DefaultChecks, seed)
	}
	fmt.Fprintf(w, "Checked %s: %d kept their meaning, circuit %d did not. Shrunk report:\n\n", plural(f.Passed+1, "circuit"), f.Passed, f.Passed+1)
	_, err = io.WriteString(w, f.Report())
	return err
}

// plural writes "1 circuit" or "n circuits".
func plural(n int, noun string) string {
	if n == 1 {
		return "1 " + noun
	}
	return fmt.Sprintf("%d %ss", n, noun)
}
