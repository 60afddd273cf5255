package contamination

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// iso4406Table1 is ISO 4406:2021, Table 1 as printed [S]: for each scale
// number, more than the first figure, up to and including the second,
// particles per mL. Typed in separately from the package's own table, so
// the test does not read the table it checks.
var iso4406Table1 = []struct {
	n         int
	above, to float64
}{
	{0, 0, 0.01}, {1, 0.01, 0.02}, {2, 0.02, 0.04}, {3, 0.04, 0.08},
	{4, 0.08, 0.16}, {5, 0.16, 0.32}, {6, 0.32, 0.64}, {7, 0.64, 1.3},
	{8, 1.3, 2.5}, {9, 2.5, 5}, {10, 5, 10}, {11, 10, 20}, {12, 20, 40},
	{13, 40, 80}, {14, 80, 160}, {15, 160, 320}, {16, 320, 640},
	{17, 640, 1300}, {18, 1300, 2500}, {19, 2500, 5000}, {20, 5000, 10000},
	{21, 10000, 20000}, {22, 20000, 40000}, {23, 40000, 80000},
	{24, 80000, 160000}, {25, 160000, 320000}, {26, 320000, 640000},
	{27, 640000, 1300000}, {28, 1300000, 2500000},
}

// TestScaleNumberTableBounds checks every row boundary on both sides:
// the upper bound itself belongs to the row ("up to and including"), a
// count just above it to the next row, a count just below to the row.
// ISO 4406:2021, Table 1 [S]. Table look-ups are exact.
func TestScaleNumberTableBounds(t *testing.T) {
	const rel = 1e-9 // "just above/below": far outside boundSlack (1e-12)
	for _, r := range iso4406Table1 {
		cases := []struct {
			name string
			x    float64
			want int
		}{
			{"upper bound", r.to, r.n},
			{"just below upper", r.to * (1 - rel), r.n},
			{"just above upper", r.to * (1 + rel), r.n + 1},
			{"just above lower", r.above*(1+rel) + 1e-300, r.n},
			{"middle", (r.above + r.to) / 2, r.n},
		}
		for _, c := range cases {
			got, err := ScaleNumber(c.x)
			if err != nil || got != c.want {
				t.Errorf("row %d %s: ScaleNumber(%g) = %d, %v; want %d", r.n, c.name, c.x, got, err, c.want)
			}
		}
		above, to, err := ScaleRange(r.n)
		if err != nil || above != r.above || to != r.to {
			t.Errorf("ScaleRange(%d) = %g, %g, %v; want %g, %g", r.n, above, to, err, r.above, r.to)
		}
	}
}

func TestScaleNumberEdges(t *testing.T) {
	cases := []struct {
		name string
		x    float64
		want int
	}{
		// Zero lies below the lowest row; we report 0 (package rule).
		{"zero", 0, 0},
		{"smallest positive", math.SmallestNonzeroFloat64, 0},
		// Above 2 500 000 per mL: reported ">28" [M], returned as AboveTable.
		{"just above table", 2.5e6 * (1 + 1e-9), AboveTable},
		{"far above table", 1e300, AboveTable},
		{"largest float", math.MaxFloat64, AboveTable},
		// Worked check, ISO 4406 [S]: 3000 / 500 / 7 per mL → 19/16/10.
		{"worked 4 µm", 3000, 19},
		{"worked 6 µm", 500, 16},
		{"worked 14 µm", 7, 10},
	}
	for _, c := range cases {
		got, err := ScaleNumber(c.x)
		if err != nil || got != c.want {
			t.Errorf("%s: ScaleNumber(%g) = %d, %v; want %d", c.name, c.x, got, err, c.want)
		}
	}
}

// TestScaleNumberAgreesWithLinearScan compares the binary search with a
// plain reading of the table on a dense sweep of counts.
func TestScaleNumberAgreesWithLinearScan(t *testing.T) {
	for x := 1e-4; x < 1e7; x *= 1.0137 {
		want := AboveTable
		for _, r := range iso4406Table1 {
			if x <= r.to {
				want = r.n
				break
			}
		}
		if got, _ := ScaleNumber(x); got != want {
			t.Fatalf("ScaleNumber(%g) = %d, linear scan gives %d", x, got, want)
		}
	}
}

