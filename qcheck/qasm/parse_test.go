package qasm

import (
	"errors"
	"math"
	"runtime"
	"strconv"
	"strings"
	"testing"
	"time"

	"qcheck.dev/qcheck/circuit"
)

const head = "OPENQASM 2.0;\ninclude \"qelib1.inc\";\n"

func mustParse(t *testing.T, src string, opts ...Option) *Program {
	t.Helper()
	p, err := ParseProgram([]byte(src), opts...)
	if err != nil {
		t.Fatalf("ParseProgram: %v\nsource:\n%s", err, src)
	}
	return p
}

// The expected circuits are written by hand from the OpenQASM 2.0 specification
// (arXiv:1707.03429 §3: broadcasting, register order, gate definitions) and the mapping table of
// the package documentation.
func TestParseStatements(t *testing.T) {
	cases := []struct {
		name string
		src  string
		want *circuit.Circuit
	}{
		{"broadcast one register", head + "qreg q[3];\nh q;",
			circuit.New(3).H(0).H(1).H(2)},
		{"broadcast two registers pairwise", head + "qreg a[2];\nqreg b[2];\ncx a, b;",
			circuit.New(4).CX(0, 2).CX(1, 3)},
		{"register with element", head + "qreg a[2];\nqreg b[1];\ncx a, b[0];",
			circuit.New(3).CX(0, 2).CX(1, 2)},
		{"U and CX without include", "OPENQASM 2.0;\nqreg q[2];\nU(1,2,3) q[1];\nCX q[1],q[0];",
			circuit.New(2).U(1, 2, 3, 1).CX(1, 0)},
		{"qelib1 aliases", head + "qreg q[2];\nu3(1,2,3) q[0];\nu2(2,3) q[0];\nu1(3) q[0];\nu0(5) q[1];\ncu1(3) q[0],q[1];",
			circuit.New(2).U(1, 2, 3, 0).U(math.Pi/2, 2, 3, 0).P(3, 0).I(1).CP(3, 0, 1)},
		{"nested user gates substitute parameters", head +
			"gate inner(a) x { rz(a) x; }\ngate outer(a, b) x, y { inner(a*b) y; cx x, y; inner(-a) x; }\nqreg q[2];\nouter(2, 3) q[1], q[0];",
			circuit.New(2).RZ(6, 0).CX(1, 0).RZ(-2, 1)},
		{"empty parameter list and empty body", head + "gate nop() x { }\nqreg q[1];\nnop() q[0];\nnop q[0];",
			circuit.New(1)},
		{"barrier inside a gate body", head + "gate g x, y { h x; barrier x, y; h y; }\nqreg q[2];\ng q[0], q[1];",
			circuit.New(2).H(0).Barrier(0, 1).H(1)},
		{"barrier over registers without repeats", head + "qreg a[2];\nqreg b[1];\nbarrier a, a[1], b;",
			circuit.New(3).Barrier(0, 1, 2)},
		{"reset broadcast", head + "qreg q[2];\nreset q;", circuit.New(2).Reset(0).Reset(1)},
		{"measure registers pairwise", head + "qreg q[2];\ncreg c[3];\ncreg d[2];\nmeasure q -> d;\nmeasure q[1] -> c[2];",
			circuit.New(2).Measure(0, 3).Measure(1, 4).Measure(1, 2)},
		{"byte order mark and CRLF line ends", "\xEF\xBB\xBFOPENQASM 2.0;\r\ninclude \"qelib1.inc\";\r\nqreg q[1];\r\nx q[0];\r\n",
			circuit.New(1).X(0)},
		{"comments anywhere", "// first\nOPENQASM 2.0; // header\ninclude \"qelib1.inc\"; //\nqreg q[1]; // x\nx q[0]; // done",
			circuit.New(1).X(0)},
		{"redefining a qelib1 gate applies to later calls", head + "qreg q[1];\nh q[0];\ngate h a { x a; }\nh q[0];",
			circuit.New(1).H(0).X(0)},
		{"definition before include shadows qelib1", "OPENQASM 2.0;\ngate h a { U(0,0,0) a; }\ninclude \"qelib1.inc\";\nqreg q[1];\nh q[0];",
			circuit.New(1).U(0, 0, 0, 0)},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			got := mustParse(t, tc.src).Circuit
			if !got.Equal(tc.want) {
				t.Errorf("got ops %v, want %v", got.Ops, tc.want.Ops)
			}
		})
	}
}

