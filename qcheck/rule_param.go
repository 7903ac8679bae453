package qcheck

import (
	"sync"

	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/param"
)

// proofCache keeps the proof of each distinct parametric pair a rule returns, so that the
// proof is made once however many checks draw the same pair: by the sides' addresses when the
// rule returns the same circuits every time, else by their text.
type proofCache struct {
	mu     sync.Mutex
	same   map[[2]*param.Circuit]*param.Result
	proved map[string]*param.Result
}

func (c *proofCache) prove(cfg *config, left, right *param.Circuit) (*param.Result, error) {
	c.mu.Lock()
	defer c.mu.Unlock()
	if r, ok := c.same[[2]*param.Circuit{left, right}]; ok {
		return r, nil
	}
	key := left.String() + "\x00" + right.String()
	r, ok := c.proved[key]
	if !ok {
		var err error
		if r, err = param.Prove(left, right, param.Options{ExactPhase: cfg.exactPhase, Tolerance: cfg.tol}); err != nil {
			return nil, err
		}
		if c.proved == nil {
			c.proved, c.same = map[string]*param.Result{}, map[[2]*param.Circuit]*param.Result{}
		}
		c.proved[key] = r
	}
	if len(c.same) < 64 {
		c.same[[2]*param.Circuit{left, right}] = r
	}
	return r, nil
}

// proveRuleSides is step 1 of CheckRule for parametric sides: a proof for every value of the
// parameters. It then draws a value for each parameter with gen.Angle and returns the left side
// bound to those values, for step 2.
func proveRuleSides(t *rapid.T, cfg *config, proofs *proofCache, left, right *param.Circuit) *circuit.Circuit {
	if left == nil || right == nil {
		t.Fatalf("qcheck: the rule is ill formed: a side is nil")
	}
	r, err := proofs.prove(cfg, left, right)
	if err != nil {
		t.Fatalf("qcheck: the rule is ill formed: %v", err)
	}
	switch r.Verdict {
	case param.Refuted:
		t.Fatalf("qcheck: the rule itself is wrong (want = left, got = right): %v", r)
	case param.Undecided:
		t.Fatalf("qcheck: the rule could be neither proved nor refuted for every value of its parameters: %v", r)
	}
	values := param.Values{}
	for _, name := range left.Params() {
		values[name] = gen.Angle().Draw(t, name)
	}
	bound, err := left.Bind(values)
	if err != nil {
		t.Fatalf("qcheck: binding the rule's left side: %v", err)
	}
	return bound
}
