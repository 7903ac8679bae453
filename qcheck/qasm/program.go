package qasm

import "qcheck.dev/qcheck/circuit"

// Program is a parsed OpenQASM file: the circuit, with every qreg laid end to end in the order
// of declaration (the first qreg's qubit 0 is the circuit's qubit 0), and the registers that say
// which flat index belongs to which name. Likewise every creg is laid end to end to number the
// classical bits that measure writes.
type Program struct {
	Circuit *circuit.Circuit
	// Qregs and Cregs are the quantum and classical registers in the order of declaration.
	Qregs, Cregs []Register
	// Version is the OpenQASM version of the source, 2 or 3; FormatProgram writes the same
	// version (0 is read as 2).
	Version int
	// Inputs are the names of the input parameters of a version 3 source, in the order of
	// declaration, each given its value by the Inputs option.
	Inputs []string
	// Free are the input parameters left free by the FreeInputs option, in the order of
	// declaration. Angles then gives, for each op of Circuit whose angles read them, all its
	// angles (in the order of its Params); Circuit holds placeholders there (each angle with
	// every parameter 0). Both are nil without free parameters.
	Free   []string
	Angles map[int][]Angle
	// Lines gives, for each op of Circuit, the 1-based source line of the statement it came
	// from, so that a report about op k can point into the file.
	Lines []int
}

// Register is one declared register: its name, its size, and the flat index of its element 0.
type Register struct {
	Name  string
	Size  int
	Start int
}

// Qubit returns the circuit's qubit for reg[i], and false when there is no such qubit.
func (p *Program) Qubit(reg string, i int) (int, bool) { return find(p.Qregs, reg, i) }

// Bit returns the circuit's classical bit for reg[i], and false when there is no such bit.
func (p *Program) Bit(reg string, i int) (int, bool) { return find(p.Cregs, reg, i) }

func find(regs []Register, name string, i int) (int, bool) {
	for _, r := range regs {
		if r.Name == name {
			if i < 0 || i >= r.Size {
				return 0, false
			}
			return r.Start + i, true
		}
	}
	return 0, false
}

// Option changes how Parse reads a source. Options compose; the zero set keeps barriers and
// allows DefaultMaxOps ops.
type Option func(*config)

type config struct {
	dropBarriers bool
	maxOps       int
	inputs       map[string]float64
	freeInputs   bool
}

// DefaultMaxOps bounds the ops one source may expand to (gate definitions can double the count
// at each level of nesting), so that a small hostile file cannot exhaust memory or time; the
// command's -max-ops raises it for larger real files.
const DefaultMaxOps = 1 << 20

// operandsPerOp and workPerOp set the source's other limits from MaxOps: its ops may have
// operandsPerOp × MaxOps operands in all (qubits, classical bits and condition bits), and
// expanding its gate calls may take workPerOp × MaxOps steps (each call, barrier and arithmetic
// operation of a gate body counts one).
const (
	operandsPerOp = 4
	workPerOp     = 8
)

func (c config) maxOperands() int { return mulCount(operandsPerOp, c.maxOps) }
func (c config) maxWork() int     { return mulCount(workPerOp, c.maxOps) }

// MaxQubits bounds the total size of the quantum registers of a source, and that of its classical
// registers: a wider declaration is an error at its line and column.
const MaxQubits = 1 << 20

// DropBarriers makes Parse leave barriers out of the circuit. By default they are kept: engines
// skip them, and passes that must not move gates across them can see them.
func DropBarriers() Option { return func(c *config) { c.dropBarriers = true } }

// MaxOps sets how many ops the source may expand to before Parse gives up with an error; n ≤ 0
// means DefaultMaxOps. It also sets the source's other limits: its ops may have 4 × n operands
// in all (qubits, classical bits and the bits conditions read), and expanding its gate calls may
// take 8 × n steps (each call, barrier and arithmetic operation in a gate body is one step, so
// gates with empty bodies and long angle expressions count too).
func MaxOps(n int) Option {
	return func(c *config) {
		if n > 0 {
			c.maxOps = n
		}
	}
}

// Inputs gives values to the input parameters of an OpenQASM 3 source (input angle θ;), by
// name. Without FreeInputs every input a source declares needs a value; ParseProgram records the
// names of those given one in Program.Inputs.
func Inputs(values map[string]float64) Option {
	return func(c *config) {
		c.inputs = make(map[string]float64, len(values))
		for k, v := range values {
			c.inputs[k] = v
		}
	}
}

// FreeInputs makes each input float (or float[64]) of an OpenQASM 3 source that Inputs gives no
// value a free real parameter: ParseProgram lists them in Program.Free and the angles that read
// them in Program.Angles (the qcheck command builds package param's circuits from them). A free
// parameter may appear only in the angles of the rotation and phase gates, affinely with
// rational coefficients; any other use is
// an error at its line and column (see the package documentation).
func FreeInputs() Option { return func(c *config) { c.freeInputs = true } }
