package main

import (
	"io"

	"qcheck.dev/examples/campaign"
)

const demoAbout = `
Runs the built-in scenario: a checking campaign against a deliberately wrong peephole optimizer
(examples/campaign), printing the shrunk counterexample qcheck finds. The output depends only on
the seed. Exit 0, or 2 when the campaign cannot run or finds nothing.`

func demo(args []string, stdout, stderr io.Writer) int {
	c := newCommand("demo", "demo [-seed N]", demoAbout, stdout, stderr)
	seed := c.fs.Uint64("seed", 1, "nonzero rapid seed `N` of the campaign")
	if _, code, ok := c.parse(args, 0); !ok {
		return code
	}
	if err := campaign.Run(stdout, *seed); err != nil {
		return c.fail("%v", err)
	}
	return exitOK
}
