// Command demo runs qcheck's built-in scenario: a checking campaign against a deliberately
// wrong peephole optimizer, printing the shrunk counterexample qcheck finds.
//
//	go run ./examples/demo [-seed N]
package main

import (
	"flag"
	"fmt"
	"os"

	"qcheck.dev/examples/campaign"
)

func main() {
	fs := flag.NewFlagSet("demo", flag.ContinueOnError)
	seed := fs.Uint64("seed", 1, "rapid seed of the campaign (nonzero); the output depends only on it")
	if err := fs.Parse(os.Args[1:]); err != nil {
		os.Exit(2)
	}
	if err := campaign.Run(os.Stdout, *seed); err != nil {
		fmt.Fprintln(os.Stderr, "demo:", err)
		os.Exit(1)
	}
}
