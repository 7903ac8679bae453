package qasm

import (
	"bytes"
	"fmt"
	"math"
	"math/cmplx"
	"sort"
	"strconv"
	"strings"

	"qcheck.dev/qcheck/circuit"
)

// Format writes the circuit as OpenQASM 2.0 with one quantum register q and, when the circuit
// has classical bits, one classical register c. Gates of package circuit that qelib1.inc lacks
// (iswap, iswapdg, ccz, ryy) are written as gate definitions in qelib1's gates, exact including
// global phase, which Parse reads back as the gates themselves. A single-qubit custom gate is
// written as a definition u(θ,φ,λ) followed, when its matrix has a global phase e^{iα} relative
// to u, by p(α) x p(α) x, which is e^{iα}·I exactly; Parse reads such a definition back as those
// gates, not as the custom gate. Custom gates on more than one qubit have no exact decomposition
// here and are an error naming the op. Angles are printed in the shortest form that reads back
// to the same float64.
func Format(c *circuit.Circuit) ([]byte, error) {
	if c == nil {
		return nil, fmt.Errorf("qasm: Format of a nil circuit")
	}
	if err := c.Validate(); err != nil {
		return nil, err
	}
	q, cr := soleRegisters(c)
	return write(c, q, cr, 2)
}

// soleRegisters returns the registers Format and Format3 write: q over every qubit and, when
// the circuit has classical bits, c over every bit a measure writes or a condition reads.
func soleRegisters(c *circuit.Circuit) (q, cr []Register) {
	if c.Qubits() > 0 {
		q = []Register{{Name: "q", Size: c.Qubits()}}
	}
	nc := c.Bits()
	if nc > 0 {
		cr = []Register{{Name: "c", Size: nc}}
	}
	return q, cr
}

// FormatProgram writes the program's circuit with its own register names and sizes, so that
// ParseProgram(FormatProgram(p)) has the same registers. The registers must cover the circuit.
func FormatProgram(p *Program) ([]byte, error) {
	if p == nil || p.Circuit == nil {
		return nil, fmt.Errorf("qasm: FormatProgram of a nil program or circuit")
	}
	if err := p.Circuit.Validate(); err != nil {
		return nil, err
	}
	for k, regs := range [][]Register{p.Qregs, p.Cregs} {
		seen := map[string]bool{}
		for _, r := range regs {
			physical := r.Name == "$" && k == 0 && p.Version == 3 && len(regs) == 1
			valid := validIdent(r.Name)
			if p.Version == 3 {
				valid = validIdent3(r.Name, needsStdgates(p.Circuit))
			}
			if !physical && !valid || seen[r.Name] || r.Size <= 0 {
				return nil, fmt.Errorf("qasm: register %q: name must be a fresh identifier and size positive", r.Name)
			}
			seen[r.Name] = true
		}
	}
	return write(p.Circuit, p.Qregs, p.Cregs, p.Version)
}

// flat maps flat indices to reg[i] strings.
func flat(regs []Register, n int, what string) ([]string, error) {
	out := make([]string, n)
	for _, r := range regs {
		for i := 0; i < r.Size; i++ {
			if k := r.Start + i; k >= 0 && k < n {
				if r.Name == "$" {
					out[k] = "$" + strconv.Itoa(i) // physical qubits of OpenQASM 3
				} else {
					out[k] = r.Name + "[" + strconv.Itoa(i) + "]"
				}
			}
		}
	}
	for k, s := range out {
		if s == "" {
			return nil, fmt.Errorf("qasm: %s %d belongs to no register", what, k)
		}
	}
	return out, nil
}

