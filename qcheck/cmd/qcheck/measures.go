package main

import (
	"encoding/json"
	"fmt"
	"io"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/sim"
)

const measuresAbout = `
Prints every distance and fidelity between the unitaries U of A.qasm and V of B.qasm (same
width, no measure or reset; barriers are ignored), from their dense matrices:
  operator    ‖U − V‖, the largest singular value of the difference
  phase-free  min over φ of ‖U − e^{iφ}V‖, with the φ (radians) that attains it
  diamond     diamond-norm distance of the two unitary channels
  average     average gate fidelity (d + |tr U†V|²)/(d(d+1))
  process     process (entanglement) fidelity |tr U†V|²/d²
With -json, one object with these as operator, phase_free, phase (the φ), diamond,
average_fidelity and process_fidelity.

Cost: every measure works on the dense 2^n × 2^n matrices, and the phase-free and diamond
distances need eigenvalues or singular values, whose cost grows with the cube of the matrix
size, 8 times per added qubit: 10 qubits take about 10 s, 12 took over two minutes. So measures
refuses circuits wider than 10 qubits; for wider ones use qcheck equiv, whose engines scale
further. Exit 0, or 2 on bad input, on circuits wider than 10 qubits, or on bad usage.`

// measuresMaxQubits is the widest circuit measures accepts: its dense routines cost O(8^n), and
// at 12 qubits they took over two minutes and at 13 over 6 GB.
const measuresMaxQubits = 10

// allMeasures is the JSON form of the measures command.
type allMeasures struct {
	Operator        float64 `json:"operator"`
	PhaseFree       float64 `json:"phase_free"`
	Phase           float64 `json:"phase"`
	Diamond         float64 `json:"diamond"`
	AverageFidelity float64 `json:"average_fidelity"`
	ProcessFidelity float64 `json:"process_fidelity"`
}

func measures(args []string, stdout, stderr io.Writer) int {
	c := newCommand("measures", "measures [-json] A.qasm B.qasm", measuresAbout, stdout, stderr)
	asJSON := c.fs.Bool("json", false, "write the measures as one JSON object")
	var limits readLimits
	limits.register(c.fs)
	files, code, ok := c.parse(args, 2)
	if !ok {
		return code
	}
	var m allMeasures
	a, err := limits.load(files[0])
	if err != nil {
		return c.fail("%v", err)
	}
	b, err := limits.load(files[1])
	if err != nil {
		return c.fail("%v", err)
	}
	if err := refuseDirectives(files[0], a, "remove it to compare unitaries"); err != nil {
		return c.fail("%v", err)
	}
	if err := refuseDirectives(files[1], b, "remove it to compare unitaries"); err != nil {
		return c.fail("%v", err)
	}
	if a.Circuit.Qubits() != b.Circuit.Qubits() {
		return c.fail("%s has %d qubits and %s has %d; the measures need equal widths", files[0], a.Circuit.Qubits(), files[1], b.Circuit.Qubits())
	}
	if n := a.Circuit.Qubits(); n > measuresMaxQubits {
		return c.fail("%s and %s have %d qubits, more than the %d that measures handles (its dense matrices cost 8 times more per qubit); use qcheck equiv", files[0], files[1], n, measuresMaxQubits)
	}
	u, err := sim.Unitary(a.Circuit)
	if err != nil {
		return c.fail("%s: %v", files[0], err)
	}
	v, err := sim.Unitary(b.Circuit)
	if err != nil {
		return c.fail("%s: %v", files[1], err)
	}
	m.Operator = metric.Distance(u, v)
	m.PhaseFree, m.Phase = metric.PhaseAlign(u, v)
	m.Diamond = metric.Diamond(u, v)
	m.AverageFidelity = metric.AverageFidelity(u, v)
	m.ProcessFidelity = metric.ProcessFidelity(u, v)
	if *asJSON {
		out, err := json.MarshalIndent(m, "", "  ")
		if err != nil {
			return c.fail("%v", err)
		}
		fmt.Fprintf(stdout, "%s\n", out)
		return exitOK
	}
	fmt.Fprintf(stdout, "operator    %.6g\n", m.Operator)
	fmt.Fprintf(stdout, "phase-free  %.6g  (φ = %.6g: U ≈ e^{iφ}V)\n", m.PhaseFree, m.Phase)
	fmt.Fprintf(stdout, "diamond     %.6g\n", m.Diamond)
	fmt.Fprintf(stdout, "average     %.6g\n", m.AverageFidelity)
	fmt.Fprintf(stdout, "process     %.6g\n", m.ProcessFidelity)
	return exitOK
}
