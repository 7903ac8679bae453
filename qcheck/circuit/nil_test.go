package circuit

import (
	"strings"
	"testing"
)

// Issue 17, reproducer 11: bad values once panicked. A nil circuit reads as empty, an ill-formed
// Gate literal is its own inverse and Validate reports it, and adding to a nil circuit is a
// programmer error with a message naming the method (the documented rule, as in gonum).
func TestNilAndIllFormedValues(t *testing.T) {
	var c *Circuit
	if c.Qubits() != 0 || c.Bits() != 0 || c.Len() != 0 || c.Clone() != nil || c.Inverse() != nil || !c.Unitary() {
		t.Error("a nil circuit does not read as empty")
	}
	if !c.Equal(nil) || c.Equal(New(0)) || New(0).Equal(nil) {
		t.Error("nil equals only nil")
	}
	if c.Validate() == nil {
		t.Error("Validate accepted a nil circuit")
	}
	if d := New(2).H(0).Compose(nil); d.Len() != 1 || d.Validate() != nil {
		t.Errorf("Compose(nil) changed the circuit: %v", d.Ops)
	}

	g := Gate{Name: "u", Params: []float64{1}}
	if inv := g.Inverse(); !inv.Equal(g) {
		t.Errorf("ill-formed u inverted to %v", inv)
	}
	if g.Matrix() != nil {
		t.Error("ill-formed u has a matrix")
	}
	if err := New(1).Append(g, 0).Inverse().Validate(); err == nil || !strings.Contains(err.Error(), "takes 3 angle(s), got 1") {
		t.Errorf("Validate of the inverse: %v", err)
	}

	for name, add := range map[string]func(){
		"h":       func() { c.H(0) },
		"Compose": func() { c.Compose(New(1)) },
		"Append":  func() { c.Append(Gate{Name: "x"}, 0) },
	} {
		func() {
			defer func() {
				if v := recover(); v == nil || !strings.Contains(v.(string), name+" on a nil *Circuit") {
					t.Errorf("%s on nil: recovered %v", name, v)
				}
			}()
			add()
		}()
	}
}
