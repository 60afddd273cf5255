// Package accumulator sizes gas-loaded (nitrogen) hydraulic accumulators by
// the gas law p₀V₀ⁿ = p₁V₁ⁿ = p₂V₂ⁿ in absolute pressures: the size that
// delivers an oil volume between two working pressures, the volume a size
// delivers, the standard size from a maker's list, the precharge and how it
// moves with gas temperature, the energy stored, and two worked uses — an
// emergency stroke when the pump stops, and a smaller pump supplemented
// over a duty cycle.
//
// # Gas law
//
// A Cycle holds the precharge p₀, the working range p₁ to p₂ (all
// units.AbsolutePressure: a gauge pressure does not compile where the gas
// law needs an absolute one) and the polytropic indices of charging and
// discharging: Isothermal (n = 1) for slow changes, Adiabatic (n = 1.4) for
// fast ones, or a caller's value between. The gas is taken as ideal.
// Nitrogen departs from the ideal gas at high pressure (its
// compressibility factor is a few percent above 1 at 200 bar and room
// temperature, from memory): above about 200 bar use the maker's real-gas
// sizing or a higher effective index, and keep a volume margin.
//
// # Cautions
//
// An accumulator stores energy that injures people during maintenance. Every
// sizing carries the danger finding of ShutdownDanger: ISO 4413 asks that
// the accumulator discharge or be isolated automatically when the machine
// is switched off, or carry a warning where that cannot be done. Release
// the oil pressure before opening a circuit, and remember the gas precharge
// remains with the oil drained; charge only with nitrogen, never air or
// oxygen. Pressure vessels fall under national pressure-equipment rules.
// These results support, and do not replace, ISO 4413, the accumulator
// maker's data, local codes and licensed practice.
//
// Every function validates its input and returns an error matching
// units.ErrRange that names the parameter (and field); none panics on
// caller input or returns NaN or ±Inf. All functions are safe for
// concurrent use.
package accumulator
