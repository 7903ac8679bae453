package qcheck

import (
	"fmt"
	"slices"
	"strconv"
	"strings"

	"github.com/google/go-cmp/cmp"
	"qcheck.dev/qcheck/circuit"
)

// reportMaxOps is the longest circuit a report draws in full; longer ones are shown by their
// differing window only, to keep a failing test's log readable.
const reportMaxOps = 60

// Headline is the first line of the report: the verdict and the distance against the tolerance.
// When the circuits are equivalent it is the whole verdict, so it also says what was compared
// ("up to global phase", "global phase counts", or the measured qubits); on a difference the
// report's next line says it.
func (r Result) Headline() string {
	if r.Equivalent {
		return fmt.Sprintf("qcheck: got is equivalent to want: %s (%s)", r.verdict(), r.phaseWords())
	}
	return "qcheck: got differs from want: " + r.verdict()
}

// verdict writes the distance against the tolerance: "operator norm 0.1 > tolerance 1e-09".
func (r *Result) verdict() string {
	rel := ">"
	if r.Equivalent {
		rel = "≤"
	}
	return fmt.Sprintf("%s %s %s tolerance %g", r.Measure, distanceWords(*r), rel, r.Tolerance)
}

// Report writes the result for a person, in lines of at most 100 columns (drawings are wrapped by
// the circuit package at the same width): the verdict, both circuits drawn and listed, their
// difference as op lists and, when they are not equivalent, the ops to blame, the witness input
// state, and a measurement whose probabilities tell the circuits apart. The text is for people
// and may change between versions; programs read the JSON encoding (MarshalJSON), whose keys do
// not change.
func (r Result) Report() string {
	return write(&page{r: &r, want: "want", got: "got"})
}

// A section writes one part of a report, or nothing when it has nothing to say. Result.Report
// and Failure.Report write the same list, sections, each from what its page holds; a new part of
// the reports is one function and one entry there.
type section func(b *strings.Builder, p *page)

// page is what the sections of one report read: the comparison (nil for a failure that has
// none), the failure of a pass (nil for Result.Report), and what the two circuits are called.
type page struct {
	r         *Result
	f         *Failure
	want, got string
}

// sections is every part of a report, in order.
var sections = []section{
	headlineSection,
	settingsSection,
	circuitsSection,
	diffSection,
	blameSection,
	evidenceSection,
	replaySection,
}

// write runs every section over the page.
func write(p *page) string {
	var b strings.Builder
	for _, s := range sections {
		s(&b, p)
	}
	return b.String()
}

// headlineSection writes the first line.
func headlineSection(b *strings.Builder, p *page) {
	if p.f != nil {
		b.WriteString(p.f.Headline())
	} else {
		b.WriteString(p.r.Headline())
	}
	b.WriteString("\n")
}

// settingsSection writes the measure, phase convention, engine and options of the comparison.
func settingsSection(b *strings.Builder, p *page) {
	if p.r == nil {
		return
	}
	r := p.r
	fmt.Fprintf(b, "  measure: %s, %s\n", r.Measure, r.phaseWords())
	b.WriteString(wrapList("  engine: ", strings.Fields(fmt.Sprintf("%s (%s)", r.Engine, r.Certifies)), " "))
	if r.Options != "" {
		fmt.Fprintf(b, "  options: %s\n", r.Options)
	}
}

// circuitsSection draws and lists the circuits: want and got, or the pass's input and what the
// pass made of it (its output, the input it changed, or its panic).
func circuitsSection(b *strings.Builder, p *page) {
	f := p.f
	if f == nil {
		if p.r.Want != nil && p.r.Got != nil {
			writeCircuit(b, p.want, p.r.Want)
			writeCircuit(b, p.got, p.r.Got)
		}
		return
	}
	if f.Input != nil {
		writeCircuit(b, "input (shrunk)", f.Input)
		b.WriteString(wrapList("  as Go: ", []string{f.Input.GoString()}, ""))
	}
	switch f.Kind {
	case NotEquivalent:
		writeCircuit(b, "output of the pass", f.Output)
		if f.Layout != nil {
			fmt.Fprintf(b, "  final layout reported by the pass: %v (logical i on physical layout[i])\n", f.Layout)
		}
	case ModifiedInput:
		writeCircuit(b, "the input after the pass ran", f.Modified)
	case PassPanic:
		fmt.Fprintf(b, "\n%s\n", trimLines(f.Err.Error(), 24))
	case BadOutput:
		if f.Output != nil {
			writeCircuit(b, "output of the pass", f.Output)
		}
	}
}