// Angle arithmetic, with values worked by hand: precedence as in the OpenQASM 2.0 grammar
// (arXiv:1707.03429 §3 and its appendix), power to the right and above unary minus.
func TestParseArithmetic(t *testing.T) {
	cases := []struct {
		expr string
		want float64
	}{
		{"-2^2", -4},
		{"2^-1", 0.5},
		{"2^3^2", 512}, // right-associative: 2^(3^2)
		{"1 + 2 * 3 - 4 / 8", 6.5},
		{"-(1 - 3)", 2},
		{"--1", 1},
		{"10 - 4 - 3", 3}, // left-associative
		{"16 / 4 / 2", 2},
		{"pi", math.Pi},
		{"pi/2", math.Pi / 2},
		{"sqrt(4) + exp(0) + ln(1) + cos(0) + tan(0)", 4},
		{"sin(pi/2)", 1},
		{"1.5e-3", 0.0015},
		{"1.5E+2", 150},
		{".25", 0.25},
		{"3.", 3},
	}
	for _, tc := range cases {
		c := mustParse(t, head+"qreg q[1];\nrz("+tc.expr+") q[0];").Circuit
		if got := c.Ops[0].Gate.Params[0]; got != tc.want {
			t.Errorf("rz(%s): angle %v, want %v", tc.expr, got, tc.want)
		}
	}
}

func TestProgramRegisters(t *testing.T) {
	p := mustParse(t, head+"qreg a[2];\ncreg m[1];\nqreg b[3];\ncreg n[2];\nx b[2];\nmeasure b[2] -> n[1];")
	wantQ := []Register{{"a", 2, 0}, {"b", 3, 2}}
	wantC := []Register{{"m", 1, 0}, {"n", 2, 1}}
	for i := range wantQ {
		if p.Qregs[i] != wantQ[i] {
			t.Errorf("qreg %d = %+v, want %+v", i, p.Qregs[i], wantQ[i])
		}
	}
	for i := range wantC {
		if p.Cregs[i] != wantC[i] {
			t.Errorf("creg %d = %+v, want %+v", i, p.Cregs[i], wantC[i])
		}
	}
	if q, ok := p.Qubit("b", 2); !ok || q != 4 {
		t.Errorf("Qubit(b, 2) = %d, %v; want 4, true", q, ok)
	}
	if _, ok := p.Qubit("b", 3); ok {
		t.Error("Qubit(b, 3) exists; b has 3 qubits")
	}
	if b, ok := p.Bit("n", 1); !ok || b != 2 {
		t.Errorf("Bit(n, 1) = %d, %v; want 2, true", b, ok)
	}
	if p.Circuit.Qubits() != 5 || p.Circuit.Bits() != 3 {
		t.Errorf("circuit is %d qubits, %d bits; want 5, 3", p.Circuit.Qubits(), p.Circuit.Bits())
	}
	if !p.Circuit.Equal(circuit.New(5).X(4).Measure(4, 2)) {
		t.Errorf("ops %v", p.Circuit.Ops)
	}
	if want := []int{7, 8}; len(p.Lines) != 2 || p.Lines[0] != want[0] || p.Lines[1] != want[1] {
		t.Errorf("Lines = %v, want %v", p.Lines, want)
	}
}

func TestDropBarriers(t *testing.T) {
	src := head + "gate g x { barrier x; h x; }\nqreg q[2];\nbarrier q;\ng q[0];\nbarrier q[1];"
	if got := mustParse(t, src, DropBarriers()).Circuit; !got.Equal(circuit.New(2).H(0)) {
		t.Errorf("with DropBarriers: %v", got.Ops)
	}
	if got := mustParse(t, src).Circuit; !got.Equal(circuit.New(2).Barrier(0, 1).Barrier(0).H(0).Barrier(1)) {
		t.Errorf("by default: %v", got.Ops)
	}
}

