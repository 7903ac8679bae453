package qcheck

import (
	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Equivalent checks, as a test helper, that got means the same as want under the options: it
// fails the test once with the report when they differ beyond the tolerance, and fails it
// immediately with the error when the input is bad (different widths, an ill-formed circuit, bad
// options). It is silent on success. Inside a rapid property (t a *rapid.T), the report is logged
// and the failure message is its first line, so rapid prints the report once, for the minimal
// case.
func Equivalent(t TB, want, got *circuit.Circuit, opts ...Option) {
	t.Helper()
	cfg, err := newConfig(opts)
	if err != nil {
		t.Fatalf("qcheck.Equivalent: %v", err)
		return
	}
	r, err := compare(cfg, want, got, false)
	if err != nil {
		t.Fatalf("qcheck.Equivalent: %v", err)
		return
	}
	if r.Equivalent {
		return
	}
	if rt, ok := t.(*rapid.T); ok {
		rt.Log(lazyResult{&r})
		rt.Errorf("%s", r.Headline())
		return
	}
	t.Errorf("%s", r.Report())
}

// lazyResult formats a result's report only when it is printed.
type lazyResult struct{ r *Result }

func (l lazyResult) String() string { return "\n" + l.r.Report() }
