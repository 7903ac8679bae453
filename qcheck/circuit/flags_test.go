package circuit

import "flag"

var update = flag.Bool("update", false, "rewrite golden files under testdata/circuit")
