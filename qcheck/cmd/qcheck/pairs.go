package main

import (
	"bufio"
	"encoding/json"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"text/tabwriter"
)

const pairsAbout = `
Checks every pair in DIR: NAME.before.qasm is the reference and NAME.after.qasm the circuit that
must mean the same. Prints one row per pair and a summary. Without -expect every pair must be
equivalent. With -expect FILE, each line "NAME equivalent|different [DISTANCE]" ('#' starts a
comment) says what a pair must give; a listed distance must match within 1e-9 + 1e-9·DISTANCE
(with the default operator-norm measure, for unitary pairs). Each pair is compared by its own
meaning: pairs whose files measure, reset or have an if are compared as programs (see equiv).
Exit 0 when every pair passes, 1 when one fails, 2 when
a file is missing or unreadable, or on bad usage. The comparison flags are those of equiv, with
A = NAME.before.qasm and B = NAME.after.qasm.`

// expectation is one line of an -expect file.
type expectation struct {
	equivalent  bool
	distance    float64
	hasDistance bool
}

// pairRow is one line of the pairs table (and its JSON form).
type pairRow struct {
	Pair       string   `json:"pair"`
	Expected   string   `json:"expected"`
	Equivalent bool     `json:"equivalent"`
	Distance   float64  `json:"distance"`
	Meaning    string   `json:"meaning,omitempty"`
	Want       *float64 `json:"expected_distance,omitempty"`
	Pass       bool     `json:"pass"`
	Error      string   `json:"error,omitempty"`
}

func pairs(args []string, stdout, stderr io.Writer) int {
	c := newCommand("pairs", "pairs [flags] DIR", pairsAbout, stdout, stderr)
	var f compareFlags
	f.register(c.fs)
	expectFile := c.fs.String("expect", "", "`FILE` of expected verdicts and distances, one pair a line")
	asJSON := c.fs.Bool("json", false, "write the rows and the counts as one JSON object")
	dirs, code, ok := c.parse(args, 1)
	if !ok {
		return code
	}
	dir := dirs[0]
	if _, err := f.options(); err != nil {
		return c.fail("%v", err)
	}
	var expect map[string]expectation
	if *expectFile != "" {
		var err error
		if expect, err = readExpectations(*expectFile); err != nil {
			return c.fail("%v", err)
		}
	}
	names, problems, err := pairNames(dir)
	if err != nil {
		return c.fail("%v", err)
	}
	if len(names) == 0 && len(problems) == 0 {
		return c.fail("no NAME.before.qasm files in %s", dir)
	}
	var rows []pairRow
	for _, p := range problems {
		rows = append(rows, pairRow{Pair: p.name, Expected: "-", Error: p.err})
	}
	for name := range expect {
		if !contains(names, name) && !hasProblem(problems, name) {
			rows = append(rows, pairRow{Pair: name, Expected: "-", Error: "listed in " + *expectFile + " but not in " + dir})
		}
	}
	for _, name := range names {
		row := pairRow{Pair: name, Expected: "equivalent"}
		e, listed := expect[name]
		switch {
		case expect == nil:
			e = expectation{equivalent: true}
		case !listed:
			row.Expected, row.Error = "-", "not listed in "+*expectFile
			rows = append(rows, row)
			continue
		}
		if !e.equivalent {
			row.Expected = "different"
		}
		if e.hasDistance {
			d := e.distance
			row.Want = &d
		}
		r, err := f.compareFiles(filepath.Join(dir, name+".before.qasm"), filepath.Join(dir, name+".after.qasm"))
		if err != nil {
			row.Error = err.Error()
			rows = append(rows, row)
			continue
		}
		row.Equivalent, row.Distance, row.Meaning = r.Equivalent, r.Distance, r.Meaning
		row.Pass = r.Equivalent == e.equivalent
		if e.hasDistance && f.measure == "operator" && !f.measured && r.Meaning == "unitary" && math.Abs(r.Distance-e.distance) > 1e-9+1e-9*e.distance {
			row.Pass = false
		}
		rows = append(rows, row)
	}
	sort.Slice(rows, func(i, j int) bool { return rows[i].Pair < rows[j].Pair })
	passed, failed, errs := 0, 0, 0
	for _, r := range rows {
		switch {
		case r.Error != "":
			errs++
		case r.Pass:
			passed++
		default:
			failed++
		}
	}
	if *asJSON {
		out, err := json.MarshalIndent(struct {
			Pairs  []pairRow `json:"pairs"`
			Passed int       `json:"passed"`
			Failed int       `json:"failed"`
			Errors int       `json:"errors"`
		}{rows, passed, failed, errs}, "", "  ")
		if err != nil {
			return c.fail("%v", err)
		}
		fmt.Fprintf(stdout, "%s\n", out)
	} else {
		writeTable(stdout, rows)
		fmt.Fprintf(stdout, "%d pairs: %d passed, %d failed, %d errors\n", len(rows), passed, failed, errs)
	}
	for _, r := range rows {
		if r.Error != "" {
			fmt.Fprintf(stderr, "qcheck pairs: %s: %s\n", r.Pair, r.Error)
		}
	}
	switch {
	case errs > 0:
		return exitBadUsed
	case failed > 0:
		return exitDiffer
	}
	return exitOK
}

