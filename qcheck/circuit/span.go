package circuit

import "fmt"

// Span is a half-open range [Start, End) of op indices in a circuit. An empty span marks a place
// between ops: Span{5, 5} is the gap before op 5.
type Span struct {
	Start int `json:"start"`
	End   int `json:"end"`
}

// Len returns the number of ops in the span.
func (s Span) Len() int { return s.End - s.Start }

// String writes the span for people: "op 7", "ops 7–9", or "nothing (at op 7)" when empty.
func (s Span) String() string {
	switch s.Len() {
	case 0:
		return fmt.Sprintf("nothing (at op %d)", s.Start)
	case 1:
		return fmt.Sprintf("op %d", s.Start)
	}
	return fmt.Sprintf("ops %d–%d", s.Start, s.End-1)
}

// CommonEnds returns the length pre of the longest run of equal ops (Op.Equal) at the start of a
// and b and, in what is left, the length suf of the longest run of equal ops at their end. What
// differs is a.Ops[pre:a.Len()−suf] against b.Ops[pre:b.Len()−suf]; when the circuits act on the
// same register, their unitaries are S·A·P and S·B·P with the same S and P, so a comparison may
// look at A and B only.
func CommonEnds(a, b *Circuit) (pre, suf int) {
	x, y := a.Ops, b.Ops
	for pre < len(x) && pre < len(y) && x[pre].Equal(y[pre]) {
		pre++
	}
	for suf < len(x)-pre && suf < len(y)-pre && x[len(x)-1-suf].Equal(y[len(y)-1-suf]) {
		suf++
	}
	return pre, suf
}
