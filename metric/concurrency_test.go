package metric

import (
	"sync"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// Calls from many goroutines at once share only the pool of working memory;
// each must get the answer it gets alone (run with -race to check sharing).
func TestConcurrentCalls(t *testing.T) {
	rng := newRand(31)
	type pair struct{ u, v *mat.CDense }
	pairs := make([]pair, 6)
	want := make([]float64, len(pairs))
	for i := range pairs {
		n := 2 << (i % 4)
		pairs[i] = pair{haar(rng, n), haar(rng, n)}
		want[i] = PhaseDistance(pairs[i].u, pairs[i].v)
	}
	var wg sync.WaitGroup
	errs := make(chan string, 64)
	for g := 0; g < 4; g++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for r := 0; r < 25; r++ {
				for i, p := range pairs {
					if got := PhaseDistance(p.u, p.v); got != want[i] {
						errs <- "PhaseDistance differs when called concurrently"
						return
					}
					if _, d := Witness(p.u, p.v); d > want[i]+1e-12 {
						errs <- "Witness deviation exceeds PhaseDistance when called concurrently"
						return
					}
				}
			}
		}()
	}
	wg.Wait()
	close(errs)
	for e := range errs {
		t.Error(e)
	}
}
