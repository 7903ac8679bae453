package qcheck

import (
	"testing"

	"pgregory.net/rapid"
)

// The handles users hold in their tests all satisfy TB.
var (
	_ TB = (*testing.T)(nil)
	_ TB = (*testing.B)(nil)
	_ TB = (*rapid.T)(nil)
)
