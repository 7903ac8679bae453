package param_test

import (
	"fmt"

	"qcheck.dev/qcheck/param"
)

// Two rotations about Z merge into one, for every pair of angles and global phase included.
func Example() {
	a, b := param.Var("a"), param.Var("b")
	left := param.New(1).RZ(a, 0).RZ(b, 0)
	right := param.New(1).RZ(a.Plus(b), 0)
	res, err := param.Prove(left, right, param.Options{ExactPhase: true})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(res.Verdict, res.Points, "points")
	for _, d := range res.Degrees {
		fmt.Printf("%s = %d·t, degree %d\n", d.Name, d.Scale, d.Degree)
	}
	fmt.Println(res.Bound <= res.Tolerance)
	// Output:
	// proved 25 points
	// a = 2·t, degree 2
	// b = 2·t, degree 2
	// true
}

// crz(a+2π) is not crz(a), even up to global phase: the control picks up a relative sign. The
// counterexample needs no parameter at all.
func ExampleProve_refuted() {
	a := param.Var("a")
	left := param.New(2).CRZ(a.Plus(param.Pi(2, 1)), 0, 1)
	right := param.New(2).CRZ(a, 0, 1)
	res, _ := param.Prove(left, right, param.Options{})
	f := res.Failure
	fmt.Println(res.Verdict)
	fmt.Printf("a = %v: distance %.6f; free parameters %v\n", f.Pi["a"], f.Distance, f.Needs)
	// Output:
	// refuted
	// a = 0/1: distance 1.414214; free parameters []
}

// Bind gives an ordinary circuit for given values.
func ExampleCircuit_Bind() {
	a := param.Var("a")
	c := param.New(2).RZ(a.Times(2, 1).Minus(param.Pi(1, 2)), 0).CX(0, 1)
	bound, _ := c.Bind(param.Values{"a": 1})
	fmt.Print(c)
	fmt.Println(bound.Ops[0]) // 2 − π/2
	// Output:
	// 2 qubit(s)
	// rz(2a - π/2) q0
	// cx q0,q1
	// rz(0.4292) q0
}
