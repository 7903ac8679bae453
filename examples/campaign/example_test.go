package campaign_test

import (
	"bytes"
	"fmt"
	"strings"

	"qcheck.dev/examples/campaign"
)

// Run prints the scenario, how many circuits were checked, and the shrunk report; here only the
// first lines are shown (the whole output for seed 1 is in testdata/examples/demo-seed1.txt).
func ExampleRun() {
	var b bytes.Buffer
	if err := campaign.Run(&b, 1); err != nil {
		fmt.Println(err)
		return
	}
	lines := strings.Split(b.String(), "\n")
	fmt.Println(strings.Join(lines[:4], "\n"))
	// Output:
	// Scenario: Thistlewick Qubit Foundry's Fieldfare compiler team reviews a patch to its peephole optimizer.
	// qcheck checks shortcut.Optimize on random 3-qubit circuits of up to 30 gates (seed 1).
	//
	// Checked 2 circuits: 1 kept their meaning, circuit 2 did not. Shrunk report:
}
