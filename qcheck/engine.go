package qcheck

import (
	"fmt"
	"strings"
)

// Engine names a method that gives circuits their meaning for a comparison: "dense",
// "tableau", "matrix-free", or "auto" to let Compare choose. UseEngine picks one; a Result
// names the one that answered.
type Engine string

// The engines Compare knows, and Auto for its own choice. The doc comment of each engine's
// file says which circuits it takes and what its answer certifies.
const (
	// Auto lets Compare choose: the first engine, in order of preference, that takes the
	// comparison. The default.
	Auto Engine = "auto"
	// Dense builds both unitaries as 2^n × 2^n matrices: exact to floating-point rounding,
	// chosen up to 12 qubits.
	Dense Engine = "dense"
	// Tableau compares how two Clifford circuits conjugate the Pauli generators (stabilizer
	// tableaux): exact, for thousands of qubits, Clifford circuits only.
	Tableau Engine = "tableau"
	// MatrixFree estimates the phase-free distance from statevector runs of both circuits,
	// without forming either matrix: chosen for 13 to 22 qubits. Its witness certifies a
	// lower bound; its upper bound holds with a stated probability.
	MatrixFree Engine = "matrix-free"
	// ZX rewrites the ZX-diagram of V†U: equivalence proved within a stated bound, or the exact
	// distance of what is left, at any width; chosen above 22 qubits.
	ZX Engine = "zx"
)

// MarshalText writes the engine's name.
func (e Engine) MarshalText() ([]byte, error) { return []byte(e), nil }

// UnmarshalText reads an engine's name, refusing names of engines that do not exist; with it an
// Engine serves as a command-line flag (flag.TextVar).
func (e *Engine) UnmarshalText(text []byte) error {
	name := Engine(text)
	if _, err := lookupEngine(name); err != nil {
		return err
	}
	*e = name
	return nil
}

// UseEngine overrides the automatic choice of engine. An engine that cannot answer the
// comparison (the tableau for a T gate, say) makes Compare return its reason as an error.
func UseEngine(e Engine) Option {
	return optionFunc(func(c *config) error {
		if _, err := lookupEngine(e); err != nil {
			return fmt.Errorf("qcheck: UseEngine(%q): %v", string(e), err)
		}
		c.engine = e
		return nil
	})
}

// An engine answers a comparison. Each lives in its own file, with its own certificate text, and
// has one entry in engines; nothing else in the package names it. To add one, write the file
// (a type with these five methods and `var _ engine = myEngine{}`), give it a name constant
// above, and put it into engines where it should come in Auto's order of preference.
type engine interface {
	// name is the engine's name, as UseEngine takes it and a Result reports it.
	name() Engine
	// refuses says why the engine cannot answer this comparison, or returns nil when it can.
	// With auto set, Compare is choosing, and the engine also refuses work it could do but
	// should not be given by default (a dense register that takes hours, say).
	refuses(cfg *config, f *frame, auto bool) error
	// certifies says in words what the engine's verdict guarantees for this comparison;
	// compare may make it more precise in r.Certifies.
	certifies(cfg *config, f *frame) string
	// compare fills r with the verdict, the distances and the evidence. Without full, the
	// evidence (witness, measurement, blame) is needed only when the circuits are not
	// equivalent. An engine whose answer does not settle the verdict leaves r.Equivalent false
	// and says why in r.Undecided; an error is for comparisons it cannot run at all.
	compare(cfg *config, f *frame, r *Result, full bool) error
	// work estimates, before starting, how many amplitude updates compare would take (one
	// gate applied to one amplitude, or one complex multiply-add), good to a small factor, so
	// that work over the limit is refused rather than run for hours; see [WorkLimit].
	work(f *frame) float64
}

// engines is every engine, in Auto's order of preference: the cheapest that answers exactly
// first.
var engines = []engine{tableauEngine{}, denseEngine{}, zxEngine{}, matrixFreeEngine{}, stabilizerProgramEngine{}, programEngine{}, zeroEngine{}, finalMeasureEngine{}}

// lookupEngine returns the engine of that name; Auto has none and returns nil.
func lookupEngine(name Engine) (engine, error) {
	if name == Auto {
		return nil, nil
	}
	names := []string{string(Auto)}
	for _, e := range engines {
		if e.name() == name {
			return e, nil
		}
		names = append(names, string(e.name()))
	}
	return nil, fmt.Errorf("unknown engine; choose %s or %s", strings.Join(names[:len(names)-1], ", "), names[len(names)-1])
}

// chooseEngine decides which engine answers a comparison: the one asked for with UseEngine, or
// for Auto the first in engines that takes it.
func chooseEngine(cfg *config, f *frame) (engine, error) {
	if cfg.engine != Auto {
		e, err := lookupEngine(cfg.engine)
		if err != nil {
			return nil, fmt.Errorf("qcheck: %v", err)
		}
		if err := e.refuses(cfg, f, false); err != nil {
			return nil, fmt.Errorf("qcheck: %v", err)
		}
		if err := overWork(cfg, f, e); err != nil {
			return nil, fmt.Errorf("qcheck: %v", err)
		}
		return e, nil
	}
	var reasons []string
	for _, e := range engines {
		err := e.refuses(cfg, f, true)
		if err == nil {
			err = overWork(cfg, f, e)
		}
		if err == nil {
			return e, nil
		}
		reasons = append(reasons, fmt.Sprintf("%s: %v", e.name(), err))
	}
	return nil, fmt.Errorf("qcheck: no engine takes this comparison of %d qubits automatically (%s)", f.m, strings.Join(reasons, "; "))
}

// unitaryUpToPhase is the refusal shared by engines that compare unitaries up to a global
// phase in operator norm only: it names the option that asks for more, or returns nil.
func unitaryUpToPhase(cfg *config, f *frame, e Engine) error {
	if err := refuseMeaning(f, e); err != nil {
		return err
	}
	switch {
	case f.measured != nil:
		return fmt.Errorf("the %s engine does not compare measured distributions; they need the dense engine", e)
	case f.clean:
		return fmt.Errorf("the %s engine does not compare with clean ancillas; they need the dense engine (dirty ancillas work)", e)
	case cfg.exactPhase:
		return fmt.Errorf("the %s engine compares up to global phase only; ExactPhase needs the dense engine", e)
	case cfg.measure != OperatorNorm:
		return fmt.Errorf("the %s engine reports the operator-norm distance only, not %v", e, cfg.measure)
	}
	return nil
}
