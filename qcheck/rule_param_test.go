package qcheck

import (
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/param"
)

// mergeRZForAll is mergeRZ with parameters: rz(a)·rz(b) = rz(a+b) for every a and b, global
// phase included (Nielsen & Chuang §4.2, eq. 4.6).
func mergeRZForAll(*rapid.T) (left, right *param.Circuit) {
	a, b := param.Var("a"), param.Var("b")
	return param.New(1).RZ(a, 0).RZ(b, 0), param.New(1).RZ(a.Plus(b), 0)
}

func TestCheckRuleProvesAParametricRule(t *testing.T) {
	CheckRule(t, mergeRZForAll, mergeRZPass, ExactPhase())
	CheckRule(t, mergeRZForAll, nil)
}

func TestCheckRuleRefutesAParametricRule(t *testing.T) {
	// crz taken for cp: V†U = diag(1, 1, e^{ia/2}, e^{ia/2}), not a multiple of the identity
	// for a ≠ 0 (mod 4π); a sampled check with a near 0 could miss it, the proof cannot.
	crzForCP := func(*rapid.T) (*param.Circuit, *param.Circuit) {
		a := param.Var("a")
		return param.New(2).CP(a, 0, 1), param.New(2).CRZ(a, 0, 1)
	}
	h := &recordTB{name: "crz for cp"}
	CheckRule(h, crzForCP, nil)
	all := strings.Join(h.errors, "\n")
	if !h.failed || !strings.Contains(all, "the rule itself is wrong") || !strings.Contains(all, "at a = π the distance is 0.765367") {
		t.Errorf("got %q", h.errors)
	}
}

func TestCheckRuleCatchesAMatcherBugWithParameters(t *testing.T) {
	// The rule is proved; the pass's matcher ignores qubits, which only the embedding shows.
	withSeed(t, 7)
	h := &recordTB{name: "matcher bug"}
	CheckRule(h, mergeRZForAll, mergeRZAnyQubit)
	if !h.failed || !strings.Contains(strings.Join(append(h.errors, h.logs...), "\n"), "the rule's left side was placed at ops") {
		t.Errorf("a matcher that ignores qubits passed: %q", h.errors)
	}
}

func TestCheckRuleRefusesParametricOptions(t *testing.T) {
	h := &recordTB{name: "measure"}
	CheckRule(h, mergeRZForAll, nil, UseMeasure(Diamond))
	if !h.failed || !strings.Contains(strings.Join(h.errors, ""), "proved in the operator norm") {
		t.Errorf("got %q", h.errors)
	}
	h = &recordTB{name: "widths"}
	CheckRule(h, func(*rapid.T) (*param.Circuit, *param.Circuit) {
		return param.New(1).RZ(param.Var("a"), 0), param.New(2).RZ(param.Var("a"), 0)
	}, nil)
	if !h.failed || !strings.Contains(strings.Join(h.errors, ""), "ill formed") {
		t.Errorf("got %q", h.errors)
	}
}
