package qcheck

// TB is the part of a test's handle that qcheck's helpers use. *testing.T, *testing.B,
// *testing.F's inner *testing.T and *rapid.T all satisfy it; testing.TB itself cannot be
// implemented outside the standard library, so qcheck asks for no more than it needs.
type TB interface {
	Helper()
	Logf(format string, args ...any)
	Errorf(format string, args ...any)
	Fatalf(format string, args ...any)
	Failed() bool
}
