package gen

import "pgregory.net/rapid"

// failing returns a generator whose every draw fails the test with err. A
// generator asked for something impossible (a negative width, an unknown
// gate name) says so where the test draws from it, in the test's own
// report, rather than panicking; Generator.Example, which has no test to
// fail, panics with the same message.
func failing[V any](err error) *rapid.Generator[V] {
	return rapid.Custom(func(t *rapid.T) V {
		t.Fatalf("%v", err)
		panic("unreachable: Fatalf returned")
	})
}
