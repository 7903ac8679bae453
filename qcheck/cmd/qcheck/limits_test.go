package main

import (
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

// Issue 17, reproducer 10: qcheck equiv /dev/zero x read until memory ran out, and a named pipe
// nobody writes to blocked for ever. Both are refused (exit 2) with the limit and the flag that
// raises it; a regular file over the limit is refused before it is read; a pipe within the limits
// is read.
func TestInputLimits(t *testing.T) {
	dir := t.TempDir()
	ok := filepath.Join(dir, "ok.qasm")
	if err := os.WriteFile(ok, []byte("OPENQASM 2.0;\nqreg q[1];\nU(0,0,0) q[0];\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	fifo := filepath.Join(dir, "fifo")
	if err := syscall.Mkfifo(fifo, 0o600); err != nil {
		t.Skipf("no named pipes here: %v", err)
	}
	for _, tc := range []struct {
		args  []string
		words string
	}{
		{[]string{"equiv", "-max-input", "1000", "/dev/zero", ok}, "holds more than the 1000 bytes the input limit allows (raise it with -max-input)"},
		{[]string{"equiv", "-read-timeout", "200ms", fifo, ok}, "not read to its end within 200ms (raise it with -read-timeout)"},
		{[]string{"equiv", "-max-input", "10", ok, ok}, "ok.qasm is 40 bytes, more than the 10 the input limit allows"},
		{[]string{"measures", "-max-input", "10", ok, ok}, "more than the 10"},
		{[]string{"equiv", dir, ok}, "is a directory"},
	} {
		start := time.Now()
		code, _, errOut := runCmd(tc.args...)
		if code != exitBadUsed || !strings.Contains(errOut, tc.words) {
			t.Errorf("qcheck %s: exit %d, stderr %q; want exit 2 and …%s…", strings.Join(tc.args, " "), code, errOut, tc.words)
		}
		if d := time.Since(start); d > 3*time.Second {
			t.Errorf("qcheck %s took %v", strings.Join(tc.args, " "), d)
		}
	}
	// The default limits refuse /dev/zero without a flag: 64 MiB are read, then refused (or, on a
	// loaded machine, the 3 s read timeout comes first).
	if testing.Short() {
		return
	}
	if code, _, errOut := runCmd("equiv", "/dev/zero", ok); code != exitBadUsed ||
		!strings.Contains(errOut, "67108864 bytes") && !strings.Contains(errOut, "not read to its end within 3s") {
		t.Errorf("/dev/zero at the default limit: exit %d, %q", code, errOut)
	}
	// A pipe with a writer is read. (A fresh pipe: the reader that timed out above still waits
	// on the first.)
	fifo = filepath.Join(dir, "fifo2")
	if err := syscall.Mkfifo(fifo, 0o600); err != nil {
		t.Fatal(err)
	}
	go func() {
		f, err := os.OpenFile(fifo, os.O_WRONLY, 0)
		if err == nil {
			f.Write([]byte("OPENQASM 2.0;\nqreg q[1];\n"))
			f.Close()
		}
	}()
	if code, out, errOut := runCmd("equiv", fifo, ok); code != exitOK {
		t.Errorf("pipe with a writer: exit %d, %s%s", code, out, errOut)
	}
}

// Issue 17, reproducer 12 (random): -gates 1e9 died of memory, -qubits 2000000 wrote files the
// reader refuses. Both are refused with the limit; exponent form is read as a count.
func TestRandomLimits(t *testing.T) {
	for _, tc := range []struct {
		args  []string
		words string
	}{
		{[]string{"random", "-gates", "1e9"}, "-gates 1000000000: at most 1048576 ops per circuit"},
		{[]string{"random", "-qubits", "2000000"}, "-qubits 2000000: at most 1048576"},
		{[]string{"random", "-gates", "2.5"}, "want a whole number"},
	} {
		code, _, errOut := runCmd(tc.args...)
		if code != exitBadUsed || !strings.Contains(errOut, tc.words) {
			t.Errorf("qcheck %s: exit %d, stderr %q", strings.Join(tc.args, " "), code, errOut)
		}
	}
	if code, out, errOut := runCmd("random", "-gates", "1e1", "-qubits", "2"); code != exitOK || strings.Count(out, ";\n") != 10+3 {
		t.Errorf("-gates 1e1: exit %d, %s%s", code, out, errOut)
	}
}