// Each bad source must fail with an *Error at the given line:column whose message holds the
// given words.
func TestParseErrors(t *testing.T) {
	cases := []struct {
		src       string
		line, col int
		words     string
	}{
		{"", 1, 1, "empty source"},
		{"// nothing\n", 2, 1, "empty source"},
		{"OPENQASM 4.0;", 1, 10, "unsupported OpenQASM version 4.0; this reader takes 2.0 and 3"},
		{"OPENQASM 2.0", 1, 13, `expected ";"`},
		{head + "qreg q[1];\nopaque g a;", 4, 1, "opaque"},
		{head + "qreg q[1];\ncreg c[1];\nif (c[0]==1) x q[0];", 5, 6, "whole register"},
		{head + "qreg q[1];\ncreg c[1];\nif (q==1) x q[0];", 5, 5, "not a classical register"},
		{head + "qreg q[1];\ncreg c[1];\nif (c==1) barrier q;", 5, 11, "if must be followed by a gate call, measure or reset"},
		{head + "qreg q[1];\ncreg c[1];\nif (c==-1) x q[0];", 5, 8, "non-negative integer"},
		{head + "qreg q[1];\ncreg c[65];\nif (c==1) x q[0];", 5, 5, "at most 64 bits"},
		{"OPENQASM 2.0;\ninclude \"other.inc\";", 2, 9, "only \"qelib1.inc\""},
		{head + "qreg q[1];\nfoo q[0];", 4, 1, "unknown gate or statement foo"},
		{"OPENQASM 2.0;\nqreg q[1];\nh q[0];", 3, 1, "add include"},
		{head + "qreg q[2];\niswap q[0],q[1];", 4, 1, "not in qelib1.inc"},
		{head + "qreg q[2];\ncx q[0];", 4, 1, "acts on 2 qubit(s), got 1"},
		{head + "qreg q[1];\nrz q[0];", 4, 1, "takes 1 angle(s), got 0"},
		{head + "qreg q[2];\ncx q[1],q[1];", 4, 9, "twice"},
		{head + "qreg q[2];\nh q[2];", 4, 5, "out of range"},
		{head + "qreg q[2];\nh r[0];", 4, 3, "unknown register r"},
		{head + "qreg a[2];\nqreg b[3];\ncx a, b;", 5, 7, "different sizes"},
		// Angles are counted from 1 and named, as in circuit.Validate, and the column is the
		// offending expression's.
		{head + "qreg q[1];\nrz(1/0) q[0];", 4, 4, "angle 1 (θ) of rz evaluates to +Inf; angles must be finite"},
		{head + "qreg q[1];\nrz(ln(0)) q[0];", 4, 4, "angle 1 (θ) of rz evaluates to -Inf"},
		{head + "qreg q[1];\nu(0, 0/0, 1) q[0];", 4, 6, "angle 2 (φ) of u evaluates to NaN"},
		{head + "qreg q[1];\nU(0, 1, -sqrt(-1)) q[0];", 4, 9, "angle 3 (λ) of U evaluates to NaN"},
		{head + "gate g(a, b) q { h q; }\nqreg q[1];\ng(0, 1/0) q[0];", 5, 6, "angle 2 (b) of g evaluates to +Inf"},
		{head + "gate g(a) q { rz(ln(a)) q; }\nqreg q[1];\ng(0) q[0];", 3, 18,
			"angle 1 (θ) of rz evaluates to -Inf in the body of gate g, for the call at 5:1"},
		// A qelib1 body cannot be pointed at in the source: the error is at the call.
		{head + "qreg q[2];\ncu3(0, 1e308, 1e308) q[0], q[1];", 4, 1, "angle 1 (λ) of p evaluates to +Inf inside gate cu3"},
		{head + "qreg q[1];\nrz(theta) q[0];", 4, 4, "unknown name theta"},
		{head + "qreg q[1];\nrz(1 +) q[0];", 4, 7, "expected an angle expression"},
		{head + "qreg q[1];\nrz(1e) q[0];", 4, 4, "exponent"},
		{head + "qreg q[1];\nrz(1e999) q[0];", 4, 4, "too large"},
		{head + "qreg q[1];\nh q[0]", 4, 7, `expected ";"`},
		{head + "qreg q[1];\nh q[0]; /* x */", 4, 9, "block comments"},
		{head + "qreg q[1];\nh q[0]; #", 4, 9, "unexpected character"},
		{head + "qreg q[0];", 3, 8, "size 0"},
		{head + "qreg q[1.5];", 3, 8, "must be an integer"},
		{head + "qreg q[1];\nqreg q[2];", 4, 6, "already declared"},
		{head + "qreg q[1];\ncreg c[1];\nh c[0];", 5, 3, "not a quantum register"},
		{head + "qreg q[2];\ncreg c[1];\nmeasure q -> c;", 5, 14, "same size"},
		{head + "gate g a { h a[0]; }", 3, 15, "indexing is not allowed"},
		{head + "gate g a { h b; }", 3, 14, "not a qubit argument"},
		{head + "gate g a { g a; }", 3, 12, "calls itself"},
		{head + "gate g a { measure a; }", 3, 12, "not allowed in a gate body"},
		{head + "gate g a, a { h a; }", 3, 11, "used twice"},
		{head + "gate g(pi) a { h a; }", 3, 8, "reserved"},
		{head + "gate g a { h a; }\ngate g a { x a; }", 4, 6, "already defined"},
		{head + "gate g a { cx a, a; }", 3, 18, "used twice in one call"},
		{head + "gate g a { h a; ", 3, 17, "not closed"},
		{head + "gate g(x) a { rz(y) a; }", 3, 18, "unknown parameter y"},
		{head + "gate U a { h a; }", 3, 6, "reserved"},
		{head + "qreg q[1];\nmcp2(1) q[0];", 4, 1, "unknown gate"},
		{head + "qreg q[3];\nrccx q[0],q[1],q[2];", 4, 1, "rccx (a relative-phase Toffoli of some qelib1.inc versions) is not supported"},
		{head + "OPENQASM 2.0;", 3, 1, "only once"},
		{head + "qreg q[1];\nrz(" + strings.Repeat("(", 300) + "1" + strings.Repeat(")", 300) + ") q[0];", 4, 205, "nested"},
	}
	for _, tc := range cases {
		_, err := Parse([]byte(tc.src))
		var e *Error
		if !errors.As(err, &e) {
			t.Errorf("%q: error %v, want an *Error", tc.src, err)
			continue
		}
		if e.Line != tc.line || e.Col != tc.col || !strings.Contains(e.Msg, tc.words) {
			t.Errorf("%q:\n got %v\nwant %d:%d: …%s…", tc.src, err, tc.line, tc.col, tc.words)
		}
	}
}

