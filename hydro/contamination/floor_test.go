package contamination

import "testing"

// Floors for the coding benchmarks, measured in the same run: the least
// work the task can be done in without checks or a result type.

// BenchmarkFloorTableSearch is three bare binary searches of the ISO 4406
// table, the search CodeFromCounts does for its three counts.
func BenchmarkFloorTableSearch(b *testing.B) {
	b.ReportAllocs()
	s := 0
	for i := 0; b.Loop(); i++ {
		c := benchCounts[i%len(benchCounts)]
		for _, x := range [3]float64{c * 30, c * 5, c} {
			lo, hi := 0, len(upper)
			for lo < hi {
				m := int(uint(lo+hi) >> 1)
				if upper[m] < x {
					lo = m + 1
				} else {
					hi = m
				}
			}
			s += lo
		}
	}
	sinkInt = s
}

// BenchmarkFloorHandLoop reads the scale numbers of "14/12/≥7" with a bare
// loop over its bytes, the reading ParseCode does before its checks.
func BenchmarkFloorHandLoop(b *testing.B) {
	b.ReportAllocs()
	s := 0
	for b.Loop() {
		in := "14/12/≥7"
		var n [3]int
		k := 0
		for i := 0; i < len(in); i++ {
			switch c := in[i]; {
			case c >= '0' && c <= '9':
				n[k] = n[k]*10 + int(c-'0')
			case c == '/':
				k++
			}
		}
		s += n[0] + n[1] + n[2]
	}
	sinkInt = s
}

var sinkInt int
