package qasm

import (
	"math"
	"math/cmplx"
	"strconv"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// The matrices below are built from the OpenQASM 3 specification (Cross et al., "OpenQASM 3: A
// broader and deeper quantum assembly language", ACM Trans. Quantum Comput. 3(3), 2022, §3.2–3.4,
// and the standard library file stdgates.inc it defines), written out here by us from our
// knowledge of that text, not copied from any file: the built-in
//
//	U(θ,φ,λ) = [[cos(θ/2), −e^{iλ}sin(θ/2)], [e^{iφ}sin(θ/2), e^{i(φ+λ)}cos(θ/2)]],
//
// gphase(γ) = e^{iγ}, ctrl @ (block diag(I, M), control first), inv @ (M†), pow(k) @ (M^k,
// principal for k = 1/2), and each stdgates.inc definition in terms of them.

type mat2 = []complex128

func specU(th, ph, la float64) mat2 { return textbookU(th, ph, la) }

func scale(g complex128, m mat2) mat2 {
	out := make(mat2, len(m))
	for i := range m {
		out[i] = g * m[i]
	}
	return out
}

func expi(x float64) complex128 { return cmplx.Exp(complex(0, x)) }

// matMul returns a·b for square row-major matrices of equal size.
func matMul(a, b mat2) mat2 {
	d := int(math.Sqrt(float64(len(a))))
	out := make(mat2, len(a))
	for i := 0; i < d; i++ {
		for k := 0; k < d; k++ {
			for j := 0; j < d; j++ {
				out[i*d+j] += a[i*d+k] * b[k*d+j]
			}
		}
	}
	return out
}

// dagger returns the conjugate transpose.
func dagger(m mat2) mat2 {
	d := int(math.Sqrt(float64(len(m))))
	out := make(mat2, len(m))
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			out[j*d+i] = cmplx.Conj(m[i*d+j])
		}
	}
	return out
}

// kron2 returns a ⊗ b.
func kron2(a, b mat2) mat2 {
	da, db := int(math.Sqrt(float64(len(a)))), int(math.Sqrt(float64(len(b))))
	n := da * db
	out := make(mat2, n*n)
	for i := 0; i < da; i++ {
		for j := 0; j < da; j++ {
			for k := 0; k < db; k++ {
				for l := 0; l < db; l++ {
					out[(i*db+k)*n+j*db+l] = a[i*da+j] * b[k*db+l]
				}
			}
		}
	}
	return out
}

func ident(d int) mat2 {
	out := make(mat2, d*d)
	for i := 0; i < d; i++ {
		out[i*d+i] = 1
	}
	return out
}

// The specification's definitions (stdgates.inc as we write it out).
var (
	specX  = specU(math.Pi, 0, math.Pi)
	specY  = specU(math.Pi, math.Pi/2, math.Pi/2)
	specH  = specU(math.Pi/2, 0, math.Pi)
	specP  = func(la float64) mat2 { return controlledBy(1, mat2{expi(la)}) } // ctrl @ gphase(λ)
	specZ  = specP(math.Pi)
	specS  = mat2{1, 0, 0, expi(math.Pi / 2)}    // pow(1/2) @ z: the principal root of diag(1, e^{iπ})
	specT  = mat2{1, 0, 0, expi(math.Pi / 4)}    // pow(1/2) @ s
	specSX = matMul(matMul(specH, specS), specH) // pow(1/2) @ x: x = H z H, so √x = H √z H
	specRX = func(th float64) mat2 { return specU(th, -math.Pi/2, math.Pi/2) }
	specRY = func(th float64) mat2 { return specU(th, 0, 0) }
	specRZ = func(la float64) mat2 { return scale(expi(-la/2), specU(0, 0, la)) }
	// swap a, b = cx a,b; cx b,a; cx a,b (a the most significant operand).
	specCXab = controlledBy(1, specX)
	specCXba = matMul(matMul(kron2(specH, specH), specCXab), kron2(specH, specH))
	specSwap = matMul(specCXab, matMul(specCXba, specCXab))
)

