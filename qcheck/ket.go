package qcheck

import (
	"fmt"
	"math"
	"math/cmplx"
	"sort"
	"strconv"
	"strings"

	"qcheck.dev/qcheck/circuit"
)

// Limits of writing a state in words.
const (
	ketMaxTerms   = 8    // terms shown before "…"
	ketNegligible = 1e-6 // amplitudes smaller than this are left out
)

// Ket writes a state of a register of n qubits in words, such as "(|010⟩ + |011⟩)/√2" or
// "0.6|00⟩ + 0.8i|11⟩". Basis states are written |q_{n−1} … q1 q0⟩: qubit 0 is the rightmost
// bit, matching index = Σ_q b_q·2^q. The global phase is chosen to make the first amplitude real
// and positive; amplitudes below 1e-6 are left out and the result is then marked "≈" (unless
// what is left out is rounding noise, below 1e-10); at most 8 terms are written, the largest
// ones.
func Ket(psi []complex128, n int) string {
	if len(psi) == 0 {
		return "(no state)"
	}
	top := -1
	for i, a := range psi {
		if cmplx.Abs(a) >= ketNegligible {
			top = i
			break
		}
	}
	if top < 0 {
		return "0"
	}
	ph := cmplx.Conj(psi[top]) / complex(cmplx.Abs(psi[top]), 0)
	type term struct {
		x int
		a complex128
	}
	var terms []term
	dropped := 0.0
	total := 0.0
	for i, a := range psi {
		total += abs2(a)
		if cmplx.Abs(a) < ketNegligible {
			dropped += abs2(a)
			continue
		}
		terms = append(terms, term{i, a * ph})
	}
	prefix := ""
	if dropped > 1e-20 {
		prefix = "≈ "
	}
	more := 0
	if len(terms) > ketMaxTerms {
		sort.SliceStable(terms, func(i, j int) bool { return cmplx.Abs(terms[i].a) > cmplx.Abs(terms[j].a) })
		more = len(terms) - ketMaxTerms
		terms = terms[:ketMaxTerms]
		sort.Slice(terms, func(i, j int) bool { return terms[i].x < terms[j].x })
		prefix = "≈ "
	}
	tail := ""
	if more > 0 {
		tail = fmt.Sprintf(" + … (%d more terms)", more)
	}

	// Equal magnitudes: write the phases and one normalisation factor.
	r := cmplx.Abs(terms[0].a)
	equal := more == 0
	for _, t := range terms {
		if math.Abs(cmplx.Abs(t.a)-r) > 1e-6 {
			equal = false
		}
	}
	k := len(terms)
	if equal && math.Abs(r*r*float64(k)-total) < 1e-6*total {
		var b strings.Builder
		for i, t := range terms {
			b.WriteString(phaseTerm(t.a/complex(r, 0), i == 0))
			b.WriteString(basisKet(t.x, n))
		}
		if k == 1 {
			return prefix + b.String()
		}
		return prefix + "(" + b.String() + ")/" + rootOf(k)
	}
	var b strings.Builder
	for i, t := range terms {
		b.WriteString(amplitudeTerm(t.a, i == 0))
		b.WriteString(basisKet(t.x, n))
	}
	return prefix + b.String() + tail
}

// basisKet writes |b_{n−1} … b_0⟩.
func basisKet(x, n int) string {
	if n == 0 {
		return "|⟩"
	}
	s := strconv.FormatInt(int64(x), 2)
	if len(s) < n {
		s = strings.Repeat("0", n-len(s)) + s
	}
	return "|" + s + "⟩"
}

// phaseTerm writes a unit-modulus coefficient with its joining sign: "", " + ", " − ", "i",
// " − i", "e^{iπ/4}", "e^{−i0.3}".
func phaseTerm(z complex128, first bool) string {
	var sign, body string
	switch {
	case cmplx.Abs(z-1) < 1e-6:
		sign, body = "+", ""
	case cmplx.Abs(z+1) < 1e-6:
		sign, body = "−", ""
	case cmplx.Abs(z-1i) < 1e-6:
		sign, body = "+", "i"
	case cmplx.Abs(z+1i) < 1e-6:
		sign, body = "−", "i"
	case cmplx.Phase(z) < 0:
		sign, body = "+", "e^{−i"+circuit.FormatAngle(-cmplx.Phase(z))+"}"
	default:
		sign, body = "+", "e^{i"+circuit.FormatAngle(cmplx.Phase(z))+"}"
	}
	return joinSign(sign, body, first)
}

// amplitudeTerm writes a general coefficient to three significant digits.
func amplitudeTerm(z complex128, first bool) string {
	re, im := real(z), imag(z)
	const small = 5e-4
	switch {
	case math.Abs(im) < small*math.Abs(re) && num(math.Abs(re)) == "1":
		return joinSign(signOf(re), "", first)
	case math.Abs(im) < small*math.Abs(re):
		return joinSign(signOf(re), num(math.Abs(re)), first)
	case math.Abs(re) < small*math.Abs(im):
		return joinSign(signOf(im), num(math.Abs(im))+"i", first)
	}
	imSign := "+"
	if im < 0 {
		imSign = "−"
	}
	return joinSign("+", "("+strings.Replace(num(re), "-", "−", 1)+imSign+num(math.Abs(im))+"i)", first)
}

func signOf(x float64) string {
	if x < 0 {
		return "−"
	}
	return "+"
}

func num(x float64) string { return strconv.FormatFloat(x, 'g', 3, 64) }

func joinSign(sign, body string, first bool) string {
	switch {
	case first && sign == "+":
		return body
	case first:
		return "−" + body
	}
	return " " + sign + " " + body
}

// rootOf writes √k simply: 2 for k = 4, 2√2 for k = 8, √3 for k = 3.
func rootOf(k int) string {
	s := int(math.Round(math.Sqrt(float64(k))))
	if s*s == k {
		return strconv.Itoa(s)
	}
	if h := int(math.Round(math.Sqrt(float64(k) / 2))); 2*h*h == k {
		if h == 1 {
			return "√2"
		}
		return "(" + strconv.Itoa(h) + "√2)"
	}
	return "√" + strconv.Itoa(k)
}