// A gate that calls the previous one twice, 30 levels deep, would expand to 2^30 ops: Parse must
// stop at the op limit with an error, quickly, not exhaust memory.
func TestParseExpansionLimit(t *testing.T) {
	var b strings.Builder
	b.WriteString(head + "gate g00 a { h a; }\n")
	for i := 1; i <= 30; i++ {
		b.WriteString("gate g" + itoa(i) + " a { g" + itoa(i-1) + " a; g" + itoa(i-1) + " a; }\n")
	}
	b.WriteString("qreg q[1];\ng30 q[0];")
	_, err := Parse([]byte(b.String()), MaxOps(1000))
	if err == nil || !strings.Contains(err.Error(), "more than 1000 ops") {
		t.Fatalf("error %v, want the op limit", err)
	}
}

// The same nesting 40 levels deep at the default limit: g40 would expand to 2^40 ops. The reader
// used to find that out one op at a time (12 s and 1.7 GB before failing); it must refuse the call
// at once, at the call's line and column, naming the gate and its exact count 2^40 =
// 1099511627776. At 70 levels the count, 2^70, is past what an int holds and is reported as a
// lower bound. Parsing these files takes microseconds; the bounds below (1 s, 64 MB allocated)
// leave room for a loaded machine.
func TestParseExpansionLimitIsFast(t *testing.T) {
	for _, tc := range []struct {
		depth int
		count string
	}{
		{40, "1099511627776"},
		{70, "at least " + strconv.Itoa(math.MaxInt/2)},
	} {
		var b strings.Builder
		b.WriteString(head + "gate g00 a { h a; }\n")
		for i := 1; i <= tc.depth; i++ {
			b.WriteString("gate g" + itoa(i) + " a { g" + itoa(i-1) + " a; g" + itoa(i-1) + " a; }\n")
		}
		b.WriteString("qreg q[1];\nh q[0];\ng" + itoa(tc.depth) + " q[0];")
		var before, after runtime.MemStats
		runtime.ReadMemStats(&before)
		start := time.Now()
		_, err := Parse([]byte(b.String()))
		elapsed := time.Since(start)
		runtime.ReadMemStats(&after)
		var e *Error
		if !errors.As(err, &e) {
			t.Fatalf("depth %d: error %v, want an *Error at the call", tc.depth, err)
		}
		want := "gate g" + itoa(tc.depth) + " expands to " + tc.count + " ops here; with the 1 before it"
		if e.Line != tc.depth+6 || e.Col != 1 || !strings.Contains(e.Msg, want) ||
			!strings.Contains(e.Msg, "more than "+strconv.Itoa(DefaultMaxOps)+" ops") {
			t.Errorf("depth %d: got %v, want %d:1: …%s… and the limit", tc.depth, err, tc.depth+6, want)
		}
		if elapsed > time.Second {
			t.Errorf("depth %d: refusing the call took %v", tc.depth, elapsed)
		}
		if alloc := after.TotalAlloc - before.TotalAlloc; alloc > 64<<20 {
			t.Errorf("depth %d: refusing the call allocated %d bytes", tc.depth, alloc)
		}
	}
}

