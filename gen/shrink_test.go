package gen

import (
	"flag"
	"fmt"
	"testing"

	"pgregory.net/rapid"
)

// shrunk runs a property that fails exactly when fails(v) holds for a value v
// drawn from g, lets rapid shrink the failure, and returns the minimal
// counterexample rapid reports. It fails the test if rapid finds no failure.
func shrunk[V any](t *testing.T, g *rapid.Generator[V], fails func(V) bool) V {
	t.Helper()
	nofile := flag.Lookup("rapid.nofailfile")
	old := nofile.Value.String()
	nofile.Value.Set("true") // a probe's failure is expected: write no fail file
	defer nofile.Value.Set(old)

	rec := &recorder{name: t.Name()}
	var last V
	rapid.Check(rec, func(rt *rapid.T) {
		v := g.Draw(rt, "value")
		if fails(v) {
			last = v // rapid replays the minimal case last
			rt.Fatalf("fails")
		}
	})
	if !rec.failed {
		t.Fatalf("rapid found no value of %v that fails the property", g)
	}
	return last
}

// recorder is a rapid.TB that keeps quiet and only remembers whether rapid
// reported a failure, so that a test can look at the shrunk value itself.
type recorder struct {
	name   string
	failed bool
}

func (r *recorder) Helper()                         {}
func (r *recorder) Name() string                    { return r.name + "/shrink-probe" }
func (r *recorder) Logf(format string, args ...any) {}
func (r *recorder) Log(args ...any)                 {}
func (r *recorder) Skipf(format string, args ...any) {
	panic(fmt.Sprintf("shrink probe skipped: "+format, args...))
}
func (r *recorder) Skip(args ...any)                  { panic(fmt.Sprint(args...)) }
func (r *recorder) SkipNow()                          { panic("shrink probe skipped") }
func (r *recorder) Errorf(format string, args ...any) { r.failed = true }
func (r *recorder) Error(args ...any)                 { r.failed = true }
func (r *recorder) Fatalf(format string, args ...any) { r.failed = true }
func (r *recorder) Fatal(args ...any)                 { r.failed = true }
func (r *recorder) FailNow()                          { r.failed = true }
func (r *recorder) Fail()                             { r.failed = true }
func (r *recorder) Failed() bool                      { return r.failed }
