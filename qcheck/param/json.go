package param

import (
	"encoding/json"
	"math"
)

// resultJSON is the JSON form of a Result; its keys stay the same between versions.
type resultJSON struct {
	Verdict          string       `json:"verdict"`
	Method           string       `json:"method"`
	ExactPhase       bool         `json:"exact_phase"`
	Tolerance        float64      `json:"tolerance"`
	Parameters       []degreeJSON `json:"parameters"`
	Points           int          `json:"points"`
	Residual         float64      `json:"residual"`
	Lebesgue         float64      `json:"lebesgue"`
	Bound            *float64     `json:"bound"`
	ErrorProbability float64      `json:"error_probability"`
	Certifies        string       `json:"certifies"`
	Counterexample   *counterJSON `json:"counterexample"`
	Worst            *worstJSON   `json:"worst"`
}

type degreeJSON struct {
	Name   string `json:"name"`
	Scale  int64  `json:"scale"`
	Degree int    `json:"degree"`
	Points int    `json:"points"`
}

type counterJSON struct {
	Values   Values            `json:"values"`
	Pi       map[string]string `json:"pi"`
	Distance float64           `json:"distance"`
	Needs    []string          `json:"needs"`
}

type worstJSON struct {
	Distance float64 `json:"distance"`
	Values   Values  `json:"values"`
	Search   string  `json:"search"`
}

// MarshalJSON writes the result as one JSON object: verdict ("proved", "probable", "refuted",
// "undecided"), method ("grid", "random"), exact_phase, tolerance, parameters (name, scale L,
// degree D, points 2D+1), points, residual, lebesgue, bound (null for the random method, which
// certifies none), error_probability, certifies (the text of String), counterexample (values,
// pi — each value as a multiple of π where exact — distance and needs; null unless refuted) and
// worst (distance, values, search; null unless the pair was searched).
func (r *Result) MarshalJSON() ([]byte, error) {
	v := resultJSON{
		Verdict: r.Verdict.String(), Method: r.Method.String(), ExactPhase: r.ExactPhase,
		Tolerance: r.Tolerance, Parameters: make([]degreeJSON, len(r.Degrees)), Points: r.Points,
		Residual: r.Residual, Lebesgue: r.Lebesgue, ErrorProbability: r.ErrorProbability,
		Certifies: r.String(),
	}
	for i, d := range r.Degrees {
		v.Parameters[i] = degreeJSON{d.Name, d.Scale, d.Degree, d.Points()}
	}
	if !math.IsInf(r.Bound, 0) && !math.IsNaN(r.Bound) {
		v.Bound = &r.Bound
	}
	if f := r.Failure; f != nil {
		if f.At != nil {
			c := &counterJSON{Values: f.At, Pi: map[string]string{}, Distance: f.Distance, Needs: f.Needs}
			for name, x := range f.Pi {
				c.Pi[name] = piString(x)
			}
			v.Counterexample = c
		}
		v.Worst = &worstJSON{Distance: f.Worst, Values: f.WorstAt, Search: f.Search}
	}
	return json.Marshal(v)
}
