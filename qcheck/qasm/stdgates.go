package qasm

import (
	"sort"
	"sync"
)

// stdgatesNative are the gates of OpenQASM 3's stdgates.inc that are, matrix for matrix with
// their global phase, a gate of package circuit (checked in stdgates_test.go against the
// definitions of the specification): the name in stdgates.inc and the circuit gate.
var stdgatesNative = map[string]string{
	"p": "p", "x": "x", "y": "y", "z": "z", "h": "h", "s": "s", "sdg": "sdg", "t": "t", "tdg": "tdg",
	"sx": "sx", "rx": "rx", "ry": "ry", "rz": "rz", "cx": "cx", "cy": "cy", "cz": "cz", "cp": "cp",
	"crx": "crx", "cry": "cry", "crz": "crz", "ch": "ch", "swap": "swap", "ccx": "ccx",
	"cswap": "cswap", "id": "id", "CX": "cx", "phase": "p", "cphase": "cp", "u1": "p",
}

// prelude3 defines the other gates of stdgates.inc, exactly as the specification defines them,
// global phase included: u3(θ,φ,λ) = gphase(−(φ+λ)/2)·U(θ,φ,λ) = Rz(φ)Ry(θ)Rz(λ) (in circuit
// order rz(λ) first), u2(φ,λ) = u3(π/2,φ,λ), and cu(θ,φ,λ,γ) = p(γ) on the control, then the
// controlled U.
const prelude3 = `
gate u3(θ, φ, λ) q { rz(λ) q; ry(θ) q; rz(φ) q; }
gate u2(φ, λ) q { rz(λ) q; ry(π/2) q; rz(φ) q; }
gate cu(θ, φ, λ, γ) c, t { p(γ) c; ctrl @ U(θ, φ, λ) c, t; }
`

// formatDefs3 are the definitions the 3 writer gives for gates of package circuit that
// stdgates.inc lacks; each is exact (rzz = CX·(I⊗Rz)·CX; rxx and ryy conjugate rzz; iswap and
// iswapdg as in formatDefs), and the reader reads a definition that matches one token for token
// back as the gate itself.
var formatDefs3 = map[string]string{
	"rzz":     "gate rzz(theta) a, b { cx a, b; rz(theta) b; cx a, b; }",
	"rxx":     "gate rxx(theta) a, b { h a; h b; cx a, b; rz(theta) b; cx a, b; h a; h b; }",
	"ryy":     "gate ryy(theta) a, b { rx(pi/2) a; rx(pi/2) b; cx a, b; rz(theta) b; cx a, b; rx(-pi/2) a; rx(-pi/2) b; }",
	"iswap":   "gate iswap a, b { s a; s b; h a; cx a, b; cx b, a; h b; }",
	"iswapdg": "gate iswapdg a, b { h b; cx b, a; cx a, b; h a; sdg b; sdg a; }",
}

var (
	stdOnce sync.Once
	stdDefs map[string]*gateDef
)

// keywords3 are the gates OpenQASM 3 has without any include: U, which is the u of package
// circuit exactly, and gphase.
func keywords3() map[string]*gateDef {
	u := builtins()["U"]
	return map[string]*gateDef{
		"U":      {name: "U", native: "u", nparams: 3, nqubits: 1, params: u.params, keyword: true},
		"gphase": {name: "gphase", phase: true, nparams: 1, params: []string{"γ"}, keyword: true},
	}
}

// stdgates returns the gates include "stdgates.inc" provides.
func stdgates() map[string]*gateDef {
	stdOnce.Do(func() {
		gates := keywords3()
		for name, native := range stdgatesNative {
			d := *builtins()[native]
			d.name = name
			gates[name] = &d
		}
		p := &parser{src: []byte(prelude3), lx: lexer{src: []byte(prelude3), v3: true}, cfg: config{maxOps: 1 << 10},
			gates: gates, regs: map[string]*register{}}
		p3 := &parser3{parser: p}
		if err := p.advance(); err != nil {
			panic("qasm: built-in stdgates: " + err.Error())
		}
		if err := p3.program(); err != nil {
			panic("qasm: built-in stdgates: " + err.Error())
		}
		stdDefs = map[string]*gateDef{}
		for name, d := range gates {
			if !d.keyword {
				d.user = false
				stdDefs[name] = d
			}
		}
	})
	return stdDefs
}

// Stdgates returns the names of the gates a source may call after include "stdgates.inc",
// sorted.
func Stdgates() []string {
	var out []string
	for name := range stdgates() {
		out = append(out, name)
	}
	sort.Strings(out)
	return out
}
