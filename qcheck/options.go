package qcheck

import (
	"fmt"
	"math"
	"strings"
)

// An Option changes how two circuits are compared: the tolerance, whether global phase counts,
// how got's qubits relate to want's, what is observed, the measure and the engine. Options are
// values that compose: pass several to Compare, Equivalent or Preserves, or bundle them with
// Options. Later options override earlier ones of the same kind.
type Option interface {
	apply(*config) error
}

// Options bundles several options into one, so that a team can keep its usual settings in a
// variable: qcheck.Options{qcheck.Tolerance(1e-6), qcheck.ExactPhase()}.
type Options []Option

func (o Options) apply(c *config) error {
	for _, opt := range o {
		if opt == nil {
			continue
		}
		if err := opt.apply(c); err != nil {
			return err
		}
	}
	return nil
}

// optionFunc turns a function into an Option.
type optionFunc func(*config) error

func (f optionFunc) apply(c *config) error { return f(c) }

// DefaultTolerance is the tolerance ε used when no Tolerance option is given: far above the
// floating-point noise of exact rewrites of circuits of a few thousand gates, far below any real
// bug: the rounding of one gate is about 1e-16, and such errors add at most linearly over a
// circuit (Nielsen & Chuang §4.5.3).
const DefaultTolerance = 1e-9

// Tolerance sets ε, the largest distance at which two circuits still count as equivalent, in the
// units of the measure (operator norm by default). It must be positive and finite; Compare
// returns an error otherwise. Approximate passes (synthesis to a finite gate set, rotation
// merging with rounding) pass the accuracy they promise.
func Tolerance(eps float64) Option {
	return optionFunc(func(c *config) error {
		if !(eps > 0) || math.IsInf(eps, 0) {
			return fmt.Errorf("qcheck: Tolerance(%v): the tolerance must be positive and finite", eps)
		}
		c.tol = eps
		return nil
	})
}

// ExactPhase makes a global phase count as a difference: the distance is ‖U − V‖ instead of
// min over φ of ‖U − e^{iφ}V‖. Use it for a pass whose output is later controlled (a global phase
// of a sub-circuit becomes a relative phase under control). It applies to the operator-norm
// measure only; the diamond distance and the average fidelity are blind to global phase by
// definition, and Compare refuses the combination.
func ExactPhase() Option {
	return optionFunc(func(c *config) error {
		c.exactPhase = true
		return nil
	})
}

// OutputPermutation states where a routing pass leaves each qubit: logical qubit i ends on
// physical qubit perm[i] of got's register. Compare undoes the permutation on got's output before
// comparing, so a router that inserts SWAPs and leaves its qubits permuted is equivalent when the
// permutation is the one it reports. perm must have one entry per qubit of got and be a
// permutation of 0..n−1. Passes that compute their layout report it through a LayoutPass.
func OutputPermutation(perm []int) Option {
	p := append(make([]int, 0, len(perm)), perm...) // never nil, so an empty perm is checked too
	return optionFunc(func(c *config) error {
		c.perm = p
		return nil
	})
}

// AncillaState says what a borrowed qubit may hold when a circuit starts.
type AncillaState int

const (
	// Clean ancillas start in |0⟩ and must be returned to |0⟩. Only inputs with the ancillas in
	// |0⟩ are compared, and any amplitude left outside |0⟩ on them counts towards the distance.
	Clean AncillaState = iota + 1
	// Dirty ancillas start in any state, possibly entangled with the data, and must be restored:
	// got must equal want ⊗ I on the ancillas, up to global phase unless ExactPhase.
	Dirty
)

// String returns "clean" or "dirty".
func (s AncillaState) String() string {
	switch s {
	case Clean:
		return "clean"
	case Dirty:
		return "dirty"
	}
	return fmt.Sprintf("AncillaState(%d)", int(s))
}

// Ancillas declares qubits of got's register that a decomposition borrows, and whether they
// start Clean or Dirty. want may be narrower than got by exactly these qubits, in which case
// want's qubit i is the i-th qubit of got that is not an ancilla; or as wide as got, in which case
// both circuits are compared on the same register with the same ancillas. The option may be given
// more than once; every use adds qubits, and all ancillas must be in the same state.
func Ancillas(qubits []int, state AncillaState) Option {
	qs := append([]int(nil), qubits...)
	return optionFunc(func(c *config) error {
		if state != Clean && state != Dirty {
			return fmt.Errorf("qcheck: Ancillas(%v, %v): the state must be Clean or Dirty", qs, state)
		}
		if len(c.ancillas) > 0 && c.ancillaState != state {
			return fmt.Errorf("qcheck: Ancillas(%v, %v): earlier ancillas %v are %v; mixing clean and dirty ancillas is not supported", qs, state, c.ancillas, c.ancillaState)
		}
		c.ancillaState = state
		c.ancillas = append(c.ancillas, qs...)
		return nil
	})
}

