package qcheck

import (
	"flag"
	"strconv"
	"testing"
	"time"

	"pgregory.net/rapid"
)

// BenchmarkCheckRule compares CheckRule's property on the same rule, rz(a)·rz(b) = rz(a+b),
// sampled (mergeRZ draws a and b) and proved for every value (mergeRZForAll), with and without
// the pass in context; one op is one CheckRule: one rapid.Check of -rapid.checks checks, and for
// the proved rule its one proof:
//
//	go test ./qcheck -run '^$' -bench CheckRule -benchtime 20x -cpu 1
func BenchmarkCheckRule(b *testing.B) {
	b.Run("sampled/rule", func(b *testing.B) { benchmarkRule(b, func() func(*rapid.T) { return RuleProperty(mergeRZ, nil) }) })
	b.Run("proved/rule", func(b *testing.B) {
		benchmarkRule(b, func() func(*rapid.T) { return RuleProperty(mergeRZForAll, nil) })
	})
	b.Run("sampled/pass", func(b *testing.B) {
		benchmarkRule(b, func() func(*rapid.T) { return RuleProperty(mergeRZ, mergeRZPass) })
	})
	b.Run("proved/pass", func(b *testing.B) {
		benchmarkRule(b, func() func(*rapid.T) { return RuleProperty(mergeRZForAll, mergeRZPass) })
	})
}

func benchmarkRule(b *testing.B, property func() func(*rapid.T)) {
	checks, _ := strconv.Atoi(flag.Lookup("rapid.checks").Value.String())
	h := &recordTB{name: "BenchmarkCheckRule"}
	start, cpu := time.Now(), cpuTime()
	for b.Loop() {
		rapid.Check(h, property())
	}
	b.ReportMetric(float64(checks*b.N)/time.Since(start).Seconds(), "checks/s")
	b.ReportMetric(float64(checks*b.N)/(cpuTime()-cpu).Seconds(), "checks/cpu-s")
	if h.failed {
		b.Fatal(h.errors)
	}
}
