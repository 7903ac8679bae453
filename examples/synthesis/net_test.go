package synthesis

import (
	"math"
	"math/rand"
	"testing"
)

// The single-qubit Clifford group has 24 elements modulo global phase (the rotation group of the
// cube; common knowledge, from memory); with T at most once, 96 = 24·(3·2 − 2) (Matsumoto &
// Amano, arXiv:0806.3834, count 192(3·2^n − 2) with the 8 phases of ω, from memory).
func TestNetCountsCliffordAndOneT(t *testing.T) {
	n, err := NewNet(14)
	if err != nil {
		t.Fatal(err)
	}
	counts := map[int]int{}
	for i := range n.nodes {
		counts[n.word(int32(i)).tCount()]++
	}
	if counts[0] != 24 {
		t.Errorf("%d operators without T, want the 24 Cliffords", counts[0])
	}
	if counts[0]+counts[1] != 96 {
		t.Errorf("%d operators with at most one T, want 96", counts[0]+counts[1])
	}
}

// Every net word reaches its operator, and look-ups find the true nearest operator (checked by
// scanning the whole net).
func TestNetNearest(t *testing.T) {
	n, err := NewNet(10)
	if err != nil {
		t.Fatal(err)
	}
	for i := range n.nodes {
		if d := n.word(int32(i)).element().distance(n.nodes[i].q); d > 1e-12 {
			t.Fatalf("node %d: its word is %.3g from its operator", i, d)
		}
	}
	r := rand.New(rand.NewSource(5))
	for k := 0; k < 300; k++ {
		q := randomSU2(r)
		_, got := n.nearest(q)
		best := math.Inf(1)
		for i := range n.nodes {
			best = math.Min(best, q.distance(n.nodes[i].q))
		}
		if d := q.distance(got); d > best+1e-12 {
			t.Fatalf("nearest is %.15g away, the scan finds %.15g", d, best)
		}
	}
}

func TestNewNetRefusesBadLengths(t *testing.T) {
	for _, l := range []int{-1, maxNetLength + 1} {
		if _, err := NewNet(l); err == nil {
			t.Errorf("NewNet(%d) accepted", l)
		}
	}
}

// BenchmarkNewNet times building the scenario's net (words of up to 20 letters).
func BenchmarkNewNet(b *testing.B) {
	for b.Loop() {
		if _, err := NewNet(20); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkApproximate times one rotation brought within 1e-3 on the scenario's net.
func BenchmarkApproximate(b *testing.B) {
	net := scenarioNet()
	r := rand.New(rand.NewSource(9))
	targets := make([]quat, 64)
	for i := range targets {
		targets[i] = randomSU2(r)
	}
	i := 0
	for b.Loop() {
		if _, d, _ := net.approximate(targets[i%len(targets)], 1e-3, 6); d > 1e-3 {
			b.Fatalf("distance %g", d)
		}
		i++
	}
}