// diffSection writes the structural difference of the two circuits' op lists.
func diffSection(b *strings.Builder, p *page) {
	switch {
	case p.f == nil && p.r.Want != nil && p.r.Got != nil:
		writeDiff(b, p.want, p.r.Want, p.got, p.r.Got)
	case p.f != nil && p.f.Kind == NotEquivalent:
		writeDiff(b, p.want, p.f.Input, p.got, p.f.Output)
	case p.f != nil && p.f.Kind == ModifiedInput:
		writeDiff(b, "before", p.f.Input, "after", p.f.Modified)
	}
}

// blameSection names the ops that explain a difference.
func blameSection(b *strings.Builder, p *page) {
	if p.r != nil && !p.r.Equivalent {
		p.r.writeBlame(b, p.want, p.got)
	}
}

// evidenceSection writes the witness, the measurement and the probability bound of a difference.
func evidenceSection(b *strings.Builder, p *page) {
	if p.r != nil && !p.r.Equivalent {
		p.r.writeEvidence(b)
	}
}

// replaySection says how to replay a failure found by rapid.
func replaySection(b *strings.Builder, p *page) {
	f := p.f
	if f == nil {
		return
	}
	b.WriteString("\nreplay: ")
	switch {
	case f.Seed != 0:
		fmt.Fprintf(b, "-rapid.seed=%d\n", f.Seed)
	default:
		b.WriteString("rerun the test with the -rapid.seed (or -rapid.failfile) that rapid printed above\n")
	}
}

// phaseWords says how the two circuits were compared: up to global phase, with the phase
// counting, or by the distributions of measuring some qubits.
func (r Result) phaseWords() string {
	switch {
	case r.Meaning == meaningProgram:
		return "programs: the distributions of their classical bits"
	case r.Meaning == meaningFromZero && r.Measure == Distribution:
		return "from |0…0⟩, distributions of measuring " + qubitList(r.Measured)
	case r.Meaning == meaningFromZero:
		return "from |0…0⟩, up to global phase"
	case r.Measure == Distribution:
		if r.Bits != nil {
			return "distributions of classical bits " + bitNames(r.Bits, ", ")
		}
		return "distributions of measuring " + qubitList(r.Measured)
	case r.ExactPhase:
		return "global phase counts"
	}
	return "up to global phase"
}

// writeCircuit draws a circuit and lists its ops.
func writeCircuit(b *strings.Builder, title string, c *circuit.Circuit) {
	fmt.Fprintf(b, "\n%s: %d qubit(s), %d op(s)\n", title, c.Qubits(), c.Len())
	if c.Len() > reportMaxOps {
		fmt.Fprintf(b, "  (longer than %d ops: drawing and list omitted, see the differing ops below)\n", reportMaxOps)
		return
	}
	b.WriteString(c.String())
	b.WriteString(wrapList("  ops: ", opList(c.Ops, 0), " · "))
}

// opList writes each op as "i: gate qubits".
func opList(ops []circuit.Op, from int) []string {
	out := make([]string, len(ops))
	for i, op := range ops {
		out[i] = fmt.Sprintf("%d: %s", from+i, op)
	}
	return out
}

