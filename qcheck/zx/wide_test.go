package zx

import (
	"math"
	"math/rand/v2"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// runAdder applies an adder made of x, cx and ccx gates to a classical bit string.
func runAdder(t *testing.T, c *circuit.Circuit, bits []bool) {
	t.Helper()
	for _, op := range c.Ops {
		q := op.Qubits
		switch op.Gate.Name {
		case "cx":
			bits[q[1]] = bits[q[1]] != bits[q[0]]
		case "ccx":
			bits[q[2]] = bits[q[2]] != (bits[q[0]] && bits[q[1]])
		default:
			t.Fatalf("adder has a %s gate", op)
		}
	}
}

// The adder of Cuccaro et al. computes a + b on basis states (checked against integer addition,
// 31- and 63-bit numbers, so 64 and 128 qubits), and ZX proves its Clifford+T translation,
// reordered and routed, equal to it.
func TestAdderAtWidth(t *testing.T) {
	rng := rand.New(rand.NewPCG(10, 11))
	ns := []int{31}
	if *wide {
		ns = append(ns, 63)
	}
	for _, n := range ns {
		c := adder(n)
		mask := uint64(1)<<n - 1
		for range 50 {
			a, b := rng.Uint64()&mask, rng.Uint64()&mask
			bits := make([]bool, 2*n+2)
			for i := range n {
				bits[1+2*i] = a>>i&1 == 1
				bits[2+2*i] = b>>i&1 == 1
			}
			runAdder(t, c, bits)
			var gotA, gotS uint64
			for i := range n {
				if bits[1+2*i] {
					gotA |= 1 << i
				}
				if bits[2+2*i] {
					gotS |= 1 << i
				}
			}
			carry := (a+b)>>n&1 == 1
			if gotA != a || gotS != (a+b)&mask || bits[0] || bits[2*n+1] != carry {
				t.Fatalf("%d-bit adder: %d + %d gave a=%d, sum=%d, carry=%v", n, a, b, gotA, gotS, bits[2*n+1])
			}
		}
		r, err := Check(c, rewritten(c, 4), Options{})
		if err != nil {
			t.Fatal(err)
		}
		if r.Verdict != Equivalent {
			t.Errorf("%d-qubit adder: %v (%s)", 2*n+2, r.Verdict, r.Reason)
		}
	}
}

// firstChange returns the position of the first op where c and d differ.
func firstChange(c, d *circuit.Circuit) int {
	i := 0
	for i < len(c.Ops) && i < len(d.Ops) && c.Ops[i].Equal(d.Ops[i]) {
		i++
	}
	return i
}

// localDistance is the phase-free distance of op i of c and what d has in its place (nothing,
// when d dropped it), computed on the op's qubits alone: by unitary invariance it is the distance
// of the whole circuits, whatever surrounds the op.
func localDistance(t *testing.T, c, d *circuit.Circuit, i int) float64 {
	op := c.Ops[i]
	index := map[int]int{}
	for k, q := range op.Qubits {
		index[q] = k
	}
	local := func(o *circuit.Op) *circuit.Circuit {
		out := circuit.New(len(op.Qubits))
		if o != nil {
			o2 := o.Clone()
			for k, q := range o2.Qubits {
				o2.Qubits[k] = index[q]
			}
			out.AppendOp(o2)
		}
		return out
	}
	var other *circuit.Op
	if len(d.Ops) == len(c.Ops) {
		other = &d.Ops[i]
	}
	return metric.PhaseDistance(dense(t, local(&op)), dense(t, local(other)))
}

// One changed, flipped or dropped gate in a random circuit wider than any dense engine, then
// translated, reordered and routed: Check must refute it with the exact distance, which unitary
// invariance makes the distance of the changed gate alone.
func TestLocalBugsAtWidth(t *testing.T) {
	n, depth := 24, 8
	if *wide {
		n, depth = 40, 40
	}
	rng := rand.New(rand.NewPCG(12, 13))
	c := volume(n, depth, rng)
	for trial := range 6 {
		d := bug(c, trial%3, 0.3, rng)
		want := localDistance(t, c, d, firstChange(c, d))
		r, err := Check(c, rewritten(d, uint64(trial)), Options{})
		if err != nil {
			t.Fatal(err)
		}
		if r.Verdict != Different || !r.Known {
			t.Errorf("trial %d: %v (%s)", trial, r.Verdict, r.Reason)
			continue
		}
		if diff := r.Distance - want; diff > r.Bound+1e-9 || -diff > r.Bound+1e-9 {
			t.Errorf("trial %d: distance %.15g, the changed gate alone %.15g", trial, r.Distance, want)
		}
	}
}

// A near miss, one angle off by 1e-7, in wide rewritten circuits: never equivalent; when measured,
// the distance is the changed gate's alone.
func TestNearMissAtWidth(t *testing.T) {
	rng := rand.New(rand.NewPCG(18, 19))
	for _, c := range []*circuit.Circuit{qft(32), volume(24, 6, rng), adder(15)} {
		d := bug(c, 0, 1e-7, rng)
		if d == nil {
			// The adder has no angles: put one in, as a compiler's peephole slip would.
			d = c.Clone()
			d.Append(gate("rz", 1e-7), 5)
		}
		want := 0.0
		if i := firstChange(c, d); i < len(c.Ops) {
			want = localDistance(t, c, d, i)
		} else {
			want = 2 * math.Sin(1e-7/4)
		}
		r, err := Check(c, rewritten(d, 6), Options{})
		if err != nil {
			t.Fatal(err)
		}
		if r.Verdict == Equivalent {
			t.Errorf("%d qubits: a 1e-7 change proved equivalent within %g", c.Qubits(), r.Bound)
		}
		if r.Known && math.Abs(r.Distance-want) > r.Bound+1e-12 {
			t.Errorf("%d qubits: distance %g, the changed gate alone %g", c.Qubits(), r.Distance, want)
		}
		t.Logf("%d qubits: %v, distance %g (want %g), bound %g %s", c.Qubits(), r.Verdict, r.Distance, want, r.Bound, r.Reason)
	}
}

// The QFT (checked against Nielsen & Chuang's matrix up to 10 qubits in TestQFTMatrix), basis-
// translated, reordered and routed, is proved equal to itself at 32 qubits (64 and 128 with
// -zx.wide), within a bound below qcheck's default tolerance of 1e-9.
func TestQFTAtWidth(t *testing.T) {
	ns := []int{32}
	if *wide {
		ns = append(ns, 64, 128)
	}
	for _, n := range ns {
		c := qft(n)
		r, err := Check(c, rewritten(c, 7), Options{})
		if err != nil {
			t.Fatal(err)
		}
		if r.Verdict != Equivalent || r.Bound > 1e-9 {
			t.Errorf("%d qubits: %v within %g (%s)", n, r.Verdict, r.Bound, r.Reason)
		}
	}
}
