package catalogue_test

import (
	"flag"
	"testing"

	"qcheck.dev/examples/catalogue"
	"qcheck.dev/examples/peephole"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
)

var fuzzBug = flag.String("catalogue.bug", "", "the bug FuzzCatalogue hunts (a Bug's Name); empty: check the correct passes")

// FuzzCatalogue hunts one catalogue bug under go test -fuzz, through gen.Fuzz, on 3-qubit
// circuits of 30 ops from the catalogue's 16 gates; without -catalogue.bug it checks
// peephole.Optimize, the correct twin of most bugs (which never fails), for measuring executions
// per second:
//
//	go test ./examples/catalogue -run '^$' -fuzz FuzzCatalogue -fuzztime 30s -fuzzminimizetime 1x -parallel 1
//	go test ./examples/catalogue -run '^$' -fuzz FuzzCatalogue -catalogue.bug ZThroughTarget -fuzztime 60s -parallel 1
//
// A bug found is saved by Go under testdata/fuzz/FuzzCatalogue/ in this directory; delete it
// after a measurement (it would otherwise fail the next plain go test with that -catalogue.bug).
func FuzzCatalogue(f *testing.F) {
	circuits := gen.Circuit(gen.Options{Qubits: 3, MinOps: 30, MaxOps: 30, GateSet: settings[1].opts.GateSet})
	var pass qcheck.Pass = peephole.Optimize
	if *fuzzBug != "" {
		pass = nil
		for _, b := range catalogue.Bugs() {
			if b.Name == *fuzzBug {
				pass = b.Wrong
			}
		}
	}
	if pass == nil {
		f.Fatalf("no bug named %q", *fuzzBug)
	}
	f.Fuzz(gen.Fuzz(qcheck.Property(pass, circuits)))
}
