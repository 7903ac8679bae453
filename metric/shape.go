package metric

import (
	"fmt"

	"gonum.org/v1/gonum/mat"
)

// InputError is the value a metric function panics with when its arguments
// break its preconditions: a non-square operator, two operators of different
// sizes, states of different lengths, an empty input or a zero state vector.
// Like gonum's mat.ErrShape it signals a programmer error, not a property of
// the data, so it is raised as a panic rather than returned.
type InputError struct {
	Func   string // the metric function that was called, e.g. "PhaseDistance"
	Detail string // what was wrong, with the sizes seen
}

func (e *InputError) Error() string { return "metric." + e.Func + ": " + e.Detail }

func inputPanic(fn, format string, args ...any) {
	panic(&InputError{Func: fn, Detail: fmt.Sprintf(format, args...)})
}

// squareSize returns the order of the square matrix a, or panics.
func squareSize(fn, name string, a mat.CMatrix) int {
	r, c := a.Dims()
	if r != c {
		inputPanic(fn, "%s is %d×%d, want a square matrix", name, r, c)
	}
	if r == 0 {
		inputPanic(fn, "%s is empty", name)
	}
	return r
}

// pairSize returns the common order of the square matrices u and v, or panics.
func pairSize(fn string, u, v mat.CMatrix) int {
	n := squareSize(fn, "first matrix", u)
	m := squareSize(fn, "second matrix", v)
	if n != m {
		inputPanic(fn, "matrices are %d×%d and %d×%d, want equal sizes", n, n, m, m)
	}
	return n
}

// statePair checks that a and b are non-empty states of equal length.
func statePair(fn string, a, b []complex128) {
	if len(a) != len(b) {
		inputPanic(fn, "states have lengths %d and %d, want equal lengths", len(a), len(b))
	}
	if len(a) == 0 {
		inputPanic(fn, "states are empty")
	}
}

// rowMajor copies the r×c matrix a into dst (length r·c, row-major) and
// returns dst, allocating it when it is nil.
func rowMajor(a mat.CMatrix, dst []complex128) []complex128 {
	r, c := a.Dims()
	if dst == nil {
		dst = make([]complex128, r*c)
	}
	dst = dst[:r*c]
	if d, ok := a.(*mat.CDense); ok {
		raw := d.RawCMatrix()
		for i := 0; i < r; i++ {
			copy(dst[i*c:(i+1)*c], raw.Data[i*raw.Stride:i*raw.Stride+c])
		}
		return dst
	}
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			dst[i*c+j] = a.At(i, j)
		}
	}
	return dst
}