// wrapList joins items after a prefix, wrapping lines at circuit.DrawWidth columns.
func wrapList(prefix string, items []string, sep string) string {
	if len(items) == 0 {
		return prefix + "(none)\n"
	}
	var b strings.Builder
	indent := strings.Repeat(" ", len([]rune(prefix)))
	line := prefix
	for i, it := range items {
		piece := it
		if i > 0 {
			piece = sep + it
		}
		if len([]rune(line))+len([]rune(piece)) > circuit.DrawWidth && line != prefix && line != indent {
			b.WriteString(strings.TrimRight(line, " ·") + "\n")
			line = indent + it
			continue
		}
		line += piece
	}
	b.WriteString(line + "\n")
	return b.String()
}

// writeAngleDiff is writeDiff for op lists whose printed forms agree: it says they have the same
// ops only when they do exactly, and otherwise lists the angles that differ beyond the digits
// printed, in full.
func writeAngleDiff(b *strings.Builder, aName string, a *circuit.Circuit, bName string, c *circuit.Circuit) {
	var lines []string
	for i := range min(len(a.Ops), len(c.Ops)) {
		pa, pc := a.Ops[i].Gate.Params, c.Ops[i].Gate.Params
		for k := range min(len(pa), len(pc)) {
			if pa[k] != pc[k] {
				lines = append(lines, fmt.Sprintf("  op %d (%s): angle %d is %s in %s and %s in %s\n", i, a.Ops[i].Gate.Name, k,
					strconv.FormatFloat(pa[k], 'g', -1, 64), aName, strconv.FormatFloat(pc[k], 'g', -1, 64), bName))
			}
		}
	}
	if len(lines) == 0 {
		fmt.Fprintf(b, "\nops: %s and %s have the same ops\n", aName, bName)
		return
	}
	fmt.Fprintf(b, "\nops: %s and %s print the same, but these angles differ:\n", aName, bName)
	for _, l := range lines {
		b.WriteString(l)
	}
}

// writeDiff writes the structural difference of two op lists with go-cmp.
func writeDiff(b *strings.Builder, aName string, a *circuit.Circuit, bName string, c *circuit.Circuit) {
	as, cs := opStrings(a), opStrings(c)
	if d := cmp.Diff(as, cs); d != "" {
		as, cs = distinctOpStrings(a, as, c, cs)
	}
	d := cmp.Diff(as, cs)
	if d == "" {
		writeAngleDiff(b, aName, a, bName, c)
		return
	}
	fmt.Fprintf(b, "\nops (−%s +%s):\n", aName, bName)
	for _, line := range strings.Split(strings.TrimRight(d, "\n"), "\n") {
		// go-cmp marks lines with "-" and "+" and indents with a non-breaking space; keep its
		// layout but make it plain.
		b.WriteString("  " + strings.ReplaceAll(line, "\u00a0", " ") + "\n")
	}
}

func opStrings(c *circuit.Circuit) []string {
	out := make([]string, len(c.Ops))
	for i, op := range c.Ops {
		out[i] = op.String()
	}
	return out
}

// distinctOpStrings rewrites, with every digit of their angles, the ops whose brief forms (as and
// cs) are shared by ops of a and c that are not the same, so that a diff never shows two
// different ops as one common line.
func distinctOpStrings(a *circuit.Circuit, as []string, c *circuit.Circuit, cs []string) ([]string, []string) {
	exact := func(op circuit.Op) string {
		g := op.Gate.Name
		if len(op.Gate.Params) > 0 {
			parts := make([]string, len(op.Gate.Params))
			for i, p := range op.Gate.Params {
				parts[i] = strconv.FormatFloat(p, 'g', -1, 64)
			}
			g += "(" + strings.Join(parts, ",") + ")"
		}
		return strings.Replace(op.String(), op.Gate.String(), g, 1)
	}
	forms := map[string]map[string]bool{} // brief form → the exact forms it stands for
	note := func(c *circuit.Circuit, brief []string) {
		for i, op := range c.Ops {
			if forms[brief[i]] == nil {
				forms[brief[i]] = map[string]bool{}
			}
			forms[brief[i]][exact(op)] = true
		}
	}
	note(a, as)
	note(c, cs)
	redo := func(c *circuit.Circuit, brief []string) []string {
		out := append([]string(nil), brief...)
		for i, op := range c.Ops {
			if len(forms[brief[i]]) > 1 {
				out[i] = exact(op)
			}
		}
		return out
	}
	return redo(a, as), redo(c, cs)
}