// Measured compares only what measuring (in the computational basis, at the end) would show:
// the output distributions, for every input state. When the circuits measure, the outcome is the
// classical bits their final measure ops write (each circuit read through its own measurements,
// so a routed circuit that measures a moved qubit into the right bit agrees); the qubits given,
// if any, select the bits want's measurements of them write. When neither circuit measures, the
// outcome is the given qubits of want (all of them when none are given) on the same logical
// qubits of got. Final measure ops (those after which nothing acts on their qubit) are dropped
// before comparing; a measurement in the middle of a circuit is refused, as is a pair where only
// one circuit measures.
//
// The verdict is certified, not searched: the distributions agree for every input exactly when
// U·V† moves no amplitude between outcomes, and the part that does bounds the largest
// total-variation distance over all inputs from above (metric.DistributionGap). Equivalent means
// that bound is within the tolerance, and Distance is the bound; different means an input was
// found whose distributions differ by more, and Distance is that difference; when the tolerance
// lies between the two, the Result is not equivalent and Undecided gives both numbers. Use it for
// passes that only promise to keep measurement statistics, such as dropping diagonal gates
// before a final measurement.
func Measured(qubits ...int) Option {
	qs := append([]int(nil), qubits...)
	return optionFunc(func(c *config) error {
		c.measured = qs
		c.measuredSet = true
		return nil
	})
}

// Measure names the distance that decides the verdict.
type Measure int

const (
	// OperatorNorm is min over φ of ‖U − e^{iφ}V‖ (or ‖U − V‖ with ExactPhase): the largest change
	// of any output state's amplitude vector. The default.
	OperatorNorm Measure = iota
	// Diamond is the diamond-norm distance of the two unitary channels (Watrous 2018, §3.3): the
	// best advantage in telling them apart with an entangled probe. Between 0 and 2.
	Diamond
	// AverageFidelity uses 1 − F_avg, the average gate infidelity (Nielsen, Phys. Lett. A 303
	// (2002)): what randomized benchmarking reports. Between 0 and d/(d+1).
	AverageFidelity
	// Distribution is the largest total-variation distance of measured output distributions; it
	// is the measure Measured selects and cannot be chosen with UseMeasure. Programs are
	// compared in it too, exactly.
	Distribution
	// ZeroState is min over φ of ‖U|0⟩ − e^{iφ}V|0⟩‖, the measure FromZero selects.
	ZeroState
)

// String returns the measure's name as reports write it.
func (m Measure) String() string {
	switch m {
	case OperatorNorm:
		return "operator norm"
	case Diamond:
		return "diamond norm"
	case AverageFidelity:
		return "average infidelity"
	case Distribution:
		return "total variation"
	case ZeroState:
		return "state distance from |0…0⟩"
	}
	return fmt.Sprintf("Measure(%d)", int(m))
}

// MarshalText writes the measure's name, so that results encode readably as JSON.
func (m Measure) MarshalText() ([]byte, error) { return []byte(m.String()), nil }

// UseMeasure chooses the measure that decides the verdict (OperatorNorm by default). The tolerance
// is read in the units of that measure.
func UseMeasure(m Measure) Option {
	return optionFunc(func(c *config) error {
		if m != OperatorNorm && m != Diamond && m != AverageFidelity {
			return fmt.Errorf("qcheck: UseMeasure(%v): choose OperatorNorm, Diamond or AverageFidelity (Measured selects the distribution measure)", m)
		}
		c.measure = m
		return nil
	})
}

// config is the resolved set of options.
type config struct {
	tol          float64
	exactPhase   bool
	perm         []int
	ancillas     []int
	ancillaState AncillaState
	measured     []int
	measuredSet  bool
	measure      Measure
	engine       Engine
	meaning      string // set by AsProgram or FromZero; empty: decided from the circuits
	workLimit    float64
}

// newConfig applies opts over the defaults and checks that they fit together; checks that need
// the circuits (ranges, widths) are done by frameOf, and what an engine cannot do is said by
// its refuses method.
func newConfig(opts []Option) (*config, error) {
	c := &config{tol: DefaultTolerance, engine: Auto, workLimit: defaultWorkLimit}
	if err := Options(opts).apply(c); err != nil {
		return nil, err
	}
	if err := c.clash(); err != nil {
		return nil, err
	}
	return c, nil
}

// clash reports options that contradict each other. It is the one place that knows which
// combinations of options make no sense, whatever the engine.
func (c *config) clash() error {
	switch {
	case c.exactPhase && c.measure != OperatorNorm:
		return fmt.Errorf("qcheck: ExactPhase with the %v measure: that measure ignores global phase by definition; use OperatorNorm", c.measure)
	case c.measuredSet && c.measure != OperatorNorm:
		return fmt.Errorf("qcheck: Measured with UseMeasure(%v): measured comparisons use the total-variation distance", c.measure)
	case len(c.ancillas) > 0 && c.ancillaState == Clean && c.measure != OperatorNorm:
		return fmt.Errorf("qcheck: clean ancillas with the %v measure: the restricted map need not be unitary; use OperatorNorm", c.measure)
	}
	return nil
}

// registerFree reports options that name qubits of a whole register, which a rule check cannot
// take: its circuits are drawn on random registers.
func (c *config) registerFree() error {
	if c.perm != nil || len(c.ancillas) > 0 || c.measuredSet {
		return fmt.Errorf("rule checks take no OutputPermutation, Ancillas or Measured option: a rule's qubits are mapped onto random registers")
	}
	return nil
}

// describe lists the non-default settings, for reports.
func (c *config) describe() string {
	var parts []string
	if c.exactPhase {
		parts = append(parts, "exact phase")
	}
	if c.perm != nil {
		parts = append(parts, fmt.Sprintf("output permutation %v", c.perm))
	}
	if len(c.ancillas) > 0 {
		parts = append(parts, fmt.Sprintf("%v ancillas %v", c.ancillaState, c.ancillas))
	}
	if c.measuredSet {
		parts = append(parts, fmt.Sprintf("measured qubits %v", c.measured))
	}
	return strings.Join(parts, ", ")
}
