package units

//go:generate go run gen.go

import "math"

// Exact definitions, written once. These untyped constants carry the full
// precision of Go's constant arithmetic, so every unit derived from them is
// rounded to float64 exactly once. Source: NIST SP 811 (2008), Appendix B,
// and the SI Brochure, 9th ed. (2019); each is exact by definition unless
// said otherwise.
const (
	inchM           = 0.0254                        // inch = 0.0254 m exactly (international yard and pound, 1959)
	footM           = 12 * inchM                    // foot = 12 in = 0.3048 m exactly
	lbmKg           = 0.45359237                    // pound (avoirdupois) = 0.45359237 kg exactly
	gravity         = 9.80665                       // standard acceleration of gravity g₀, m/s², exact (CGPM 1901)
	lbfN            = lbmKg * gravity               // pound-force = lbm·g₀ = 4.4482216152605 N exactly
	kgfN            = gravity                       // kilogram-force = 1 kg·g₀ = 9.80665 N exactly
	psiPa           = lbfN / (inchM * inchM)        // psi = lbf/in² ≈ 6894.757293168361 Pa (exact ratio)
	barPa           = 1e5                           // bar = 10⁵ Pa exactly
	atmPa           = 101325                        // standard atmosphere = 101 325 Pa exactly
	usGallonM3      = 231 * inchM * inchM * inchM   // US gallon = 231 in³ = 3.785411784 L exactly
	ukGallonM3      = 4.54609e-3                    // UK (imperial) gallon = 4.54609 L exactly
	hpW             = 550 * footM * lbfN            // horsepower (mechanical) = 550 ft·lbf/s ≈ 745.69987158227 W
	metricHpW       = 75 * kgfN                     // metric horsepower = 75 kgf·m/s = 735.49875 W exactly
	btuJ            = 1055.05585262                 // British thermal unit (International Table) = 1055.05585262 J exactly
	hourS           = 3600                          // hour = 3600 s
	minuteS         = 60                            // minute = 60 s
	revRad          = 2 * math.Pi                   // one revolution = 2π rad
	fahrenheitK     = 5.0 / 9                       // one degree Fahrenheit (or Rankine) interval = 5/9 K exactly
	celsiusZeroK    = 273.15                        // 0 °C = 273.15 K exactly
	fahrenheitZeroK = celsiusZeroK - 32*fahrenheitK // 0 °F = 255.372… K exactly (459.67 °R)
	// Conventional inch of mercury: a 1-inch column of mercury of the
	// conventional density 13 595.1 kg/m³ under g₀ (NIST SP 811, B.8 footnote,
	// "conventional"); 3386.388640341 Pa.
	inHgPa = 13595.1 * gravity * inchM
	// Conventional millimetre of mercury, the same column 1 mm high:
	// 133.322 387 415 Pa exactly (NIST SP 811, B.8, "conventional").
	mmHgPa = 13595.1 * gravity * 1e-3
	// Torr = 1/760 standard atmosphere = 101 325/760 Pa ≈ 133.322 368 Pa
	// (NIST SP 811, B.8); 1.4·10⁻⁷ smaller than the millimetre of mercury.
	torrPa = atmPa / 760.0
	// Tonne-force: the weight of one metric ton (1000 kg, NIST SP 811, B.8)
	// under g₀, 1000 kgf = 9806.65 N exactly.
	tonneForceN = 1000 * kgfN
	// Short ton-force: 2000 lbf = 8896.443 230 521 N exactly (NIST SP 811,
	// B.8, "ton-force (2000 lbf)").
	shortTonForceN = 2000 * lbfN
	// Long ton-force: the weight of the long ton (2240 lb, NIST SP 811, B.8)
	// under g₀, 2240 lbf = 9964.016 418 183 52 N exactly.
	longTonForceN = 2240 * lbfN
)