func TestPerML(t *testing.T) {
	cases := []struct {
		name          string
		count         float64
		sample        units.Volume
		perML, per100 float64
	}{
		// Worked check, ISO 4406 [S]: counts per 100 mL ÷ 100 = per mL.
		{"worked 4 µm", 300000, 100 * units.Millilitre, 3000, 300000},
		{"worked 14 µm", 700, 100 * units.Millilitre, 7, 700},
		// 0.1 L is 100.00000000000001 mL in float64: still 25 per mL.
		{"litre sample", 2500, 0.1 * units.Litre, 25, 2500},
		{"10 mL", 55, 10 * units.Millilitre, 5.5, 550},
		{"zero count", 0, 25 * units.Millilitre, 0, 0},
	}
	for _, c := range cases {
		got, err := PerML(c.count, c.sample)
		if err != nil || math.Abs(got-c.perML) > 4e-16*c.perML {
			t.Errorf("%s: PerML = %g, %v; want %g", c.name, got, err, c.perML)
		}
		got, err = Per100mL(c.count, c.sample)
		if err != nil || math.Abs(got-c.per100) > 4e-16*c.per100 {
			t.Errorf("%s: Per100mL = %g, %v; want %g", c.name, got, err, c.per100)
		}
	}
}

// TestSampleBoundsSurviveUnitRounding: 250 000 particles in 0.1 L is
// exactly 2 500 per mL, the top of row 18; unit rounding must not push it
// into row 19.
func TestSampleBoundsSurviveUnitRounding(t *testing.T) {
	for _, vol := range []units.Volume{0.1 * units.Litre, 100 * units.Millilitre, 1e-4 * units.CubicMetre} {
		for _, r := range iso4406Table1[10:] { // bounds ≥ 10 per mL: whole counts in 100 mL
			count := r.to * 100
			pm, err := PerML(count, vol)
			if err != nil {
				t.Fatal(err)
			}
			if got, _ := ScaleNumber(pm); got != r.n {
				t.Errorf("%g counted in %v: %g per mL → %d, want %d", count, vol, pm, got, r.n)
			}
		}
	}
}

func TestScaleBadInput(t *testing.T) {
	// Bad counts.
	for _, x := range []float64{-1, -1e-300, math.NaN(), math.Inf(1), math.Inf(-1)} {
		if _, err := ScaleNumber(x); !errors.Is(err, units.ErrRange) {
			t.Errorf("ScaleNumber(%g): err = %v, want units.ErrRange", x, err)
		}
	}
	// Bad scale numbers.
	for _, n := range []int{-1, 29, 1000} {
		if _, _, err := ScaleRange(n); !errors.Is(err, units.ErrRange) {
			t.Errorf("ScaleRange(%d): err = %v, want units.ErrRange", n, err)
		}
	}
	// Bad counts and volumes: each error names the function called and the
	// argument (Per100mL names itself, not the PerML it calls).
	bad := []struct {
		count float64
		vol   units.Volume
		param string
	}{
		{-1, units.Millilitre, "count"},
		{math.NaN(), units.Millilitre, "count"},
		{math.Inf(1), units.Millilitre, "count"},
		{1, 0, "sample"},
		{1, -units.Millilitre, "sample"},
		{1, units.Volume(math.NaN()), "sample"},
		{1, units.Volume(math.Inf(1)), "sample"},
	}
	for _, b := range bad {
		_, err := PerML(b.count, b.vol)
		checktest.RangeErrorIn(t, err, "contamination.PerML", b.param)
		_, err = Per100mL(b.count, b.vol)
		checktest.RangeErrorIn(t, err, "contamination.Per100mL", b.param)
	}
	// Overflow names the result.
	_, err := PerML(1e300, 1e-300*units.Millilitre)
	checktest.RangeErrorIn(t, err, "contamination.PerML", "count per mL")
	_, err = Per100mL(1e300, 1e-300*units.Millilitre)
	checktest.RangeErrorIn(t, err, "contamination.Per100mL", "count per mL")
}

func TestScaleNumberAllocs(t *testing.T) {
	var sink int
	allocs := testing.AllocsPerRun(100, func() {
		n, _ := ScaleNumber(1234.5)
		sink += n
	})
	if allocs != 0 {
		t.Errorf("ScaleNumber allocates %v times per call, want 0", allocs)
	}
	_ = sink
}

var benchCounts = []float64{0, 0.005, 0.7, 7, 55, 500, 3000, 45000, 9e5, 3e6}