// writeBlame names the ops that explain the difference.
func (r Result) writeBlame(b *strings.Builder, wantName, gotName string) {
	bl := r.Blame
	if !bl.Found || r.Want == nil || r.Got == nil {
		return
	}
	w, g := r.Want.Ops[bl.WantOps.Start:bl.WantOps.End], r.Got.Ops[bl.GotOps.Start:bl.GotOps.End]
	b.WriteString("\nblame:\n")
	pad := max(len(wantName), len(gotName))
	wl := fmt.Sprintf("    %-*s ", pad+1, wantName+":")
	gl := fmt.Sprintf("    %-*s ", pad+1, gotName+":")
	fmt.Fprintf(b, "  the op lists first differ at op %d; between their common start and end,\n", bl.FirstDiff)
	fmt.Fprintf(b, "  %s has %s where %s has %s\n",
		wantName, rangeWords(bl.WantOps, "inserted"), gotName, rangeWords(bl.GotOps, "removed"))
	if len(w)+len(g) <= 12 {
		b.WriteString(wrapList(wl, opList(w, bl.WantOps.Start), " · "))
		b.WriteString(wrapList(gl, opList(g, bl.GotOps.Start), " · "))
	}
	if bl.Prefix > 0 {
		k := bl.Prefix
		fmt.Fprintf(b, "  the meaning first changes at op %d: the first %d op(s) of %s already differ from %s's\n",
			k-1, k, gotName, wantName)
		fmt.Fprintf(b, "%s%d: %s\n%s%d: %s\n", wl, k-1, r.Want.Ops[k-1], gl, k-1, r.Got.Ops[k-1])
	}
}

// rangeWords writes a half-open range of op indices for the blame line: "1 op (op 3)",
// "2 ops (ops 3–4)", or for an empty range "nothing (removed; at op 3)", where empty says what
// got did there ("removed" on got's side, "inserted" on want's), so that the gap reads as a
// deletion or an insertion at that place rather than as a position.
func rangeWords(s circuit.Span, empty string) string {
	switch s.Len() {
	case 0:
		return fmt.Sprintf("nothing (%s; at op %d)", empty, s.Start)
	case 1:
		return fmt.Sprintf("1 op (%s)", s)
	}
	return fmt.Sprintf("%d ops (%s)", s.Len(), s)
}

// ketOrder names the qubits of a ket of n qubits, highest first: "|q2 q1 q0⟩".
func ketOrder(n int) string {
	switch {
	case n <= 1:
		return "|q0⟩"
	case n <= 4:
		s := make([]string, n)
		for i := range s {
			s[i] = fmt.Sprintf("q%d", n-1-i)
		}
		return "|" + strings.Join(s, " ") + "⟩"
	}
	return fmt.Sprintf("|q%d … q1 q0⟩", n-1)
}

