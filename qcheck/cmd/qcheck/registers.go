package main

import (
	"fmt"
	"slices"
	"strings"

	"qcheck.dev/qcheck/qasm"
)

// registerWords says, in the names of the classical registers both files declare, what the
// report's classical bits c0, c1, … are and, when programs differ, what the outcome that tells
// them apart reads: "outcome 100010 in the files' registers: m[0]=1 c[4]=0 …". It returns "" when
// the files declare different classical registers (the report's numbering is then the only common
// one) or just one register named c, whose c[i] the report's ci already names.
func registerWords(a, b *qasm.Program, outcome string) string {
	regs := a.Cregs
	if !slices.Equal(regs, b.Cregs) || len(regs) == 0 || len(regs) == 1 && regs[0].Name == "c" {
		return ""
	}
	name := func(bit int) string {
		for _, r := range regs {
			if bit >= r.Start && bit < r.Start+r.Size {
				return fmt.Sprintf("%s[%d]", r.Name, bit-r.Start)
			}
		}
		return fmt.Sprintf("c%d", bit) // not declared: the report's own name
	}
	var s strings.Builder
	s.WriteString("\nclassical bits in the files' registers:")
	for _, r := range regs {
		switch r.Size {
		case 0:
		case 1:
			fmt.Fprintf(&s, " c%d is %s[0];", r.Start, r.Name)
		default:
			fmt.Fprintf(&s, " c%d…c%d are %s[0]…%s[%d];", r.Start, r.Start+r.Size-1, r.Name, r.Name, r.Size-1)
		}
	}
	str := strings.TrimSuffix(s.String(), ";") + "\n"
	if outcome != "" {
		words := make([]string, len(outcome))
		for i, v := range outcome { // the highest bit first
			words[i] = fmt.Sprintf("%s=%c", name(len(outcome)-1-i), v)
		}
		str += fmt.Sprintf("outcome %s: %s\n", outcome, strings.Join(words, " "))
	}
	return str
}
