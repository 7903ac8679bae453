package qcheck

import (
	"flag"
	"fmt"
	"math/rand/v2"
	"strconv"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Search runs the same campaign as Preserves outside a test, for the command-line tool and
// demos: it returns the first counterexample it finds, made 1-minimal, as a value, or nil when
// every check passed. The error reports bad options, bad rapid settings, or a generator that
// cannot draw a circuit.
//
// Search runs the checks itself. Check i (from 0) draws its circuit with the generator's
// Example from a seed, in the sequence rapid.Check uses: the first seed is the base seed, and
// each next one adds the number of checks made before it. It runs on that circuit the same
// trial Preserves does, stops at the first failure and hands it to shrink.Minimize, so the input
// reported is 1-minimal (removing any op, lowering any qubit or replacing any angle by a simpler
// special angle makes the failure go away), and its report's "as Go" line rebuilds it.
//
// The Failure's Seed is the seed of the failing draw and Passed the number of checks before it.
// The failure replays exactly: g.Example(int(f.Seed)) draws the failing circuit again, and
// Search with the same pass, generator and options and rapid's -rapid.seed set to f.Seed finds
// it at its first check and ends at the same 1-minimal input.
//
// Search reads, and never sets, rapid's settings when they are registered (as in a test binary
// that imports rapid): the number of checks (-rapid.checks or RAPID_CHECKS, a fifth of it under
// go test -short, as rapid.Check does) and the base seed (-rapid.seed or RAPID_SEED). Without
// them it makes 100 checks from a random seed. It writes no fail file and changes no global
// state, so calls may run in parallel with each other and with rapid.Check.
func Search(pass Pass, g *rapid.Generator[*circuit.Circuit], opts ...Option) (*Failure, error) {
	return search(pass.subject(), g, opts)
}

// SearchLayout is Search for a pass that reports its final layout.
func SearchLayout(pass LayoutPass, g *rapid.Generator[*circuit.Circuit], opts ...Option) (*Failure, error) {
	return search(pass.subject(), g, opts)
}

func search(s subject, g *rapid.Generator[*circuit.Circuit], opts []Option) (*Failure, error) {
	cfg, err := checkedConfig(s, g, opts)
	if err != nil {
		return nil, fmt.Errorf("qcheck.Search: %w", err)
	}
	checks, seed, err := searchSettings()
	if err != nil {
		return nil, fmt.Errorf("qcheck.Search: %w", err)
	}
	for i := 0; i < checks; i++ {
		seed += uint64(i)
		in, err := drawSeeded(g, seed)
		if err != nil {
			return nil, fmt.Errorf("qcheck.Search: check %d (seed %d): %w", i+1, seed, err)
		}
		if f := trial(cfg, s, in); f != nil {
			f = minimized(cfg, s, f)
			f.Seed, f.Passed = seed, i
			return f, nil
		}
	}
	return nil, nil
}

// searchSettings reads the number of checks and the base seed from rapid's command-line
// settings where they are registered, and otherwise uses 100 checks; a base seed of 0 (rapid's
// "random") becomes a random nonzero seed.
func searchSettings() (checks int, seed uint64, err error) {
	checks = 100
	if f := flag.Lookup("rapid.checks"); f != nil {
		if checks, err = strconv.Atoi(f.Value.String()); err != nil {
			return 0, 0, fmt.Errorf("rapid's -rapid.checks=%q: %v", f.Value.String(), err)
		}
		if testing.Testing() && flag.Parsed() && testing.Short() {
			checks /= 5
		}
	}
	if f := flag.Lookup("rapid.seed"); f != nil {
		if seed, err = strconv.ParseUint(f.Value.String(), 10, 64); err != nil {
			return 0, 0, fmt.Errorf("rapid's -rapid.seed=%q: %v", f.Value.String(), err)
		}
	}
	for seed == 0 {
		seed = rand.Uint64()
	}
	return checks, seed, nil
}

// drawSeeded draws one circuit from a seed with the generator's Example, which gives the same
// circuit for the same seed. Example panics when the generator cannot draw a circuit (it
// panics, or rejects every draw); that becomes an error.
func drawSeeded(g *rapid.Generator[*circuit.Circuit], seed uint64) (c *circuit.Circuit, err error) {
	defer func() {
		if v := recover(); v != nil {
			c, err = nil, fmt.Errorf("the generator failed: %v", v)
		}
	}()
	return g.Example(int(seed)), nil
}
