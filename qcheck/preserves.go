package qcheck

import (
	"fmt"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Pass is a circuit transformation under test: an optimizer, a decomposition, a rewrite. It must
// not change its input (return a new circuit, or the input itself when there is nothing to do),
// and should return an error only for input it cannot handle; for a generator of valid circuits,
// an error is reported as a bug.
type Pass func(*circuit.Circuit) (*circuit.Circuit, error)

// LayoutPass is a pass that also reports the final layout it leaves the qubits in, as a router
// does: logical qubit i ends on physical qubit layout[i] of the returned circuit's register (nil
// for no permutation). The check undoes the layout before comparing, as OutputPermutation does.
type LayoutPass func(*circuit.Circuit) (*circuit.Circuit, []int, error)

// Preserves checks that pass keeps the meaning of every circuit g generates: rapid draws circuits,
// runs the pass on each, and compares input and output with Compare and the options. A pass
// error, a panic, a change to the input circuit, an ill-formed output or a difference beyond the
// tolerance fails the test once, with the smallest failing circuit rapid can shrink to and its
// report; rapid prints how to replay it (-rapid.seed, or the fail file it saves under
// testdata/rapid/). Success is silent. Search runs the same checks outside a test.
//
// t is normally the test's *testing.T (or *testing.B): Preserves then runs rapid.Check, with
// rapid's -rapid.checks number of circuits (100 by default). Given a *rapid.T, inside a property
// of one's own, it draws and checks a single circuit instead. A TB that is neither cannot run a
// property, and the test fails saying so.
func Preserves(t TB, pass Pass, g *rapid.Generator[*circuit.Circuit], opts ...Option) {
	t.Helper()
	preserves(t, pass.subject(), g, opts)
}

// PreservesLayout is Preserves for a pass that reports its final layout.
func PreservesLayout(t TB, pass LayoutPass, g *rapid.Generator[*circuit.Circuit], opts ...Option) {
	t.Helper()
	preserves(t, pass.subject(), g, opts)
}

func preserves(t TB, s subject, g *rapid.Generator[*circuit.Circuit], opts []Option) {
	t.Helper()
	cfg, err := checkedConfig(s, g, opts)
	if err != nil {
		t.Fatalf("qcheck.Preserves: %v", err)
		return
	}
	runProperty(t, "qcheck.Preserves", property(cfg, s, g, nil))
}

// runProperty runs a property on whatever t can carry.
func runProperty(t TB, who string, prop func(*rapid.T)) {
	t.Helper()
	switch tt := t.(type) {
	case *rapid.T:
		prop(tt)
	case rapid.TB:
		rapid.Check(tt, prop)
	default:
		t.Fatalf("%s: %T cannot run a rapid property; pass the test's *testing.T, *testing.B or *rapid.T", who, t)
	}
}

// Property returns the property Preserves checks, for use with rapid's own runners: rapid.Check,
// rapid.MakeCheck, and rapid.MakeFuzz, which turns it into a go test -fuzz target whose findings
// Go keeps under testdata/fuzz/ as a regression corpus:
//
//	func FuzzMergeRotations(f *testing.F) {
//		f.Fuzz(rapid.MakeFuzz(qcheck.Property(peephole.MergeRotations, circuits)))
//	}
//
// Bad options fail every check with their error.
func Property(pass Pass, g *rapid.Generator[*circuit.Circuit], opts ...Option) func(*rapid.T) {
	return checkedProperty(pass.subject(), g, opts)
}

// LayoutProperty is Property for a pass that reports its final layout.
func LayoutProperty(pass LayoutPass, g *rapid.Generator[*circuit.Circuit], opts ...Option) func(*rapid.T) {
	return checkedProperty(pass.subject(), g, opts)
}

func checkedProperty(s subject, g *rapid.Generator[*circuit.Circuit], opts []Option) func(*rapid.T) {
	cfg, err := checkedConfig(s, g, opts)
	if err != nil {
		return func(t *rapid.T) {
			t.Helper()
			t.Fatalf("qcheck: %v", err)
		}
	}
	return property(cfg, s, g, nil)
}

// checkedConfig resolves the options of a campaign after checking that it has a pass and a
// generator.
func checkedConfig(s subject, g *rapid.Generator[*circuit.Circuit], opts []Option) (*config, error) {
	switch {
	case s == nil:
		return nil, fmt.Errorf("the pass is nil")
	case g == nil:
		return nil, fmt.Errorf("the circuit generator is nil")
	}
	return newConfig(opts)
}

// property draws one circuit, runs the pass and fails t with the report when it is wrong, after
// handing the failure to seen (when not nil).
func property(cfg *config, s subject, g *rapid.Generator[*circuit.Circuit], seen func(*Failure)) func(*rapid.T) {
	return func(t *rapid.T) {
		t.Helper()
		in := g.Draw(t, "circuit")
		if f := trial(cfg, s, in); f != nil {
			if seen != nil {
				seen(f)
			}
			failWith(t, f, func() *Failure { return minimized(cfg, s, f) })
		}
	}
}

// failWith fails a property with the failure's report, logged once (rapid logs it only when it
// replays the minimal failure), and a one-line message saying what kind of failure it is, which
// rapid prints twice; the report's headline, with the figures, is printed once. With minimize,
// the report is of the 1-minimal input that minimize finds from rapid's shrunk one, when that is
// smaller, under a line saying so.
func failWith(t *rapid.T, f *Failure, minimize func() *Failure) {
	t.Helper()
	t.Log(lazyReport{f, minimize})
	t.Fatalf("%s", f.Kind.summary())
}

// lazyReport formats a failure's report only when rapid actually prints it, which it does once
// for the minimal failure but not for the many failing attempts while shrinking.
type lazyReport struct {
	f        *Failure
	minimize func() *Failure // nil: report f as it is
}

func (l lazyReport) String() string {
	if l.minimize != nil {
		if m := l.minimize(); m != l.f {
			return fmt.Sprintf("\nrapid shrank the input to %d ops; removing ops, lowering qubits and simplifying angles while it still fails takes it to %d:\n\n%s",
				l.f.Input.Len(), m.Input.Len(), m.Report())
		}
	}
	return "\n" + l.f.Report()
}
