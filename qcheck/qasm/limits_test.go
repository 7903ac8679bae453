package qasm

import (
	"errors"
	"math"
	"runtime"
	"strconv"
	"strings"
	"testing"
	"time"

	"pgregory.net/rapid"
)

// refusedQuickly parses src and fails unless it is refused with an *Error at line:col holding
// words, within 256 MB of allocation and 10 s (a bound against hangs only: on an idle machine
// these take well under a second; the command's times are measured with /usr/bin/time and given
// in the README).
func refusedQuickly(t *testing.T, src string, line, col int, words string) {
	t.Helper()
	var before, after runtime.MemStats
	runtime.ReadMemStats(&before)
	start := time.Now()
	_, err := Parse([]byte(src))
	elapsed := time.Since(start)
	runtime.ReadMemStats(&after)
	var e *Error
	if !errors.As(err, &e) || e.Line != line || e.Col != col || !strings.Contains(e.Msg, words) {
		t.Fatalf("got %v, want %d:%d: …%s…", err, line, col, words)
	}
	if elapsed > 10*time.Second {
		t.Errorf("refusing took %v", elapsed)
	}
	if alloc := after.TotalAlloc - before.TotalAlloc; alloc > 256<<20 {
		t.Errorf("refusing allocated %d MB", alloc>>20)
	}
}

// Issue 17, reproducer 5: gates with empty bodies doubling 60 times make no ops, so the op limit
// never fired and the expansion ran for ever. The work of expanding is counted instead, and the
// call is refused before it starts.
func TestEmptyBodiesCountAsWork(t *testing.T) {
	src := head + "gate e x { }\ngate g0 x { e x; e x; }\n"
	for i := 1; i <= 60; i++ {
		src += "gate g" + strconv.Itoa(i) + " x { g" + strconv.Itoa(i-1) + " x; g" + strconv.Itoa(i-1) + " x; }\n"
	}
	src += "qreg q[1];\ng60 q[0];\n"
	refusedQuickly(t, src, 66, 1, "gate g60 takes at least "+strconv.Itoa(maxCount)+" steps to expand")

	// A chain that fits is read, and makes no ops. e costs 1 step; g0 costs 1+2·(1+1) = 5 steps;
	// g_k costs 1 + 2·(1 + cost(g_{k−1})).
	small := head + "gate e x { }\ngate g0 x { e x; e x; }\ngate g1 x { g0 x; g0 x; }\nqreg q[1];\ng1 q[0];\n"
	c, err := Parse([]byte(small), MaxOps(2)) // 8 × 2 = 16 steps ≥ cost(g1) = 1 + 2·6 = 13
	if err != nil || c.Len() != 0 {
		t.Fatalf("got %v, %v; want no ops", c, err)
	}
	if _, err := Parse([]byte(small), MaxOps(1)); err == nil || !strings.Contains(err.Error(), "takes 13 steps") {
		t.Fatalf("with 8 steps allowed: got %v, want a refusal of 13 steps", err)
	}
}

// Issue 17, reproducer 6: after qreg q[1048576], each barrier q is a list of a million qubits;
// 1,000 of them (11 KB) exhausted 12 GB. The operands are limited as well as the ops.
func TestWideBarriersLimited(t *testing.T) {
	src := "OPENQASM 2.0;\nqreg q[1048576];\n" + strings.Repeat("barrier q;\n", 1000)
	// 4 × DefaultMaxOps operands hold 4 barriers of 2^20 qubits; the 5th is refused.
	refusedQuickly(t, src, 7, 1, "more than "+strconv.Itoa(operandsPerOp*DefaultMaxOps)+" operands")
	// Dropped barriers cost nothing.
	if c, err := Parse([]byte(src), DropBarriers()); err != nil || c.Len() != 0 {
		t.Fatalf("DropBarriers: %v", err)
	}
	// Broadcast conditions count their bits: if(c==0) on a 64-bit register, over 2^20 qubits.
	cond := "OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[1048576];\ncreg c[64];\nif(c==0) x q;\n"
	refusedQuickly(t, cond, 5, 1, "operands")
}

