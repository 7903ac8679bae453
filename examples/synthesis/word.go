package synthesis

import (
	"math"

	"qcheck.dev/qcheck/circuit"
)

// letter is one gate of the set {H, S, S†, T, T†}.
type letter uint8

const (
	letterH letter = iota
	letterS
	letterSdg
	letterT
	letterTdg
	letters
)

// names are the OpenQASM names of the letters.
var names = [letters]string{"h", "s", "sdg", "t", "tdg"}

// elements are the letters as elements of SU(2), each its textbook matrix (Nielsen & Chuang
// Fig. 4.2) divided by a square root of its determinant: T = e^{iπ/8}·rz(π/4), S = e^{iπ/4}·rz(π/2),
// H = i·(−i·(X + Z)/√2).
var elements = [letters]quat{
	letterH:   {0, math.Sqrt2 / 2, 0, math.Sqrt2 / 2},
	letterS:   rotation(math.Pi/2, [3]float64{0, 0, 1}),
	letterSdg: rotation(-math.Pi/2, [3]float64{0, 0, 1}),
	letterT:   rotation(math.Pi/4, [3]float64{0, 0, 1}),
	letterTdg: rotation(-math.Pi/4, [3]float64{0, 0, 1}),
}

// inverses maps each letter to its inverse.
var inverses = [letters]letter{letterH, letterSdg, letterS, letterTdg, letterT}

// word is a sequence of letters in circuit order: the first letter is applied first, so its
// operator is the product of the letters' elements from the last to the first.
type word []letter

// element returns the operator of the word.
func (w word) element() quat {
	q := quat{1, 0, 0, 0}
	for _, l := range w {
		q = elements[l].mul(q)
	}
	return q
}

// inverse returns the word of the inverse operator: reversed, each letter inverted.
func (w word) inverse() word {
	v := make(word, len(w))
	for i, l := range w {
		v[len(w)-1-i] = inverses[l]
	}
	return v
}

// tCount returns the number of T and T† letters.
func (w word) tCount() int {
	n := 0
	for _, l := range w {
		if l == letterT || l == letterTdg {
			n++
		}
	}
	return n
}

// eighths returns the power k of T that a diagonal letter is, T^k = diag(1, e^{ikπ/4}).
func eighths(l letter) int {
	switch l {
	case letterS:
		return 2
	case letterSdg:
		return 6
	case letterT:
		return 1
	case letterTdg:
		return 7
	}
	return 0
}

// diagonal holds the shortest words for T^k, k = 0…7, each with at most one T or T†.
var diagonal = [8]word{
	{}, {letterT}, {letterS}, {letterS, letterT},
	{letterS, letterS}, {letterSdg, letterTdg}, {letterSdg}, {letterTdg},
}

// simplify rewrites a word exactly (global phase included) into a shorter one: runs of diagonal
// letters are merged into a single power of T (T⁸ = I), and H·H cancels. Merging can make new
// neighbours meet, so it works as a stack.
func (w word) simplify() word {
	out := make(word, 0, len(w))
	// pending is the power of T of the diagonal run at the end of out, not yet written.
	pending := 0
	flush := func() {
		out = append(out, diagonal[pending%8]...)
		pending = 0
	}
	for _, l := range w {
		if l != letterH {
			pending += eighths(l)
			continue
		}
		if pending%8 != 0 {
			flush()
			out = append(out, letterH)
			continue
		}
		pending = 0
		if len(out) > 0 && out[len(out)-1] == letterH {
			out = out[:len(out)-1]
			// Pull the diagonal run before the cancelled pair back into pending.
			for len(out) > 0 && out[len(out)-1] != letterH {
				pending += eighths(out[len(out)-1])
				out = out[:len(out)-1]
			}
			continue
		}
		out = append(out, letterH)
	}
	flush()
	return out
}

// appendTo appends the word's gates on qubit q to c.
func (w word) appendTo(c *circuit.Circuit, q int) {
	for _, l := range w {
		switch l {
		case letterH:
			c.H(q)
		case letterS:
			c.S(q)
		case letterSdg:
			c.Sdg(q)
		case letterT:
			c.T(q)
		case letterTdg:
			c.Tdg(q)
		}
	}
}
