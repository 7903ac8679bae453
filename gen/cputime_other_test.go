//go:build !unix

package gen

import "testing"

// reportCPU reports nothing where the process's CPU time is not available.
func reportCPU(b *testing.B) func() { return func() {} }
