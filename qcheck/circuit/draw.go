package circuit

import (
	"fmt"
	"strings"
	"unicode/utf8"
)

// DrawWidth is the line width String wraps its drawing at, so that a failing test's log stays
// readable in a terminal.
const DrawWidth = 100

// String draws the circuit as text, one row per qubit (qubit 0 on top) and time running left to
// right, wrapped at DrawWidth columns. Controls are ●, swap ends ×, and a vertical bar joins the
// operands of a multi-qubit gate. A classically controlled op carries its condition on its last
// operand ("X if c5==1"). Ops are ordered through the classical bits as well as the qubits: a
// condition is drawn after every earlier measurement writing a bit it reads, and a measurement
// after every earlier op reading or writing its bit. An ill-formed circuit is listed op by op instead, and a nil
// circuit is written as "(nil circuit)" so that a failure report can always print it.
func (c *Circuit) String() string {
	if c == nil {
		return "(nil circuit)\n"
	}
	if err := c.Validate(); err != nil {
		var b strings.Builder
		fmt.Fprintf(&b, "ill-formed circuit on %d qubits (%v):\n", c.qubits, err)
		for i, op := range c.Ops {
			fmt.Fprintf(&b, "  %d: %s\n", i, op)
		}
		return b.String()
	}
	if c.qubits == 0 {
		return "(empty register)\n"
	}
	rows := 2*c.qubits - 1 // qubit rows and the gaps between them
	var columns [][]string // each column holds one cell per row
	var widths []int
	var busy []int // last column used by each qubit row
	busy = make([]int, c.qubits)
	for i := range busy {
		busy[i] = -1
	}
	// The last column that writes, and that reads or writes, each classical bit.
	written, used := map[int]int{}, map[int]int{}
	for _, op := range c.Ops {
		lo, hi := span(op.Qubits)
		col := 0
		for q := lo; q <= hi; q++ {
			col = max(col, busy[q]+1)
		}
		for _, b := range op.Bits {
			if k, ok := used[b]; ok {
				col = max(col, k+1)
			}
		}
		if op.If != nil {
			for _, b := range op.If.Bits {
				if k, ok := written[b]; ok {
					col = max(col, k+1)
				}
			}
			for _, b := range op.If.Bits {
				used[b] = max(used[b], col)
			}
		}
		for _, b := range op.Bits {
			written[b], used[b] = col, col
		}
		for col >= len(columns) {
			columns = append(columns, make([]string, rows))
			widths = append(widths, 1)
		}
		labels := opLabels(op)
		if op.If != nil {
			labels[len(labels)-1] += " " + op.If.text()
		}
		for k, q := range op.Qubits {
			columns[col][2*q] = labels[k]
			widths[col] = max(widths[col], utf8.RuneCountInString(labels[k]))
		}
		for r := 2 * lo; r <= 2*hi; r++ {
			if columns[col][r] == "" {
				columns[col][r] = "│"
				if r%2 == 0 {
					columns[col][r] = "┼"
				}
			}
		}
		for q := lo; q <= hi; q++ {
			busy[q] = col
		}
	}

	var b strings.Builder
	prefix := len(fmt.Sprint(c.qubits - 1))
	start := 0
	for start < len(columns) || start == 0 {
		end, used := start, prefix+4
		for end < len(columns) && (end == start || used+widths[end]+2 <= DrawWidth) {
			used += widths[end] + 2
			end++
		}
		if start > 0 {
			b.WriteString("\n")
		}
		for r := 0; r < rows; r++ {
			wire := r%2 == 0
			if wire {
				fmt.Fprintf(&b, "q%-*d: ─", prefix, r/2)
			} else {
				b.WriteString(strings.Repeat(" ", prefix+4))
			}
			for col := start; col < end; col++ {
				b.WriteString(cell(columns[col][r], widths[col], wire))
			}
			b.WriteString("\n")
		}
		if end == start {
			break
		}
		start = end
	}
	return b.String()
}

// cell centres a label in a column of the given width, padded with wire or space.
func cell(label string, width int, wire bool) string {
	pad := " "
	if wire {
		pad = "─"
	}
	n := utf8.RuneCountInString(label)
	left := (width - n) / 2
	right := width - n - left
	return strings.Repeat(pad, left+1) + label + strings.Repeat(pad, right+1)
}

func span(qs []int) (lo, hi int) {
	lo, hi = qs[0], qs[0]
	for _, q := range qs[1:] {
		lo, hi = min(lo, q), max(hi, q)
	}
	return lo, hi
}

// opLabels returns the label drawn on each operand of op.
func opLabels(op Op) []string {
	g := op.Gate
	n := len(op.Qubits)
	out := make([]string, n)
	params := ""
	if len(g.Params) > 0 {
		params = strings.TrimPrefix(g.String(), g.Name)
	}
	fill := func(s string) {
		for i := range out {
			out[i] = s
		}
	}
	switch g.Name {
	case "cx", "cy", "ch", "cp", "crx", "cry", "crz":
		out[0], out[1] = "●", strings.ToUpper(g.Name[1:])+params
	case "cz":
		fill("●")
	case "ccx":
		out[0], out[1], out[2] = "●", "●", "X"
	case "ccz":
		fill("●")
	case "swap":
		fill("×")
	case "cswap":
		out[0], out[1], out[2] = "●", "×", "×"
	case "measure":
		out[0] = fmt.Sprintf("M→c%d", op.Bits[0])
	case "reset":
		out[0] = "|0⟩"
	case "barrier":
		fill("░")
	default:
		name := strings.ToUpper(g.Name)
		if g.IsCustom() {
			name = g.Name
		}
		if n == 1 {
			out[0] = name + params
		} else {
			for i := range out {
				out[i] = fmt.Sprintf("%s%s:%d", name, params, i)
			}
		}
	}
	return out
}
