package circuit_test

import (
	"fmt"
	"go/ast"
	"go/parser"
	"math"
	"reflect"
	"strconv"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// GoString must write, for every gate of the standard library, a call of a builder method that
// exists on *circuit.Circuit with that many arguments of the right kinds; calling the methods it
// names (found by reflection) must rebuild the same circuit. The inverse of iswap used to come out
// as .ISWAPDG(0, 1), a method that does not exist. (A round trip through the code's own text; no
// outside source is needed.)
func TestGoStringCallsExistingBuilders(t *testing.T) {
	for _, spec := range circuit.Standard() {
		c := circuit.New(4)
		qubits := []int{2, 0, 3}[:max(spec.Qubits, 1)]
		switch spec.Name {
		case "measure":
			c.Measure(1, 2)
		case "barrier":
			c.Barrier(3, 1)
		default:
			angles := []float64{-0.75, 1e-7, 2.5}[:spec.Params]
			g, err := circuit.NewGate(spec.Name, angles...)
			if err != nil {
				t.Fatal(err)
			}
			c.Append(g, qubits...)
		}
		if err := c.Validate(); err != nil {
			t.Fatalf("%s: test circuit is ill formed: %v", spec.Name, err)
		}
		code := c.GoString()
		got, err := rebuild(code)
		if err != nil {
			t.Errorf("%s: GoString wrote %s: %v", spec.Name, code, err)
			continue
		}
		if !got.Equal(c) {
			t.Errorf("%s: GoString wrote %s, which builds %v, not %v", spec.Name, code, got.Ops, c.Ops)
		}
	}
}

// rebuild evaluates code of the form circuit.New(n).M(args).M(args)… by calling the methods it
// names on a new circuit through reflection, refusing a method that does not exist or arguments
// that do not fit its signature.
func rebuild(code string) (*circuit.Circuit, error) {
	e, err := parser.ParseExpr(code)
	if err != nil {
		return nil, err
	}
	var calls []*ast.CallExpr
	for {
		call, ok := e.(*ast.CallExpr)
		if !ok {
			return nil, fmt.Errorf("expected a call, found %T", e)
		}
		sel, ok := call.Fun.(*ast.SelectorExpr)
		if !ok {
			return nil, fmt.Errorf("expected a method call, found %T", call.Fun)
		}
		calls = append(calls, call)
		if id, ok := sel.X.(*ast.Ident); ok && id.Name == "circuit" {
			break
		}
		e = sel.X
	}
	first := calls[len(calls)-1]
	if name := first.Fun.(*ast.SelectorExpr).Sel.Name; name != "New" || len(first.Args) != 1 {
		return nil, fmt.Errorf("code starts with circuit.%s, want circuit.New(n)", name)
	}
	n, err := strconv.Atoi(literal(code, first.Args[0]))
	if err != nil {
		return nil, err
	}
	c := reflect.ValueOf(circuit.New(n))
	for i := len(calls) - 2; i >= 0; i-- {
		name := calls[i].Fun.(*ast.SelectorExpr).Sel.Name
		m := c.MethodByName(name)
		if !m.IsValid() {
			return nil, fmt.Errorf("*circuit.Circuit has no method %s", name)
		}
		mt := m.Type()
		args := calls[i].Args
		if !mt.IsVariadic() && len(args) != mt.NumIn() || mt.IsVariadic() && len(args) < mt.NumIn()-1 {
			return nil, fmt.Errorf("%s takes %d argument(s), the code gives %d", name, mt.NumIn(), len(args))
		}
		in := make([]reflect.Value, len(args))
		for k, a := range args {
			kind := reflect.Int
			if k < mt.NumIn() && !(mt.IsVariadic() && k >= mt.NumIn()-1) {
				kind = mt.In(k).Kind()
			}
			text := literal(code, a)
			switch kind {
			case reflect.Int:
				v, err := strconv.Atoi(text)
				if err != nil {
					return nil, fmt.Errorf("%s argument %d: %v", name, k+1, err)
				}
				in[k] = reflect.ValueOf(v)
			case reflect.Float64:
				v, err := strconv.ParseFloat(text, 64)
				if err != nil {
					return nil, fmt.Errorf("%s argument %d: %v", name, k+1, err)
				}
				in[k] = reflect.ValueOf(v)
			default:
				return nil, fmt.Errorf("%s argument %d has kind %v, which GoString cannot write", name, k+1, kind)
			}
		}
		out := m.Call(in)
		if len(out) != 1 || out[0].Type() != c.Type() {
			return nil, fmt.Errorf("%s does not return the circuit for chaining", name)
		}
		c = out[0]
	}
	return c.Interface().(*circuit.Circuit), nil
}

// literal returns the source text of an argument, such as "-0.75" or "3".
func literal(code string, e ast.Expr) string {
	return code[e.Pos()-1 : e.End()-1]
}

func TestGoStringWritesBuilderCalls(t *testing.T) {
	c := circuit.New(3).H(0).CX(0, 1).RZ(0.25, 2).Sdg(1).CP(math.Pi/4, 1, 2).Measure(2, 0)
	want := "circuit.New(3).H(0).CX(0, 1).RZ(0.25, 2).Sdg(1).CP(0.7853981633974483, 1, 2).Measure(2, 0)"
	if got := c.GoString(); got != want {
		t.Errorf("GoString = %q, want %q", got, want)
	}
}