// Issue 17, reproducer 8: angle expressions in gate bodies were evaluated from their trees at
// every expansion, so a 61 KB file took 17 minutes. Each expression is compiled once, and its
// length counts towards the work limit, so a file of that shape is refused at once and one that
// fits is fast.
func TestBodyArithmeticCounted(t *testing.T) {
	long := strings.Repeat("a+", 2999) + "a"
	src := func(depth int) string {
		s := head + "gate g0(a) x { rz(" + long + ") x; }\n"
		for i := 1; i <= depth; i++ {
			s += "gate g" + strconv.Itoa(i) + "(a) x { g" + strconv.Itoa(i-1) + "(a) x; g" + strconv.Itoa(i-1) + "(a) x; }\n"
		}
		return s + "qreg q[1];\ng" + strconv.Itoa(depth) + "(0.1) q[0];\n"
	}
	refusedQuickly(t, src(20), 25, 1, "steps to expand")
	// 2^10 expansions of the 5,999-instruction expression fit; each gives 3000 · 0.1 summed left
	// to right, the same float64 the tree gives.
	start := time.Now()
	c, err := Parse([]byte(src(10)))
	if err != nil {
		t.Fatal(err)
	}
	if c.Len() != 1024 {
		t.Fatalf("%d ops, want 1024", c.Len())
	}
	want := 0.0
	for range 3000 {
		want += 0.1
	}
	if got := c.Ops[1023].Gate.Params[0]; got != want {
		t.Errorf("angle %v, want %v", got, want)
	}
	if d := time.Since(start); d > 2*time.Second {
		t.Errorf("reading took %v", d)
	}
}

// Compiled code gives bit for bit what the expression tree gives, for random expressions over
// two parameters (the tree is the evaluator the folding of constants uses).
func TestCompiledExpressionsMatchTrees(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		var build func(depth int) *expr
		build = func(depth int) *expr {
			if depth == 0 || rapid.IntRange(0, 3).Draw(t, "leaf") == 0 {
				if rapid.Bool().Draw(t, "param") {
					return &expr{op: 'p', idx: rapid.IntRange(0, 1).Draw(t, "idx")}
				}
				return &expr{op: 'n', val: rapid.Float64Range(-10, 10).Draw(t, "val")}
			}
			switch op := rapid.SampledFrom([]byte("uf+-*/^")).Draw(t, "op"); op {
			case 'u':
				return &expr{op: op, a: build(depth - 1)}
			case 'f':
				return &expr{op: op, idx: rapid.IntRange(0, len(functions)-1).Draw(t, "fn"), a: build(depth - 1)}
			default:
				return &expr{op: op, a: build(depth - 1), b: build(depth - 1)}
			}
		}
		e := build(6)
		env := []float64{rapid.Float64Range(-5, 5).Draw(t, "x"), rapid.Float64Range(-5, 5).Draw(t, "y")}
		c := compile(e)
		got, want := c.eval(env, make([]float64, c.stack)), e.eval(env)
		if math.Float64bits(got) != math.Float64bits(want) && !(math.IsNaN(got) && math.IsNaN(want)) {
			t.Fatalf("code gives %v, tree gives %v", got, want)
		}
	})
}

// OpenQASM 3 adds ways to ask for unbounded work: nested loops with empty bodies, pow with a huge
// exponent, and chains of gates each the square of the previous one with empty bodies at the
// bottom. Each is refused by the work limit, with the limit in the message; the first and last
// at a small MaxOps to keep the test fast (at the default they take about 1 s of CPU).
func TestOpenQASM3WorkLimited(t *testing.T) {
	chain := "include \"stdgates.inc\";\ngate e a { }\ngate g0 a { e a; e a; }\n"
	for i := 1; i <= 60; i++ {
		chain += "gate g" + strconv.Itoa(i) + " a { pow(2) @ g" + strconv.Itoa(i-1) + " a; }\n"
	}
	chain += "qubit q;\ng60 q;\n"
	for _, tc := range []struct {
		src   string
		opts  []Option
		words string
	}{
		{"include \"stdgates.inc\";\nqubit q;\nfor int i in [0:2000] { for int j in [0:2000] { } }\n",
			[]Option{MaxOps(1 << 16)}, "more than 524288 steps"},
		{"include \"stdgates.inc\";\nqubit q;\npow(1000000000000000) @ x q;\n", nil, "pow(1e+15) repeats the gate more times than the source's work limit allows"},
		{chain, []Option{MaxOps(1 << 16)}, "524288 steps"},
		{"include \"stdgates.inc\";\nqubit q;\nfor int i in [0:999999] { x q; }\n", nil, "for loop of 1000000 iterations: at most 32768"},
	} {
		var before, after runtime.MemStats
		runtime.ReadMemStats(&before)
		start := time.Now()
		_, err := Parse([]byte(tc.src), tc.opts...)
		elapsed := time.Since(start)
		runtime.ReadMemStats(&after)
		if err == nil || !strings.Contains(err.Error(), tc.words) {
			t.Errorf("got %v, want …%s…", err, tc.words)
		}
		if alloc := after.TotalAlloc - before.TotalAlloc; alloc > 256<<20 || elapsed > 10*time.Second {
			t.Errorf("%q: refusing took %v and %d MB", tc.words, elapsed, alloc>>20)
		}
	}
}