// write writes the circuit with the given registers as OpenQASM of the given version (3, or 2
// for anything else).
func write(c *circuit.Circuit, qregs, cregs []Register, version int) ([]byte, error) {
	v3 := version == 3
	defsOf := formatDefs
	if v3 {
		defsOf = formatDefs3
	}
	qn, err := flat(qregs, c.Qubits(), "qubit")
	if err != nil {
		return nil, err
	}
	nc := 0
	for _, r := range cregs {
		nc = max(nc, r.Start+r.Size)
	}
	cn, err := flat(cregs, nc, "classical bit") // bits past the registers are refused at the op that names them
	if err != nil {
		return nil, err
	}
	for i, op := range c.Ops {
		for _, b := range op.Bits {
			if b >= len(cn) {
				return nil, fmt.Errorf("qasm: op %d (%s) writes classical bit %d, outside the classical registers", i, op.Gate.Name, b)
			}
		}
		if op.If != nil {
			for _, b := range op.If.Bits {
				if b >= len(cn) {
					return nil, fmt.Errorf("qasm: op %d (%s) is conditioned on classical bit %d, outside the classical registers", i, op.Gate.Name, b)
				}
			}
		}
	}
	var defs bytes.Buffer
	defined := map[string]circuit.Gate{}
	var names []string
	for i, op := range c.Ops {
		g := op.Gate
		if _, ok := defined[g.Name]; ok && !g.IsCustom() {
			continue
		}
		switch {
		case g.IsCustom():
			if old, ok := defined[g.Name]; ok {
				if !old.Equal(g) {
					return nil, fmt.Errorf("qasm: op %d: two different custom gates are named %s", i, g.Name)
				}
				continue
			}
			def, err := customDef(g, v3)
			if err != nil {
				return nil, fmt.Errorf("qasm: op %d (%s): %v", i, g.Name, err)
			}
			defined[g.Name] = g
			names = append(names, def)
		case defsOf[g.Name] != "":
			defined[g.Name] = g
			names = append(names, defsOf[g.Name])
		}
	}
	sort.Strings(names) // deterministic; no definition uses another
	for _, d := range names {
		defs.WriteString(d)
		defs.WriteByte('\n')
	}

	var b bytes.Buffer
	b.Grow(32 * len(c.Ops))
	switch {
	case v3 && needsStdgates(c):
		b.WriteString("OPENQASM 3.0;\ninclude \"stdgates.inc\";\n")
	case v3:
		b.WriteString("OPENQASM 3.0;\n")
	default:
		b.WriteString("OPENQASM 2.0;\ninclude \"qelib1.inc\";\n")
	}
	b.Write(defs.Bytes())
	for _, r := range qregs {
		switch {
		case v3 && r.Name == "$":
		case v3:
			fmt.Fprintf(&b, "qubit[%d] %s;\n", r.Size, r.Name)
		default:
			fmt.Fprintf(&b, "qreg %s[%d];\n", r.Name, r.Size)
		}
	}
	for _, r := range cregs {
		if v3 {
			fmt.Fprintf(&b, "bit[%d] %s;\n", r.Size, r.Name)
		} else {
			fmt.Fprintf(&b, "creg %s[%d];\n", r.Name, r.Size)
		}
	}
	var num []byte
	for i, op := range c.Ops {
		if v3 {
			writeOp3(&b, op, qn, cn, cregs)
			continue
		}
		if op.If != nil {
			r, ok := wholeRegister(op.If, cregs)
			if !ok {
				return nil, fmt.Errorf("qasm: op %d (%s): its condition %s is not a whole classical register compared with ==, which is all OpenQASM 2.0 can write",
					i, op.Gate.Name, conditionText(op.If, cn))
			}
			fmt.Fprintf(&b, "if(%s==%d) ", r.Name, op.If.Value)
		}
		b.WriteString(op.Gate.Name)
		if len(op.Gate.Params) > 0 && !op.Gate.IsCustom() {
			b.WriteByte('(')
			for k, v := range op.Gate.Params {
				if k > 0 {
					b.WriteByte(',')
				}
				num = appendAngle(num[:0], v)
				b.Write(num)
			}
			b.WriteByte(')')
		}
		for k, qb := range op.Qubits {
			if k == 0 {
				b.WriteByte(' ')
			} else {
				b.WriteByte(',')
			}
			b.WriteString(qn[qb])
		}
		if op.Gate.Name == "measure" {
			b.WriteString(" -> ")
			b.WriteString(cn[op.Bits[0]])
		}
		b.WriteString(";\n")
	}
	return b.Bytes(), nil
}

// wholeRegister returns the register whose bits, element 0 first, are exactly the condition's,
// when the condition tests equality.
func wholeRegister(c *circuit.Condition, regs []Register) (Register, bool) {
	if c.Not || len(c.Bits) == 0 {
		return Register{}, false
	}
	for _, r := range regs {
		if r.Size != len(c.Bits) {
			continue
		}
		ok := true
		for i, bit := range c.Bits {
			ok = ok && bit == r.Start+i
		}
		if ok {
			return r, true
		}
	}
	return Register{}, false
}

// conditionText writes a condition for an error message with the bits' register names.
func conditionText(c *circuit.Condition, names []string) string {
	var b strings.Builder
	for i, bit := range c.Bits {
		if i > 0 {
			b.WriteByte(',')
		}
		if bit >= 0 && bit < len(names) {
			b.WriteString(names[bit])
		} else {
			fmt.Fprintf(&b, "bit %d", bit)
		}
	}
	op := "=="
	if c.Not {
		op = "!="
	}
	fmt.Fprintf(&b, "%s%d", op, c.Value)
	return b.String()
}