// writeEvidence writes the witness input, the distinguishing measurement and the probability
// bound.
func (r Result) writeEvidence(b *strings.Builder) {
	n := r.Qubits
	if r.Outcome != "" {
		b.WriteString("\noutcome that tells them apart (classical bits, the highest first):\n")
		fmt.Fprintf(b, "  %s with probability %s after want, %s after got\n", r.Outcome, prob(r.OutcomeWant), prob(r.OutcomeGot))
	}
	if r.Measure == ZeroState {
		fmt.Fprintf(b, "\noverlap ⟨0|want†·got|0⟩ = %.4g%+.4gi, fidelity %.4g\n", real(r.Overlap), imag(r.Overlap), real(r.Overlap)*real(r.Overlap)+imag(r.Overlap)*imag(r.Overlap))
	}
	if p := r.Pauli; p != nil {
		b.WriteString("\nwitness Pauli (the tableau engine; strings list qubits that are not I):\n")
		fmt.Fprintf(b, "  want maps %s to %s, got maps it to %s\n", p.Generator, p.Want, p.Got)
		if p.Anticommute {
			fmt.Fprintf(b, "  prepare any state that %s leaves unchanged and measure the observable %s:\n", p.Generator, p.Want)
			b.WriteString("  +1 with probability 1 after want, 1/2 after got (the two images anticommute)\n")
		}
		fmt.Fprintf(b, "  so the distance up to global phase is at least %.4g (half of ‖%s − %s‖)\n", r.Distance, p.Want, p.Got)
	}
	// A witness that shows no gap witnesses nothing (the circuits' unitaries agree and the
	// difference lies in how their bits are read, say); it is left out.
	witness := r.Witness != nil && r.WitnessGap > 0
	if witness {
		fmt.Fprintf(b, "\nwitness input ψ (kets are %s: qubit 0 is the rightmost bit):\n", ketOrder(n))
		lead, k := "  ψ = ", Ket(r.Witness, n)
		if rest, ok := strings.CutPrefix(k, "≈ "); ok { // small amplitudes left out
			lead, k = "  ψ ≈ ", rest
		}
		b.WriteString(wrapList(lead, strings.Fields(k), " "))
		if r.ExactPhase {
			fmt.Fprintf(b, "  ‖want·ψ − got·ψ‖ = %.4g (a certified lower bound on the operator-norm distance)\n", r.WitnessGap)
		} else {
			fmt.Fprintf(b, "  min over φ of ‖want·ψ − e^{iφ}·got·ψ‖ = %.4g, a certified lower bound on the operator-norm\n", r.WitnessGap)
			fmt.Fprintf(b, "  distance; best global phase for the whole circuit: want ≈ e^{iφ}·got with φ = %.4g rad\n", r.Phase+0)
		}
	}
	m := r.Measurement
	if witness || m.Input != nil {
		b.WriteString("\nmeasurement that tells them apart:\n")
	}
	switch {
	case m.Input == nil && witness && r.ExactPhase:
		b.WriteString("  none found: no outcome probability differs visibly; the circuits differ by a global phase\n")
		b.WriteString("  or by too little to move a probability, and a global phase shows when the circuit is\n")
		b.WriteString("  controlled, which is what ExactPhase guards\n")
	case m.Input == nil && witness:
		// Without ExactPhase the distance above is phase-free: the circuits differ by more than a
		// global phase, however little the probabilities move.
		b.WriteString("  none found: no outcome probability differs visibly, though the circuits differ by more\n")
		b.WriteString("  than a global phase (the distance above is phase-free); a controlled or repeated use shows it\n")
	case m.Input != nil:
		input := Ket(m.Input, n)
		if m.InputBasis >= 0 {
			input = basisKet(m.InputBasis, n)
		} else if witness && slices.Equal(m.Input, r.Witness) {
			input = "ψ, the witness above"
		}
		b.WriteString(wrapList("  prepare ", strings.Fields(input+" and run the circuit;"), " "))
		switch {
		case !m.Basis:
			b.WriteString("  then test whether the output is want's output state (a projective measurement):\n")
			fmt.Fprintf(b, "  want passes with probability %s, got with %s\n", prob(m.Want), prob(m.Got))
		case r.Bits != nil:
			fmt.Fprintf(b, "  the classical bits read %s with probability %s after want, %s after got\n",
				outcomeWords(m.Outcome, r.Bits, "c"), prob(m.Want), prob(m.Got))
		case r.Measured != nil:
			fmt.Fprintf(b, "  measuring %s gives %s with probability %s after want, %s after got\n",
				qubitList(r.Measured), outcomeWords(m.Outcome, r.Measured, "q"), prob(m.Want), prob(m.Got))
		default:
			fmt.Fprintf(b, "  measuring every qubit gives %s with probability %s after want, %s after got\n",
				basisKet(m.Outcome, n), prob(m.Want), prob(m.Got))
		}
	}
	// The bound holds when both circuits are read the same way; with classical bits each is
	// read through its own measurements, and a different reading moves probabilities however
	// close the unitaries are.
	if (witness || m.Input != nil) && r.Bits == nil && 2*r.OperatorDistance < 1 {
		fmt.Fprintf(b, "  no outcome probability can differ by more than 2 × %.4g = %.4g, twice the operator-norm\n",
			r.OperatorDistance, 2*r.OperatorDistance)
		b.WriteString("  distance (Nielsen & Chuang §4.5.3)\n")
	}
}

