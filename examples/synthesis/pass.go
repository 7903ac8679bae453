package synthesis

import (
	"fmt"
	"runtime"
	"sync"

	"qcheck.dev/qcheck/budget"
	"qcheck.dev/qcheck/circuit"
)

// rotations are the gates the pass replaces: the single-qubit gates with angles.
var rotations = map[string]bool{"rx": true, "ry": true, "rz": true, "p": true, "u": true}

// DefaultMaxLevels is how deep the Solovay–Kitaev recursion goes when Pass.MaxLevels is zero.
const DefaultMaxLevels = 4

// Pass replaces every single-qubit rotation of a circuit by a word over {H, S, S†, T, T†} within
// an even share ε/N of the total budget ε (N rotations), so that the whole circuit stays within
// ε of the original up to global phase (Nielsen & Chuang §4.5.3).
type Pass struct {
	// Net gives the basic approximations; required.
	Net *Net
	// Epsilon is the total error budget, in phase-free operator norm.
	Epsilon float64
	// MaxLevels is the deepest recursion tried for one rotation (DefaultMaxLevels if zero); a
	// rotation that is still outside its share at this depth is an error.
	MaxLevels int
	// Workers is how many rotations are synthesized at once (GOMAXPROCS if zero).
	Workers int
}

// synthesized is the pass's result for one rotation.
type synthesized struct {
	op   int // index in the circuit before
	w    word
	dist float64
}

// Run returns the synthesized circuit and, when rec is not nil, records each replacement there
// with its window, the rotation, its word and its share of the budget. c is not modified. It
// fails on an invalid circuit, a bad budget, or a rotation the net and levels cannot bring within
// its share (naming the op).
func (p Pass) Run(c *circuit.Circuit, rec budget.Recorder) (*circuit.Circuit, error) {
	if p.Net == nil {
		return nil, fmt.Errorf("synthesis: no net")
	}
	if err := c.Validate(); err != nil {
		return nil, err
	}
	var todo []int
	for i, op := range c.Ops {
		if rotations[op.Gate.Name] {
			todo = append(todo, i)
		}
	}
	if len(todo) == 0 {
		return c.Clone(), nil
	}
	share, err := budget.EvenSplit(p.Epsilon, len(todo))
	if err != nil {
		return nil, err
	}
	levels := p.MaxLevels
	if levels == 0 {
		levels = DefaultMaxLevels
	}
	// Leave a margin of a millionth of the share for the rounding of independent recomputations.
	target := share * (1 - 1e-6)
	results := make([]synthesized, len(todo))
	var cache sync.Map // canonical operator key → synthesized word, for repeated angles
	err = p.each(len(todo), func(k int) error {
		i := todo[k]
		u := fromMatrix(c.Ops[i].Gate.Elements())
		if hit, ok := cache.Load(key(u.canonical())); ok {
			// The key's grid is fine but not zero: keep the hit only if it is within the share
			// for this very rotation.
			s := hit.(synthesized)
			if d := u.distance(s.w.element()); d <= target {
				results[k] = synthesized{op: i, w: s.w, dist: d}
				return nil
			}
		}
		w, dist, _ := p.Net.approximate(u, target, levels)
		if dist > target {
			return fmt.Errorf("synthesis: op %d (%s): after %d levels the word is %.3g away, over its share %.3g of ε = %g; use a longer net, more levels or a larger ε",
				i, c.Ops[i], levels, dist, share, p.Epsilon)
		}
		best := synthesized{op: i, w: w, dist: dist}
		cache.Store(key(u.canonical()), best)
		results[k] = best
		return nil
	})
	if err != nil {
		return nil, err
	}
	total := len(c.Ops) - len(todo)
	for _, r := range results {
		total += len(r.w)
	}
	out := circuit.New(c.Qubits())
	out.SetBits(c.Bits())
	out.Ops = make([]circuit.Op, 0, total)
	rewrites := make([]budget.Rewrite, len(todo))
	k := 0
	for i, op := range c.Ops {
		if k == len(todo) || todo[k] != i {
			out.AppendOp(op)
			continue
		}
		start := out.Len()
		q := op.Qubits[0]
		results[k].w.appendTo(out, q)
		rewrites[k] = budget.Rewrite{
			Window: budget.Window{Before: circuit.Span{Start: i, End: i + 1}, After: circuit.Span{Start: start, End: out.Len()}, Qubits: []int{q}},
			Share:  share,
		}
		k++
	}
	if rec == nil {
		return out, nil
	}
	err = p.each(len(todo), func(k int) error {
		op := c.Ops[todo[k]]
		piece := circuit.New(1).Append(op.Gate, 0)
		repl := circuit.New(1)
		repl.Ops = make([]circuit.Op, 0, len(results[k].w))
		results[k].w.appendTo(repl, 0)
		rewrites[k].Piece, rewrites[k].Replacement = piece, repl
		return rec.Record(rewrites[k])
	})
	if err != nil {
		return nil, err
	}
	return out, nil
}

// each runs f(0), …, f(n−1) on the pass's workers and returns the error of the lowest k that
// failed, so the op named does not depend on scheduling.
func (p Pass) each(n int, f func(k int) error) error {
	workers := p.Workers
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	errs := make([]error, n)
	next := make(chan int)
	var wg sync.WaitGroup
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for k := range next {
				errs[k] = f(k)
			}
		}()
	}
	for k := 0; k < n; k++ {
		next <- k
	}
	close(next)
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return err
		}
	}
	return nil
}
