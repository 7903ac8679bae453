package circuit_test

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// 2π·2050 evaluated in float64 is not a multiple of π/2: it lies 1.0e-12 below 4100π, an offset
// float64 arithmetic (x − round(x/(π/2))·π/2) computes as 0. QuarterTurns finds it exactly.
func ExampleQuarterTurns() {
	x := 2 * 3.141592653589793
	x *= 2050
	k, offset := circuit.QuarterTurns(x)
	fmt.Printf("K mod 8 = %d, offset = %.4g\n", k, offset)
	// Output:
	// K mod 8 = 0, offset = -9.995e-13
}