// prob writes a probability to four digits, with rounding noise at the ends written as 0 and 1.
func prob(p float64) string {
	switch {
	case p < 1e-12:
		return "0"
	case p > 1-1e-12:
		return "1"
	}
	return fmt.Sprintf("%.4g", p)
}

// qubitList writes qubits as "q0, q2".
func qubitList(qs []int) string {
	s := make([]string, len(qs))
	for i, q := range qs {
		s[i] = fmt.Sprintf("q%d", q)
	}
	return strings.Join(s, ", ")
}

// outcomeWords writes an outcome over the measured qubits or classical bits as "q2=1 q0=0" or
// "c2=1 c0=0", highest first.
func outcomeWords(o int, measured []int, prefix string) string {
	s := make([]string, len(measured))
	for i := range measured {
		j := len(measured) - 1 - i
		s[i] = fmt.Sprintf("%s%d=%d", prefix, measured[j], o>>j&1)
	}
	return strings.Join(s, " ")
}

// bitNames writes classical bits as "c0, c2".
func bitNames(bits []int, sep string) string {
	s := make([]string, len(bits))
	for i, b := range bits {
		s[i] = fmt.Sprintf("c%d", b)
	}
	return strings.Join(s, sep)
}

// Headline is the first line of the failure's report; a nil *Failure (no failure) has the
// headline "qcheck: no failure".
func (f *Failure) Headline() string {
	if f == nil {
		return "qcheck: no failure"
	}
	in := "input"
	if f.Input != nil {
		in = fmt.Sprintf("%d-qubit, %d-op circuit", f.Input.Qubits(), f.Input.Len())
	}
	switch f.Kind {
	case NotEquivalent:
		return fmt.Sprintf("qcheck: the pass changes a %s: %s", in, f.Result.verdict())
	case PassError:
		return fmt.Sprintf("qcheck: the pass returned an error on a valid %s: %v", in, f.Err)
	case PassPanic:
		return fmt.Sprintf("qcheck: the pass panicked on a %s: %v", in, f.Err.(*passPanic).value)
	case ModifiedInput:
		return fmt.Sprintf("qcheck: the pass modified its %s instead of returning a new circuit", in)
	case BadOutput:
		return fmt.Sprintf("qcheck: the pass returned an unusable circuit for a %s: %v", in, f.Err)
	}
	return "qcheck: the pass failed"
}

// summary says in one line what kind of failure this is, for the message of a failed property
// whose report (with the figures) is logged beside it.
func (k FailureKind) summary() string {
	what := map[FailureKind]string{
		NotEquivalent: "the pass changes the meaning of a circuit",
		PassError:     "the pass returned an error on a valid circuit",
		PassPanic:     "the pass panicked",
		ModifiedInput: "the pass modified its input circuit",
		BadOutput:     "the pass returned an unusable circuit",
	}[k]
	if what == "" {
		what = "the pass failed"
	}
	return "qcheck: " + what + "; the report shows the smallest input found"
}

// Report writes the failure for a person: what went wrong, the minimal input drawn and listed
// (and as Go code to paste into a regression test), the pass's output beside it with their
// difference, the comparison's evidence, and how to replay the failure. Like Result.Report, the
// text may change between versions. A nil *Failure reports its headline only.
func (f *Failure) Report() string {
	if f == nil {
		return f.Headline() + "\n"
	}
	return write(&page{r: f.Result, f: f, want: "input", got: "output"})
}

// trimLines keeps the first n lines of s.
func trimLines(s string, n int) string {
	lines := strings.Split(s, "\n")
	if len(lines) <= n {
		return s
	}
	return strings.Join(lines[:n], "\n") + fmt.Sprintf("\n… (%d more lines)", len(lines)-n)
}