// stdgatesCases are every gate of stdgates.inc with its matrix from the specification's
// definition, and the gate of package circuit it maps to ("" for those that are sequences).
func stdgatesCases() []struct {
	call    string
	width   int
	want    mat2
	circuit string
} {
	th, ph, la, ga := 0.7, -1.3, 2.9, 0.4
	a := strconv.FormatFloat
	f := func(v float64) string { return a(v, 'g', -1, 64) }
	return []struct {
		call    string
		width   int
		want    mat2
		circuit string
	}{
		{"p(" + f(la) + ")", 1, specP(la), "p"},
		{"x", 1, specX, "x"},
		{"y", 1, specY, "y"},
		{"z", 1, specZ, "z"},
		{"h", 1, specH, "h"},
		{"s", 1, specS, "s"},
		{"sdg", 1, dagger(specS), "sdg"},
		{"t", 1, specT, "t"},
		{"tdg", 1, dagger(specT), "tdg"},
		{"sx", 1, specSX, "sx"},
		{"rx(" + f(th) + ")", 1, specRX(th), "rx"},
		{"ry(" + f(th) + ")", 1, specRY(th), "ry"},
		{"rz(" + f(la) + ")", 1, specRZ(la), "rz"},
		{"cx", 2, controlledBy(1, specX), "cx"},
		{"cy", 2, controlledBy(1, specY), "cy"},
		{"cz", 2, controlledBy(1, specZ), "cz"},
		{"cp(" + f(la) + ")", 2, controlledBy(1, specP(la)), "cp"},
		{"crx(" + f(th) + ")", 2, controlledBy(1, specRX(th)), "crx"},
		{"cry(" + f(th) + ")", 2, controlledBy(1, specRY(th)), "cry"},
		{"crz(" + f(la) + ")", 2, controlledBy(1, specRZ(la)), "crz"},
		{"ch", 2, controlledBy(1, specH), "ch"},
		{"swap", 2, specSwap, "swap"},
		{"ccx", 3, controlledBy(2, specX), "ccx"},
		{"cswap", 3, controlledBy(1, specSwap), "cswap"},
		{"cu(" + f(th) + "," + f(ph) + "," + f(la) + "," + f(ga) + ")", 2,
			matMul(controlledBy(1, specU(th, ph, la)), kron2(specP(ga), ident(2))), ""},
		{"CX", 2, controlledBy(1, specX), "cx"},
		{"phase(" + f(la) + ")", 1, specU(0, 0, la), "p"},
		{"cphase(" + f(la) + ")", 2, controlledBy(1, specU(0, 0, la)), "cp"},
		{"id", 1, specU(0, 0, 0), "id"},
		{"u1(" + f(la) + ")", 1, specU(0, 0, la), "p"},
		{"u2(" + f(ph) + "," + f(la) + ")", 1, scale(expi(-(ph+la)/2), specU(math.Pi/2, ph, la)), ""},
		{"u3(" + f(th) + "," + f(ph) + "," + f(la) + ")", 1, scale(expi(-(ph+la)/2), specU(th, ph, la)), ""},
	}
}

// Every gate of stdgates.inc read by the 3 reader has the matrix the specification defines,
// global phase included; where the package documentation maps it to a gate of package circuit,
// the reader gives that one gate and its library matrix is the same.
func TestStdgatesMatchSpecification(t *testing.T) {
	const tol = 1e-12
	cases := stdgatesCases()
	if len(cases) != len(Stdgates()) {
		t.Errorf("%d cases for %d gates of stdgates.inc: %v", len(cases), len(Stdgates()), Stdgates())
	}
	for _, tc := range cases {
		src := "OPENQASM 3;\ninclude \"stdgates.inc\";\nqubit[" + strconv.Itoa(tc.width) + "] q;\n" + tc.call + " " + operands(tc.width) + ";\n"
		if d := maxEntryDiff(unitaryOfSource(t, src), tc.want); d > tol {
			t.Errorf("%s: largest entry off by %.3g from the specification's matrix", tc.call, d)
		}
		c := mustParse(t, src).Circuit
		if tc.circuit != "" && (c.Len() != 1 || c.Ops[0].Gate.Name != tc.circuit) {
			t.Errorf("%s: read as %v, want one %s", tc.call, c.Ops, tc.circuit)
		}
	}
}

// The gates OpenQASM 3 writes by modifiers or definitions (U for u, inv @ sx for sxdg, ctrl(2) @ z
// for ccz, and definitions of rzz, rxx, ryy, iswap and iswapdg) read back as those gates, and the
// definitions, expanded under another name, have exactly the library's matrix.
func TestFormatDefinitions3Exact(t *testing.T) {
	angles := map[string]int{"rzz": 1, "rxx": 1, "ryy": 1, "iswap": 0, "iswapdg": 0}
	if len(angles) != len(formatDefs3) {
		t.Fatalf("formatDefs3 has %d gates, the test %d", len(formatDefs3), len(angles))
	}
	for name, def := range formatDefs3 {
		params := make([]float64, angles[name])
		call := "body"
		if len(params) > 0 {
			params[0], call = 0.83, "body(0.83)"
		}
		g, err := circuit.NewGate(name, params...)
		if err != nil {
			t.Fatal(err)
		}
		renamed := strings.NewReplacer("gate "+name+" ", "gate body ", "gate "+name+"(", "gate body(").Replace(def)
		src := "OPENQASM 3;\ninclude \"stdgates.inc\";\n" + renamed + "\nqubit[2] q;\n" + call + " q[1], q[0];\n"
		if d := maxEntryDiff(unitaryOfSource(t, src), g.Elements()); d > 1e-12 {
			t.Errorf("%s: definition off by %.3g from the library matrix", name, d)
		}
		c := circuit.New(2).Append(g, 1, 0)
		roundTrip3(t, c)
	}
	for _, name := range []string{"u", "sxdg", "ccz"} {
		spec, _ := circuit.Lookup(name)
		g, _ := circuit.NewGate(name, make([]float64, spec.Params)...)
		roundTrip3(t, circuit.New(3).Append(g, seq(spec.Qubits)...))
	}
}
