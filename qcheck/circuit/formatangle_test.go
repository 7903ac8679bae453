package circuit

import "testing"

// FormatAngle writes exact multiples of π/8 with π and everything else as a number, so that a
// tiny nonzero angle (the rounding a verdict may be about) is never written as 0 (common
// practice: a printed value must not hide the difference it reports).
func TestFormatAngle(t *testing.T) {
	for _, tc := range []struct {
		a    float64
		want string
	}{
		{0, "0"},
		{-1.8e-15, "-1.8e-15"},
		{3.141592653589793 / 2, "π/2"},
		{-3 * 3.141592653589793 / 4, "-3π/4"},
		{4 * 3.141592653589793, "4π"},
		{0.3, "0.3"},
	} {
		if got := FormatAngle(tc.a); got != tc.want {
			t.Errorf("FormatAngle(%g) = %q, want %q", tc.a, got, tc.want)
		}
	}
}
