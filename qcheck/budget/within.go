package budget

import (
	"fmt"
	"strings"
	"text/tabwriter"

	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// budgetRows is how many of the largest contributions a budget failure lists.
const budgetRows = 10

// Within fails the test unless the ledger's certified bound Σ δ_k is at most eps and every
// entry stayed within the share its pass allotted it. The failure lists the largest
// contributions with their places, their δ and their part of ε, and states what the bound means
// end to end: the phase-free operator-norm distance of the whole circuits and, from it, the bound
// 2·Σ δ_k on the change of any measurement outcome's probability (Nielsen & Chuang §4.5.3).
// On success it prints nothing.
func Within(t qcheck.TB, l *Ledger, eps float64) {
	t.Helper()
	if err := checkBudget(eps); err != nil {
		t.Fatalf("%v", err)
		return
	}
	if l == nil {
		t.Fatalf("budget.Within: nil ledger")
		return
	}
	bound, over := l.Bound(), l.OverShare()
	if bound <= eps && len(over) == 0 {
		return
	}
	t.Errorf("%s", budgetReport(l, eps, bound, over))
}

// budgetReport writes the failure message of Within.
func budgetReport(l *Ledger, eps, bound float64, over []Entry) string {
	var b strings.Builder
	n := l.Len()
	if bound > eps {
		fmt.Fprintf(&b, "error budget exceeded: the certified bound Σδ = %.4g is over ε = %.4g (%.1f%% of ε), from %d rewrites\n",
			bound, eps, 100*bound/eps, n)
	} else {
		fmt.Fprintf(&b, "error budget kept in total (Σδ = %.4g ≤ ε = %.4g, from %d rewrites) but %d entries exceed the share their pass allotted them\n",
			bound, eps, n, len(over))
	}
	rows := l.Largest(budgetRows)
	if bound <= eps {
		rows = over
		if len(rows) > budgetRows {
			rows = rows[:budgetRows]
		}
		fmt.Fprintf(&b, "entries over their share:\n")
	} else {
		fmt.Fprintf(&b, "largest contributions:\n")
	}
	tw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "  entry\tδ\tof ε\tshare\tplace\tpiece → replacement\n")
	for _, e := range rows {
		share := "-"
		if e.Share > 0 {
			share = fmt.Sprintf("%.3g", e.Share)
			if e.Delta > e.Share {
				share += " (over)"
			}
		}
		fmt.Fprintf(tw, "  %d\t%.3g\t%.2f%%\t%s\t%s\t%s → %s\n", e.Seq, e.Delta, 100*e.Delta/eps, share, e.Window,
			brief(e.Piece, e.Window.Qubits), brief(e.Replacement, e.Window.Qubits))
	}
	tw.Flush()
	if k := len(rows); k < n && bound > eps {
		fmt.Fprintf(&b, "  (%d more entries)\n", n-k)
	}
	fmt.Fprintf(&b, "end to end: where the windows account for every change (Ledger.Covers), the circuits are within %.4g of each other in phase-free operator norm, ", bound)
	if 2*bound < 1 {
		fmt.Fprintf(&b, "so any measurement outcome's probability changes by at most 2·Σδ = %.4g (Nielsen & Chuang §4.5.3)", 2*bound)
	} else {
		// A probability cannot change by more than 1: the bound 2·Σδ says nothing beyond it.
		fmt.Fprintf(&b, "which bounds nothing about outcome probabilities: 2·Σδ = %.4g is at least 1, the most a probability can change", 2*bound)
	}
	return b.String()
}

// brief writes a small circuit as a short list of its ops on the circuit's own qubits, or as a
// count when it is long.
func brief(c *circuit.Circuit, qs []int) string {
	if c.Len() == 0 {
		return "(nothing)"
	}
	if c.Len() > 3 {
		return fmt.Sprintf("%d ops", c.Len())
	}
	parts := make([]string, c.Len())
	for i, op := range c.Ops {
		op = op.Clone()
		for j, q := range op.Qubits {
			op.Qubits[j] = qs[q]
		}
		parts[i] = op.String()
	}
	return strings.Join(parts, "; ")
}
