// Command qcheck checks, from a shell or a CI job, that circuits written in OpenQASM 2.0 or 3
// (the version is read from each file) by any toolchain mean the same thing: the same unitary
// within a tolerance, by default up to a global phase.
//
//	qcheck equiv [flags] A.qasm B.qasm     exit 0 when equivalent, 1 when not, 2 on bad input
//	qcheck measures [-json] A.qasm B.qasm  every distance and fidelity (up to 10 qubits)
//	qcheck random [flags]                  random circuits as OpenQASM, to feed another compiler
//	qcheck pairs [flags] DIR               every NAME.before.qasm against NAME.after.qasm in DIR
//	qcheck demo [-seed N]                  the built-in scenario
//
// Run qcheck COMMAND -h for a command's flags. Results go to stdout (JSON with -json), errors to
// stderr.
package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"strings"
)

// Exit codes shared by every subcommand.
const (
	exitOK      = 0 // equivalent, or the command did what was asked
	exitDiffer  = 1 // some circuits differ (or a pair failed its expectation)
	exitBadUsed = 2 // bad input or usage
	// exitOpen: equiv on files with free input parameters found no difference but did not prove
	// the pair equal for every value (a randomized test passed, or the certified bound is above
	// the tolerance).
	exitOpen = 3
)

const usage = `qcheck checks that quantum circuits written in OpenQASM 2.0 or 3 mean the same thing.

Usage:
  qcheck equiv [flags] A.qasm B.qasm     exit 0 if equivalent, 1 if not, 2 on bad input
                                         (3: free input parameters, not proved for every value)
  qcheck measures [-json] A.qasm B.qasm  print every distance and fidelity (up to 10 qubits)
  qcheck random [flags]                  write random circuits as OpenQASM 2.0 or 3
  qcheck pairs [flags] DIR               check every NAME.before.qasm against NAME.after.qasm
  qcheck demo [-seed N]                  run the built-in scenario

Run 'qcheck COMMAND -h' for the flags of a command.
`

func main() { os.Exit(run(os.Args[1:], os.Stdout, os.Stderr)) }

// run executes one command line and returns the exit code; main only wires it to the process.
func run(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return exitBadUsed
	}
	commands := map[string]func([]string, io.Writer, io.Writer) int{
		"equiv":    equiv,
		"measures": measures,
		"random":   random,
		"pairs":    pairs,
		"demo":     demo,
	}
	switch args[0] {
	case "-h", "-help", "--help", "help":
		fmt.Fprint(stdout, usage)
		return exitOK
	}
	cmd, ok := commands[args[0]]
	if !ok {
		fmt.Fprintf(stderr, "qcheck: unknown command %q\n\n%s", args[0], usage)
		return exitBadUsed
	}
	return cmd(args[1:], stdout, stderr)
}

// command is one subcommand's flag set with its help text.
type command struct {
	fs     *flag.FlagSet
	stdout io.Writer
	stderr io.Writer
}

// newCommand makes the flag set of a subcommand; synopsis is the usage line and about says in a
// few lines what the command does. -h prints both and the flags to stdout.
func newCommand(name, synopsis, about string, stdout, stderr io.Writer) *command {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	c := &command{fs: fs, stdout: stdout, stderr: stderr}
	fs.SetOutput(io.Discard)
	fs.Usage = func() {
		fmt.Fprintf(stdout, "usage: qcheck %s\n\n%s\n", synopsis, strings.TrimSpace(about))
		var any bool
		fs.VisitAll(func(*flag.Flag) { any = true })
		if any {
			fmt.Fprintln(stdout, "\nflags:")
			fs.SetOutput(stdout)
			fs.PrintDefaults()
			fs.SetOutput(io.Discard)
		}
	}
	return c
}

// parse reads flags and positional arguments in any order (flags may follow the files). It
// returns the positional arguments, or a code to exit with: exitOK after -h, exitBadUsed on a
// bad flag or a wrong number of arguments (want < 0 accepts any number).
func (c *command) parse(args []string, want int) ([]string, int, bool) {
	var pos []string
	for {
		if err := c.fs.Parse(args); err != nil {
			if errors.Is(err, flag.ErrHelp) { // the flag package has printed the usage
				return nil, exitOK, false
			}
			fmt.Fprintf(c.stderr, "qcheck %s: %v (see qcheck %s -h)\n", c.fs.Name(), err, c.fs.Name())
			return nil, exitBadUsed, false
		}
		args = c.fs.Args()
		if len(args) == 0 {
			break
		}
		pos = append(pos, args[0])
		args = args[1:]
	}
	if want >= 0 && len(pos) != want {
		fmt.Fprintf(c.stderr, "qcheck %s: want %d argument(s), got %d (see qcheck %s -h)\n", c.fs.Name(), want, len(pos), c.fs.Name())
		return nil, exitBadUsed, false
	}
	return pos, 0, true
}

// fail writes an error to stderr and returns exitBadUsed.
func (c *command) fail(format string, args ...any) int {
	fmt.Fprintf(c.stderr, "qcheck %s: %s\n", c.fs.Name(), fmt.Sprintf(format, args...))
	return exitBadUsed
}
