package synthesis

import (
	"fmt"
	"math"
)

// Net is an ε-net of words over {H, S, S†, T, T†}: every operator reachable by a word of at most
// MaxLength letters, modulo global phase, each kept with a shortest word that reaches it, and a
// k-d tree to find the nearest one to any element of SU(2). It is built once and shared (it is
// read-only after NewNet, so safe for concurrent use).
type Net struct {
	// MaxLength is the length of the longest words enumerated.
	MaxLength int
	nodes     []netNode
	tree      kdTree
}

// netNode is one operator of the net: its element, and its word as a link to the node it extends.
type netNode struct {
	q      quat
	parent int32 // index of the node whose word this one extends by one letter; −1 for the empty word
	last   letter
}

// maxNetLength bounds the enumeration; at length 24 the net already holds millions of operators.
const maxNetLength = 24

// NewNet enumerates all words of up to maxLength letters breadth first, keeping one word per
// operator modulo global phase (the first found, so a shortest one), and indexes the operators
// for nearest-neighbour look-up.
func NewNet(maxLength int) (*Net, error) {
	if maxLength < 0 || maxLength > maxNetLength {
		return nil, fmt.Errorf("synthesis: net word length %d out of range [0, %d]", maxLength, maxNetLength)
	}
	n := &Net{MaxLength: maxLength}
	seen := map[[4]int64]bool{}
	add := func(q quat, parent int32, last letter) bool {
		q = q.canonical()
		k := key(q)
		if seen[k] {
			return false
		}
		seen[k] = true
		n.nodes = append(n.nodes, netNode{q: q, parent: parent, last: last})
		return true
	}
	add(quat{1, 0, 0, 0}, -1, 0)
	frontier := []int32{0}
	for length := 1; length <= maxLength; length++ {
		var next []int32
		for _, i := range frontier {
			for l := letter(0); l < letters; l++ {
				if i > 0 && l == inverses[n.nodes[i].last] {
					continue // cancels the last letter
				}
				if add(elements[l].mul(n.nodes[i].q), i, l) {
					next = append(next, int32(len(n.nodes)-1))
				}
			}
		}
		frontier = next
	}
	points := make([]quat, len(n.nodes))
	for i := range n.nodes {
		points[i] = n.nodes[i].q
	}
	n.tree = newKDTree(points)
	return n, nil
}

// keyGrid is the resolution at which two enumerated operators count as the same. Words of up to
// 24 letters accumulate rounding of about 1e-15, and distinct operators of the group generated
// by H and T with short words are far further apart than this (common practice, no source).
const keyGrid = 1e-9

func key(q quat) [4]int64 {
	var k [4]int64
	for i, x := range q {
		k[i] = int64(math.Round(x / keyGrid))
	}
	return k
}

// Len returns the number of distinct operators in the net.
func (n *Net) Len() int { return len(n.nodes) }

// word returns the word of node i.
func (n *Net) word(i int32) word {
	var w word
	for ; n.nodes[i].parent >= 0; i = n.nodes[i].parent {
		w = append(w, n.nodes[i].last)
	}
	// Collected from the last letter back; reverse into circuit order.
	for a, b := 0, len(w)-1; a < b; a, b = a+1, b-1 {
		w[a], w[b] = w[b], w[a]
	}
	return w
}

// nearest returns the word of the net's operator closest to q in phase-free distance, and that
// operator.
func (n *Net) nearest(q quat) (word, quat) {
	q = q.canonical()
	// ±q are the same operator; the tree holds canonical points, so search near both.
	i, d := n.tree.nearest(q, 5)
	if j, _ := n.tree.nearest(quat{-q[0], -q[1], -q[2], -q[3]}, d); j >= 0 {
		i = j
	}
	return n.word(int32(i)), n.nodes[i].q
}

// Covering returns the largest distance from any of the given operators to the net, a measured
// (not proven) covering radius when the samples are spread over SU(2).
func (n *Net) Covering(samples []quat) float64 {
	worst := 0.0
	for _, q := range samples {
		_, p := n.nearest(q)
		worst = math.Max(worst, q.distance(p))
	}
	return worst
}