// appendAngle writes v in the shortest decimal form that parses back to v exactly. OpenQASM 2.0
// wants a decimal point before an exponent, so 1e-05 is written 1.0e-05.
func appendAngle(dst []byte, v float64) []byte {
	start := len(dst)
	dst = strconv.AppendFloat(dst, v, 'g', -1, 64)
	num := dst[start:]
	e := bytes.IndexByte(num, 'e')
	if e >= 0 && bytes.IndexByte(num[:e], '.') < 0 {
		tail := append([]byte(".0"), num[e:]...)
		dst = append(dst[:start+e], tail...)
	}
	return dst
}

// customDef writes a single-qubit custom gate as a definition: M = e^{iα} u(θ,φ,λ). In
// OpenQASM 3 the phase is gphase(α); in 2.0 it is p(α) x p(α) x.
func customDef(g circuit.Gate, v3 bool) (string, error) {
	if g.Qubits() != 1 {
		return "", fmt.Errorf("custom gates on %d qubits cannot be written as OpenQASM (only single-qubit custom gates have an exact decomposition here)", g.Qubits())
	}
	if !validGateName(g.Name) || v3 && (reserved3[g.Name] || stdgates()[g.Name] != nil) {
		return "", fmt.Errorf("custom gate name %q is not an OpenQASM identifier or is taken", g.Name)
	}
	m := g.Elements()
	alpha, theta, phi, lambda := eulerAngles(m[0], m[1], m[2], m[3])
	var b []byte
	b = append(b, "gate "...)
	b = append(b, g.Name...)
	if v3 {
		b = append(b, " a { U("...)
	} else {
		b = append(b, " a { u("...)
	}
	for k, v := range []float64{theta, phi, lambda} {
		if k > 0 {
			b = append(b, ',')
		}
		b = appendAngle(b, v)
	}
	b = append(b, ") a;"...)
	if alpha != 0 && v3 {
		b = append(b, " gphase("...)
		b = appendAngle(b, alpha)
		b = append(b, ");"...)
	} else if alpha != 0 {
		ph := appendAngle(nil, alpha)
		b = append(b, " p("...)
		b = append(b, ph...)
		b = append(b, ") a; x a; p("...)
		b = append(b, ph...)
		b = append(b, ") a; x a;"...)
	}
	b = append(b, " }"...)
	return string(b), nil
}

// eulerAngles returns α, θ, φ, λ with [[a, b], [c, d]] = e^{iα} u(θ, φ, λ) for a unitary matrix,
// where u(θ,φ,λ) = [[cos(θ/2), −e^{iλ}sin(θ/2)], [e^{iφ}sin(θ/2), e^{i(φ+λ)}cos(θ/2)]].
func eulerAngles(a, b, c, d complex128) (alpha, theta, phi, lambda float64) {
	theta = 2 * math.Atan2(cmplx.Abs(c), cmplx.Abs(a))
	if cmplx.Abs(a) >= cmplx.Abs(c) {
		// cos(θ/2) ≥ sin(θ/2) > 0: a fixes α, c fixes φ (when nonzero), d fixes φ+λ.
		alpha = cmplx.Phase(a)
		if c != 0 {
			phi = cmplx.Phase(c) - alpha
		}
		lambda = cmplx.Phase(d) - alpha - phi
		return
	}
	// sin(θ/2) > cos(θ/2): c fixes α+φ, −b fixes α+λ, and d (when nonzero) fixes α+φ+λ.
	if d != 0 {
		alpha = cmplx.Phase(c) + cmplx.Phase(-b) - cmplx.Phase(d)
	} else {
		alpha = cmplx.Phase(c)
	}
	phi = cmplx.Phase(c) - alpha
	lambda = cmplx.Phase(-b) - alpha
	return
}

// validIdent reports whether s is an identifier that is not a reserved word, so that it can name
// a register in a written file.
func validIdent(s string) bool {
	if s == "" || !isLetter(s[0]) || reserved[s] {
		return false
	}
	for i := 0; i < len(s); i++ {
		if !isLetter(s[i]) && !isDigit(s[i]) {
			return false
		}
	}
	return true
}

// validGateName reports whether s can name a new gate in a written file: an identifier that is
// not reserved and not a gate that qelib1.inc or package circuit already has.
func validGateName(s string) bool {
	if !validIdent(s) {
		return false
	}
	if _, ok := builtins()[s]; ok {
		return false
	}
	_, ok := circuit.Lookup(s)
	return !ok
}