func BenchmarkScaleNumber(b *testing.B) {
	b.ReportAllocs()
	s := 0
	for i := 0; b.Loop(); i++ {
		n, _ := ScaleNumber(benchCounts[i%len(benchCounts)])
		s += n
	}
	_ = s
}

// TestSampleBoundsInEveryVolume codes raw counts that sit exactly on each
// bound of ISO 4406:2021, Table 1 [S] once divided by the sample volume,
// with the volume given in mL, L and m³ (conversions by the units package):
// the count on the bound codes to the row ("up to and including"), a count
// 10⁻⁹ above it to the next row (">28" past the top). 130 000 in 100 mL is
// 1300 per mL, number 17; 130 001 is 18. Exact look-ups.
func TestSampleBoundsInEveryVolume(t *testing.T) {
	vols := []struct {
		ml  float64
		vol units.Volume
	}{
		{1, units.Millilitre}, {10, 10 * units.Millilitre}, {25, 25 * units.Millilitre},
		{100, 100 * units.Millilitre}, {100, 0.1 * units.Litre}, {100, 1e-4 * units.CubicMetre},
		{1000, units.Litre}, {1000, 1e-3 * units.CubicMetre}, {0.3, 0.3 * units.Millilitre},
	}
	for _, v := range vols {
		for _, r := range iso4406Table1 {
			on := r.to * v.ml
			wantUp := Number{Scale: r.n + 1}
			if r.n == MaxScale {
				wantUp = Number{Scale: MaxScale, Mark: MarkAbove}
			}
			for _, c := range []struct {
				count float64
				want  Number
			}{{on, Number{Scale: r.n}}, {on * (1 + 1e-9), wantUp}} {
				got, err := CodeFromSample(c.count, c.count, c.count, v.vol)
				if err != nil {
					t.Fatal(err)
				}
				n := got.N[2]
				if n.Mark == MarkFewCounted {
					n.Mark = MarkNone
				}
				if n != c.want {
					t.Errorf("%g counted in %v (%g per mL): %v, want %v", c.count, v.vol, c.count/v.ml, n, c.want)
				}
			}
		}
	}
	// The same with the count per 100 mL that laboratories report:
	// 130 000 per 100 mL → 1300 per mL → 17.
	if c, err := CodeFromCounts(130000.0/100, 130000.0/100, 130000.0/100); err != nil || c.N[0].Scale != 17 {
		t.Errorf("130 000 per 100 mL: %v, %v; want 17", c, err)
	}
}

// TestNegativeZeroCount: a count of −0 is a count of zero; the count per mL
// is +0, not "-0".
func TestNegativeZeroCount(t *testing.T) {
	negZero := math.Copysign(0, -1)
	for name, f := range map[string]func(float64, units.Volume) (float64, error){"PerML": PerML, "Per100mL": Per100mL} {
		if v, err := f(negZero, units.Millilitre); err != nil || v != 0 || math.Signbit(v) {
			t.Errorf("%s(-0, 1 mL) = %g, %v; want +0", name, v, err)
		}
	}
}

// TestScaleSearch: the exponent-guided search agrees with a plain binary
// search of the table for counts at, just above and just below every bound
// and its slack, and across the whole range.
func TestScaleSearch(t *testing.T) {
	binary := func(x float64) int {
		lo, hi := 0, len(upperSlack)
		for lo < hi {
			m := int(uint(lo+hi) >> 1)
			if upperSlack[m] < x {
				lo = m + 1
			} else {
				hi = m
			}
		}
		return lo
	}
	var xs []float64
	for _, u := range upper {
		for _, x := range []float64{u, u * (1 + boundSlack), u * (1 + 2*boundSlack), u * (1 - 1e-15), u * 1.01, u * 0.99} {
			xs = append(xs, x, math.Nextafter(x, 0), math.Nextafter(x, math.Inf(1)))
		}
	}
	for k := 0; k <= 20000; k++ {
		xs = append(xs, math.Pow(10, -4+11*float64(k)/20000))
	}
	xs = append(xs, 0, 5e-324, 1e-300, 2.5e6, 3e6, 1e300, math.MaxFloat64)
	for _, x := range xs {
		if got, want := scale(x), binary(x); got != want {
			t.Errorf("scale(%.17g) = %d, binary search %d", x, got, want)
		}
	}
}