// The count checked before expansion is exact: a call that fits the limit exactly is read, one op
// more is refused. Broadcasting multiplies the count (g03 over a register of 3 is 3·2^3 = 24 ops),
// barriers in bodies count unless dropped, and ops already read count against the limit.
func TestParseExpansionLimitIsExact(t *testing.T) {
	src := head + "gate g00 a { h a; barrier a; }\n"
	for i := 1; i <= 3; i++ {
		src += "gate g" + itoa(i) + " a { g" + itoa(i-1) + " a; g" + itoa(i-1) + " a; }\n"
	}
	src += "qreg q[3];\nx q[0];\ng03 q;"
	for _, tc := range []struct {
		max  int
		drop bool
		ops  int // the ops read, or 0 when the limit must refuse the call
	}{
		{1 + 3*16, false, 1 + 3*16},
		{3 * 16, false, 0},
		{1 + 3*8, true, 1 + 3*8},
		{3 * 8, true, 0},
	} {
		opts := []Option{MaxOps(tc.max)}
		if tc.drop {
			opts = append(opts, DropBarriers())
		}
		c, err := Parse([]byte(src), opts...)
		switch {
		case tc.ops > 0 && err != nil:
			t.Errorf("limit %d, drop %v: refused: %v", tc.max, tc.drop, err)
		case tc.ops > 0 && c.Len() != tc.ops:
			t.Errorf("limit %d, drop %v: %d ops, want %d", tc.max, tc.drop, c.Len(), tc.ops)
		case tc.ops == 0 && (err == nil || !strings.Contains(err.Error(), "9:1: gate g03 expands to "+strconv.Itoa(tc.max)+" ops")):
			t.Errorf("limit %d, drop %v: got %v, want a refusal of g03 at 9:1", tc.max, tc.drop, err)
		}
	}
}

func itoa(i int) string { return string(rune('0'+i/10)) + string(rune('0'+i%10)) }

// A barrier over a register of 200,000 qubits survives a round trip in well under a second: no
// step may be quadratic in the number of operands (the fuzzer found one in Validate).
func TestWideBarrierRoundTrip(t *testing.T) {
	c := mustParse(t, "OPENQASM 2;qreg q[200000];barrier q;").Circuit
	if len(c.Ops) != 1 || len(c.Ops[0].Qubits) != 200000 {
		t.Fatalf("got %d ops", len(c.Ops))
	}
	roundTrip(t, c)
}

// The gates a source may call after the include: the qelib1.inc of the OpenQASM 2.0 paper
// (arXiv:1707.03429, appendix) and the later additions listed in the package documentation.
func TestQelib1Names(t *testing.T) {
	want := "c3sqrtx c3x c4x ccx ch cp crx cry crz cswap csx cu cu1 cu3 cx cy cz h id p rx rxx ry rz rzz s sdg swap sx sxdg t tdg u u0 u1 u2 u3 x y z"
	if got := strings.Join(Qelib1(), " "); got != want {
		t.Errorf("Qelib1() = %s\nwant       %s", got, want)
	}
}
