package gen

import (
	"flag"
	"fmt"
	"strings"
	"testing"

	"pgregory.net/rapid"
)

// shrunk runs a property that fails exactly when fails(v) holds for a value v
// drawn from g, lets rapid shrink the failure, and returns the minimal
// counterexample rapid reports. It fails the test if rapid finds no failure.
func shrunk[V any](t *testing.T, g *rapid.Generator[V], fails func(V) bool) V {
	t.Helper()
	minimal, _ := shrunkFrom(t, g, fails)
	return minimal
}

// shrunkFrom is shrunk that also returns the first failing value rapid found,
// the one it shrank from.
func shrunkFrom[V any](t *testing.T, g *rapid.Generator[V], fails func(V) bool) (minimal, first V) {
	t.Helper()
	// A probe's failure is expected: write no fail file. Fix the seed and
	// the number of cases so that the case rapid shrinks from is the same on
	// every run, and give the shrinker time enough on a busy machine, so that
	// where it ends does not depend on the load.
	defer setFlag(t, "rapid.nofailfile", "true")()
	defer setFlag(t, "rapid.seed", "12345")()
	defer setFlag(t, "rapid.checks", "1000")()
	defer setFlag(t, "rapid.shrinktime", "10m")()

	rec := &recorder{name: t.Name()}
	found := false
	rapid.Check(rec, func(rt *rapid.T) {
		v := g.Draw(rt, "value")
		if fails(v) {
			if !found {
				first, found = v, true
			}
			minimal = v // rapid replays the minimal case last
			rt.Fatalf("fails")
		}
	})
	if !rec.failed {
		t.Fatalf("rapid found no value of %v that fails the property", g)
	}
	return minimal, first
}

// recorder is a rapid.TB that keeps quiet and only remembers whether rapid
// reported a failure, and with what messages, so that a test can look at the
// shrunk value or the report itself.
type recorder struct {
	name   string
	failed bool
	msgs   []string
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
func (r *recorder) Errorf(format string, args ...any) { r.fail(fmt.Sprintf(format, args...)) }
func (r *recorder) Error(args ...any)                 { r.fail(fmt.Sprint(args...)) }
func (r *recorder) Fatalf(format string, args ...any) { r.fail(fmt.Sprintf(format, args...)) }
func (r *recorder) Fatal(args ...any)                 { r.fail(fmt.Sprint(args...)) }
func (r *recorder) fail(msg string)                   { r.failed, r.msgs = true, append(r.msgs, msg) }
func (r *recorder) FailNow()                          { r.failed = true }
func (r *recorder) Fail()                             { r.failed = true }
func (r *recorder) Failed() bool                      { return r.failed }

// report runs rapid.Check on a property that draws one value of g and returns
// whether rapid failed and everything it wrote.
func report[V any](t *testing.T, g *rapid.Generator[V]) (bool, string) {
	t.Helper()
	defer setFlag(t, "rapid.nofailfile", "true")()
	rec := &recorder{name: t.Name()}
	rapid.Check(rec, func(rt *rapid.T) { g.Draw(rt, "value") })
	return rec.failed, strings.Join(rec.msgs, "\n")
}

func TestImpossibleArgumentsFailTheDraw(t *testing.T) {
	for _, c := range []struct {
		name string
		run  func() (bool, string)
		want string
	}{
		{"Unitary(-1)", func() (bool, string) { return report(t, Unitary(-1)) }, "gen.Unitary: qubits = -1"},
		{"Unitary(13)", func() (bool, string) { return report(t, Unitary(13)) }, "want 0 ≤ qubits ≤ 12"},
		{"State(25)", func() (bool, string) { return report(t, State(25)) }, "gen.State: qubits = 25"},
		{"Clifford(0)", func() (bool, string) { return report(t, Clifford(0)) }, "gen.Clifford: qubits = 0"},
		{"Layout(-2)", func() (bool, string) { return report(t, Layout(-2)) }, "gen.Layout: qubits = -2"},
		{"Coupling", func() (bool, string) { return report(t, Coupling(Ring, -3)) }, "gen.Coupling: gen: ring graph with -3 qubits"},
	} {
		failed, out := c.run()
		if !failed || !strings.Contains(out, c.want) {
			t.Errorf("%s: failed=%v, report %q; want a failure containing %q", c.name, failed, out, c.want)
		}
	}
}

// setFlag sets one of rapid's flags and returns the function that restores
// it. Tests in this package do not run in parallel.
func setFlag(t *testing.T, name, value string) (restore func()) {
	t.Helper()
	f := flag.Lookup(name)
	if f == nil {
		t.Fatalf("rapid registers no -%s flag", name)
	}
	old := f.Value.String()
	if err := f.Value.Set(value); err != nil {
		t.Fatal(err)
	}
	return func() { f.Value.Set(old) }
}
