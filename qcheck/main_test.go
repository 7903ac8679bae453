package qcheck

import (
	"flag"
	"os"
	"testing"
)

// TestMain keeps this package's tests from writing rapid's fail files: many tests fail a
// property on purpose (through a recording handle), and rapid would save each such failure
// under testdata/rapid/. Replays go by the seed rapid prints.
func TestMain(m *testing.M) {
	flag.Parse()
	if err := flag.Set("rapid.nofailfile", "true"); err != nil {
		panic(err)
	}
	os.Exit(m.Run())
}
