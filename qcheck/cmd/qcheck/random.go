package main

import (
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"

	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/qasm"
)

const randomAbout = `
Writes random circuits as OpenQASM 2.0 (or 3 with -version 3), drawn by qcheck's generator
(package gen), so that a compiler written in any language can be fuzzed: generate, compile with
your tool, compare the output with qcheck equiv. The same flags and seed always give the same circuits. One circuit goes
to stdout; with -count N > 1 (or -out), N files DIR/random-SEED.qasm are written for seeds
SEED, SEED+1, ... Each file starts with a comment holding the command that makes it again.
Exit 0, or 2 on bad input or usage.`

func random(args []string, stdout, stderr io.Writer) int {
	c := newCommand("random", "random [flags]", randomAbout, stdout, stderr)
	qubits, gates := new(int), new(int)
	*qubits, *gates = 3, 20
	c.fs.Var((*countFlag)(qubits), "qubits", fmt.Sprintf("`N` qubits per circuit, at most %d (the widest register the reader takes)", qasm.MaxQubits))
	c.fs.Var((*countFlag)(gates), "gates", fmt.Sprintf("`N` ops per circuit, at most %d", maxRandomOps))
	set := c.fs.String("set", "", "gates to draw from, `G1,G2,...` by OpenQASM name (default: "+strings.Join(gen.DefaultGateSet(), ",")+")")
	seed := c.fs.Int("seed", 1, "seed `S` of the first circuit; circuit i has seed S+i")
	count := c.fs.Int("count", 1, "write `N` circuits")
	out := c.fs.String("out", "", "folder `DIR` to write random-SEED.qasm files into (made if missing)")
	version := c.fs.Int("version", 2, "OpenQASM `VERSION` to write: 2 (2.0) or 3")
	motifs := c.fs.Int("motifs", 0, "percentage `P` of draws that place a motif (runs, inverse pairs, repeated blocks) instead of one op")
	if _, code, ok := c.parse(args, 0); !ok {
		return code
	}
	switch {
	case *qubits <= 0:
		return c.fail("-qubits %d: want at least 1", *qubits)
	case *qubits > qasm.MaxQubits:
		return c.fail("-qubits %d: at most %d, the widest register qcheck reads back", *qubits, qasm.MaxQubits)
	case *gates < 0:
		return c.fail("-gates %d: want at least 0", *gates)
	case *gates > maxRandomOps:
		return c.fail("-gates %d: at most %d ops per circuit (a million take the generator about 13 s and 570 MB)", *gates, maxRandomOps)
	case *count <= 0:
		return c.fail("-count %d: want at least 1", *count)
	case *count > 1 && *out == "":
		return c.fail("-count %d needs -out DIR", *count)
	case *version != 2 && *version != 3:
		return c.fail("-version %d: want 2 or 3", *version)
	case *motifs < 0 || *motifs > 100:
		return c.fail("-motifs %d: want a percentage in [0, 100]", *motifs)
	}
	opts := gen.Options{Qubits: *qubits, MinOps: *gates, MaxOps: *gates, Motifs: *motifs}
	if *motifs == 0 {
		opts.Motifs = -1
	}
	if *gates == 0 {
		opts.MaxOps = 1 // gen reads 0 as its default; the circuit is cut to 0 ops below
	}
	if *set != "" {
		for _, name := range strings.Split(*set, ",") {
			name = strings.TrimSpace(name)
			spec, ok := circuit.Lookup(name)
			if g, err := circuit.NewGate(name, make([]float64, spec.Params)...); !ok || err != nil || !g.Unitary() {
				return c.fail("-set: %q is not a gate of the standard library", name)
			}
			if spec.Qubits > *qubits {
				return c.fail("-set: %s acts on %d qubits, more than -qubits %d", name, spec.Qubits, *qubits)
			}
			opts.GateSet = append(opts.GateSet, name)
		}
	}
	if *out != "" {
		if err := os.MkdirAll(*out, 0o755); err != nil {
			return c.fail("%v", err)
		}
	}
	circuits := gen.Circuit(opts)
	for i := 0; i < *count; i++ {
		s := *seed + i
		circ, err := draw(circuits, s)
		if err != nil {
			return c.fail("%v", err)
		}
		if *gates == 0 {
			circ.Ops = nil
		}
		format := qasm.Format
		if *version == 3 {
			format = qasm.Format3
		}
		src, err := format(circ)
		if err != nil {
			return c.fail("seed %d: %v", s, err)
		}
		head := fmt.Sprintf("// qcheck random -qubits %d -gates %d -set %s -motifs %d -seed %d\n",
			*qubits, *gates, strings.Join(opts.GateSet, ","), *motifs, s)
		if len(opts.GateSet) == 0 {
			head = fmt.Sprintf("// qcheck random -qubits %d -gates %d -motifs %d -seed %d\n", *qubits, *gates, *motifs, s)
		}
		if *version == 3 {
			head = strings.Replace(head, " -seed ", " -version 3 -seed ", 1)
		}
		if *out == "" {
			fmt.Fprint(stdout, head)
			stdout.Write(src)
			continue
		}
		name := filepath.Join(*out, fmt.Sprintf("random-%d.qasm", s))
		if err := os.WriteFile(name, append([]byte(head), src...), 0o644); err != nil {
			return c.fail("%v", err)
		}
		fmt.Fprintln(stdout, name)
	}
	return exitOK
}

// maxRandomOps bounds -gates: a million ops take the generator about 13 s and 570 MB on a loaded
// 2-core machine; it is the reader's op limit (qasm.DefaultMaxOps), so that every file random
// writes can be read back.
const maxRandomOps = qasm.DefaultMaxOps

// countFlag is a non-negative count written as an integer or in exponent form (1e6), as people
// write large counts; a value that is not a whole number, or is out of range, is refused.
type countFlag int

func (f *countFlag) String() string { return strconv.Itoa(int(*f)) }

func (f *countFlag) Set(s string) error {
	if n, err := strconv.Atoi(s); err == nil {
		*f = countFlag(n)
		return nil
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || v != math.Trunc(v) || math.Abs(v) > 1<<53 {
		return fmt.Errorf("want a whole number")
	}
	*f = countFlag(v)
	return nil
}

// draw takes the circuit of the given seed. The generator reports impossible options (an unknown
// gate, a gate wider than the register) by panicking outside a test; that becomes an error.
func draw(g interface {
	Example(seed ...int) *circuit.Circuit
}, seed int) (c *circuit.Circuit, err error) {
	defer func() {
		if r := recover(); r != nil {
			msg := fmt.Sprint(r)
			if i := strings.Index(msg, "gen.Options"); i >= 0 {
				msg = msg[i:]
			}
			err = fmt.Errorf("cannot draw a circuit: %s", msg)
		}
	}()
	return g.Example(seed), nil
}
