package qcheck

import (
	"flag"
	"fmt"
	"reflect"
	"regexp"
	"runtime"
	"strconv"
	"strings"
	"sync"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Search runs the same campaign as Preserves outside a test, for the command-line tool and
// demos: it returns the shrunk counterexample as a value, or nil when every check passed. Where
// rapid's shrinking stops short, shrink.Minimize finishes it: the input reported is 1-minimal
// (removing any op, lowering any qubit or replacing any angle by a simpler special angle makes
// the failure go away), and its report's "as Go" line rebuilds it; the seed replays rapid's
// search, which ends at rapid's own shrunk input. The
// error reports bad options, or a campaign that failed without a failure of the pass (a panicking
// generator, or a failure rapid could not reproduce).
//
// Search is rapid.Check with a test handle of its own, so rapid's settings apply as in a test:
// the number of checks (-rapid.checks or RAPID_CHECKS, 100 by default) and the seed
// (-rapid.seed or RAPID_SEED, random by default); the Failure reports the seed, with which the
// same pass and generator find the same failure again. Unlike rapid.Check, Search writes no fail
// file into the working directory: it sets rapid's -rapid.nofailfile flag for its duration. It
// runs in the calling goroutine; calls are serialised, and should not run beside rapid.Check in
// parallel tests, which read the same flag.
func Search(pass Pass, g *rapid.Generator[*circuit.Circuit], opts ...Option) (*Failure, error) {
	return search(funcName(pass), pass.subject(), g, opts)
}

// SearchLayout is Search for a pass that reports its final layout.
func SearchLayout(pass LayoutPass, g *rapid.Generator[*circuit.Circuit], opts ...Option) (*Failure, error) {
	return search(funcName(pass), pass.subject(), g, opts)
}

// searching keeps Search calls from overlapping: rapid's settings and fail files are global.
var searching sync.Mutex

func search(name string, s subject, g *rapid.Generator[*circuit.Circuit], opts []Option) (*Failure, error) {
	cfg, err := checkedConfig(s, g, opts)
	if err != nil {
		return nil, fmt.Errorf("qcheck.Search: %w", err)
	}
	searching.Lock()
	defer searching.Unlock()
	if err := testingFlags(); err != nil {
		return nil, err
	}
	if f := flag.Lookup("rapid.nofailfile"); f != nil {
		old := f.Value.String()
		_ = f.Value.Set("true")
		defer func() { _ = f.Value.Set(old) }()
	}
	var last *Failure
	prop := property(cfg, s, g, func(f *Failure) { last = f })
	h := &searchTB{name: "qcheck.Search_" + name}
	rapid.Check(h, prop)
	if !h.failed {
		return nil, nil
	}
	msg := strings.Join(h.errors, "\n")
	if last == nil {
		return nil, fmt.Errorf("qcheck.Search: the campaign failed without a failure of the pass:\n%s", msg)
	}
	if strings.Contains(msg, "flaky test") {
		return nil, fmt.Errorf("qcheck.Search: rapid could not reproduce the failure (is the pass deterministic?):\n%s", msg)
	}
	if m := seedPattern.FindStringSubmatch(msg); m != nil {
		last.Seed, _ = strconv.ParseUint(m[1], 10, 64)
	}
	if m := failFilePattern.FindStringSubmatch(msg); m != nil {
		last.FailFile, _ = strconv.Unquote(m[1])
	}
	if m := passedPattern.FindStringSubmatch(msg); m != nil {
		last.Passed, _ = strconv.Atoi(m[1])
	}
	return minimized(cfg, s, last), nil
}

// testingFlags makes rapid usable outside a test binary: rapid reads testing.Short, which panics
// unless the testing flags are registered (testing.Init) and the command line is parsed. In a
// program that has not parsed its command line, an empty one is parsed.
func testingFlags() error {
	if testing.Testing() {
		return nil
	}
	testing.Init()
	if !flag.Parsed() {
		if err := flag.CommandLine.Parse(nil); err != nil {
			return fmt.Errorf("qcheck.Search: %v", err)
		}
	}
	return nil
}

var (
	seedPattern     = regexp.MustCompile(`-rapid\.seed=(\d+)`)
	failFilePattern = regexp.MustCompile(`-rapid\.failfile=("(?:[^"\\]|\\.)*")`)
	passedPattern   = regexp.MustCompile(`failed after (\d+) tests`)
)

// funcName names a function value for fail-file names: the last element of its package path and
// its name, such as "peephole.MergeRotations".
func funcName(f any) string {
	fn := runtime.FuncForPC(reflect.ValueOf(f).Pointer())
	if fn == nil {
		return "pass"
	}
	name := fn.Name()
	if i := strings.LastIndex(name, "/"); i >= 0 {
		name = name[i+1:]
	}
	return name
}

// searchTB is the test handle Search gives rapid.Check: it records what rapid reports instead of
// failing a test. rapid calls FailNow only as its last step, so FailNow just records.
type searchTB struct {
	name   string
	failed bool
	errors []string
	logs   []string
}

func (h *searchTB) Helper()                    {}
func (h *searchTB) Name() string               { return h.name }
func (h *searchTB) Logf(f string, args ...any) { h.logs = append(h.logs, fmt.Sprintf(f, args...)) }
func (h *searchTB) Log(args ...any)            { h.logs = append(h.logs, fmt.Sprint(args...)) }
func (h *searchTB) Errorf(f string, args ...any) {
	h.failed = true
	h.errors = append(h.errors, fmt.Sprintf(f, args...))
}
func (h *searchTB) Error(args ...any)            { h.Errorf("%s", fmt.Sprint(args...)) }
func (h *searchTB) Fatalf(f string, args ...any) { h.Errorf(f, args...) }
func (h *searchTB) Fatal(args ...any)            { h.Error(args...) }
func (h *searchTB) FailNow()                     { h.failed = true }
func (h *searchTB) Fail()                        { h.failed = true }
func (h *searchTB) Failed() bool                 { return h.failed }
func (h *searchTB) Skipf(f string, args ...any)  { h.Logf(f, args...) }
func (h *searchTB) Skip(args ...any)             { h.Log(args...) }
func (h *searchTB) SkipNow()                     {}