func writeTable(w io.Writer, rows []pairRow) {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, "pair\texpected\tverdict\tdistance\tresult")
	for _, r := range rows {
		if r.Error != "" {
			fmt.Fprintf(tw, "%s\t%s\t-\t-\tERROR\n", r.Pair, r.Expected)
			continue
		}
		v, res := "different", "pass"
		if r.Equivalent {
			v = "equivalent"
		}
		if !r.Pass {
			res = "FAIL"
			if r.Want != nil && r.Equivalent == (r.Expected == "equivalent") {
				res = fmt.Sprintf("FAIL (want distance %.6g)", *r.Want)
			}
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%.3g\t%s\n", r.Pair, r.Expected, v, r.Distance, res)
	}
	tw.Flush()
}

type pairProblem struct{ name, err string }

// pairNames lists the NAME of every NAME.before.qasm in dir with its NAME.after.qasm, and the
// halves that have no partner.
func pairNames(dir string) ([]string, []pairProblem, error) {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return nil, nil, err
	}
	have := map[string]bool{}
	for _, e := range entries {
		have[e.Name()] = true
	}
	var names []string
	var problems []pairProblem
	for _, e := range entries {
		n := e.Name()
		if name, ok := strings.CutSuffix(n, ".before.qasm"); ok {
			if have[name+".after.qasm"] {
				names = append(names, name)
			} else {
				problems = append(problems, pairProblem{name, "no " + name + ".after.qasm beside " + n})
			}
		} else if name, ok := strings.CutSuffix(n, ".after.qasm"); ok && !have[name+".before.qasm"] {
			problems = append(problems, pairProblem{name, "no " + name + ".before.qasm beside " + n})
		}
	}
	sort.Strings(names)
	return names, problems, nil
}

// readExpectations reads "NAME equivalent|different [DISTANCE]" lines; errors give file:line.
func readExpectations(path string) (map[string]expectation, error) {
	fh, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer fh.Close()
	out := map[string]expectation{}
	s := bufio.NewScanner(fh)
	for line := 1; s.Scan(); line++ {
		text := strings.TrimSpace(s.Text())
		if i := strings.IndexByte(text, '#'); i >= 0 {
			text = strings.TrimSpace(text[:i])
		}
		if text == "" {
			continue
		}
		fields := strings.Fields(text)
		if len(fields) < 2 || len(fields) > 3 || (fields[1] != "equivalent" && fields[1] != "different") {
			return nil, fmt.Errorf("%s:%d: want NAME equivalent|different [DISTANCE]", path, line)
		}
		e := expectation{equivalent: fields[1] == "equivalent"}
		if len(fields) == 3 {
			d, err := strconv.ParseFloat(fields[2], 64)
			if err != nil || d < 0 || math.IsNaN(d) || math.IsInf(d, 0) {
				return nil, fmt.Errorf("%s:%d: distance %q is not a finite non-negative number", path, line, fields[2])
			}
			e.distance, e.hasDistance = d, true
		}
		if _, dup := out[fields[0]]; dup {
			return nil, fmt.Errorf("%s:%d: pair %s listed twice", path, line, fields[0])
		}
		out[fields[0]] = e
	}
	return out, s.Err()
}

func contains(names []string, s string) bool {
	i := sort.SearchStrings(names, s)
	return i < len(names) && names[i] == s
}

func hasProblem(ps []pairProblem, name string) bool {
	for _, p := range ps {
		if p.name == name {
			return true
		}
	}
	return false
}
