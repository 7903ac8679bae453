package param

import (
	"encoding/json"
	"math"
	"testing"
)

func TestResultJSON(t *testing.T) {
	// crz(a+2π) against crz(a): refuted at a = 0 with distance √2 (see TestProveRefutes).
	res, err := Prove(New(2).CRZ(a.Plus(Pi(2, 1)), 0, 1), New(2).CRZ(a, 0, 1), Options{})
	if err != nil {
		t.Fatal(err)
	}
	data, err := json.Marshal(res)
	if err != nil {
		t.Fatal(err)
	}
	var got struct {
		Verdict    string
		Method     string
		Parameters []struct {
			Name                  string
			Scale, Degree, Points int
		}
		Bound          *float64
		Certifies      string
		Counterexample *struct {
			Values   map[string]float64
			Pi       map[string]string
			Distance float64
			Needs    []string
		}
		Worst *struct{ Distance float64 }
	}
	if err := json.Unmarshal(data, &got); err != nil {
		t.Fatal(err)
	}
	ce := got.Counterexample
	if got.Verdict != "refuted" || got.Method != "grid" || got.Bound == nil || ce == nil || got.Worst == nil {
		t.Fatalf("%s", data)
	}
	if len(got.Parameters) != 1 || got.Parameters[0].Name != "a" || got.Parameters[0].Scale != 2 || got.Parameters[0].Degree != 2 || got.Parameters[0].Points != 5 {
		t.Errorf("parameters %+v", got.Parameters)
	}
	if ce.Pi["a"] != "0" || ce.Values["a"] != 0 || math.Abs(ce.Distance-math.Sqrt2) > 1e-12 || len(ce.Needs) != 0 {
		t.Errorf("counterexample %+v", *ce)
	}
	if got.Certifies != res.String() {
		t.Errorf("certifies %q", got.Certifies)
	}
	// The random method certifies no bound: null, not a number JSON cannot hold.
	res, err = Prove(New(1).U(a, b, c, 0), New(1).RZ(c, 0).RY(a, 0).RZ(b, 0), Options{MaxPoints: 10})
	if err != nil {
		t.Fatal(err)
	}
	data, err = json.Marshal(res)
	if err != nil {
		t.Fatal(err)
	}
	var random map[string]any
	if err := json.Unmarshal(data, &random); err != nil {
		t.Fatal(err)
	}
	if random["verdict"] != "probable" || random["bound"] != nil || random["counterexample"] != nil {
		t.Errorf("%s", data)
	}
}
