package qcheck

import (
	"fmt"
	"testing"

	"pgregory.net/rapid"
)

// The handles users hold in their tests all satisfy TB.
var (
	_ TB = (*testing.T)(nil)
	_ TB = (*testing.B)(nil)
	_ TB = (*rapid.T)(nil)
)

// recordTB is a test handle for rapid.Check that records what rapid reports instead of failing
// the test, so that tests can look at a failure. rapid calls FailNow only as its last step, so
// FailNow just records.
type recordTB struct {
	name   string
	failed bool
	errors []string
	logs   []string
}

func (h *recordTB) Helper()                    {}
func (h *recordTB) Name() string               { return h.name }
func (h *recordTB) Logf(f string, args ...any) { h.logs = append(h.logs, fmt.Sprintf(f, args...)) }
func (h *recordTB) Log(args ...any)            { h.logs = append(h.logs, fmt.Sprint(args...)) }
func (h *recordTB) Errorf(f string, args ...any) {
	h.failed = true
	h.errors = append(h.errors, fmt.Sprintf(f, args...))
}
func (h *recordTB) Error(args ...any)            { h.Errorf("%s", fmt.Sprint(args...)) }
func (h *recordTB) Fatalf(f string, args ...any) { h.Errorf(f, args...) }
func (h *recordTB) Fatal(args ...any)            { h.Error(args...) }
func (h *recordTB) FailNow()                     { h.failed = true }
func (h *recordTB) Fail()                        { h.failed = true }
func (h *recordTB) Failed() bool                 { return h.failed }
func (h *recordTB) Skipf(f string, args ...any)  { h.Logf(f, args...) }
func (h *recordTB) Skip(args ...any)             { h.Log(args...) }
func (h *recordTB) SkipNow()                     {}
