package hydro

import (
	"runtime"
	"sync"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

// Comparison is the table a [Sweep] returns: one row per working pressure
// (and pump speed), in the order asked for.
type Comparison struct {
	Name  string `json:"name"`
	Units string `json:"units"`
	Rows  []Row  `json:"rows"`
}

// Row is the machine sized at one working pressure and pump speed: what
// changes with them, side by side.
type Row struct {
	Pressure  units.Pressure        `json:"pressure"`
	PumpSpeed units.RotationalSpeed `json:"pump_speed"`
	Actuators []RowActuator         `json:"actuators"`
	Pump      units.Displacement    `json:"pump"`      // displacement chosen (0 when none)
	PumpFlow  units.Flow            `json:"pump_flow"` // what it delivers
	Relief    units.Pressure        `json:"relief"`
	Motor     units.Power           `json:"motor"` // drive rating chosen (0 for an engine or none)
	RMS       units.Power           `json:"rms"`
	Heat      units.Power           `json:"heat"`   // mean heat load
	Cooler    units.Power           `json:"cooler"` // cooler duty
	Reservoir units.Volume          `json:"reservoir"`
	Oil       units.Temperature     `json:"oil"` // running oil temperature
	Lines     []RowLine             `json:"lines"`
	Findings  int                   `json:"findings"`
	Worst     string                `json:"worst"` // the worst severity among them
	Error     string                `json:"error"` // why this combination could not be sized
}

// RowActuator is an actuator's size in a row: bore and rod, or
// displacement.
type RowActuator struct {
	Name         string             `json:"name"`
	Bore         units.Length       `json:"bore"`
	Rod          units.Length       `json:"rod"`
	Displacement units.Displacement `json:"displacement"`
}

// RowLine is one line's size in a row.
type RowLine struct {
	Name string `json:"name"`
	Size string `json:"size"`
}

// mostRows bounds a sweep.
const mostRows = 1024

// Sweep sizes the machine of spec s at every working pressure of pressures
// and, when speeds are given, at every pump speed of speeds (each pressure
// with each speed), concurrently on up to GOMAXPROCS goroutines, and
// returns the comparison table. The spec's own Design.Pressure,
// PressureRange and PumpSpeed are replaced by each row's.
//
// The spec is validated first (a *SpecError lists every problem); a
// pressure outside 10–700 bar or a speed that is not finite and > 0 is an
// error for that row, written into it, and the other rows are still sized.
// At most 1024 rows.
func Sweep(s Spec, pressures []units.Pressure, speeds ...units.RotationalSpeed) (Comparison, error) {
	base := s
	base.Design.Pressure, base.Design.PressureRange = DefaultPressure, nil
	if err := base.Validate(); err != nil {
		return Comparison{}, err
	}
	var ps problems
	if len(pressures) == 0 {
		ps.missing("pressures", "at least one working pressure")
	}
	if n := len(pressures) * max(len(speeds), 1); n > mostRows {
		ps.rangeErr("pressures", format(float64(n))+" rows", "at most 1024 pressure and speed pairs")
	}
	if err := ps.err(); err != nil {
		return Comparison{}, err
	}
	type job struct {
		p units.Pressure
		n units.RotationalSpeed
	}
	var jobs []job
	for _, p := range pressures {
		if len(speeds) == 0 {
			jobs = append(jobs, job{p: p})
		}
		for _, n := range speeds {
			jobs = append(jobs, job{p, n})
		}
	}
	rows := make([]Row, len(jobs))
	run(len(jobs), func(i int) {
		j := jobs[i]
		t := base
		t.Design.Pressure, t.Design.PumpSpeed = j.p, j.n
		rows[i] = sizeRow(t)
	})
	c := Comparison{Name: s.Name, Units: "metric", Rows: rows}
	if s.Units == "us" {
		c.Units = "us"
	}
	return c, nil
}

// run calls f(0) … f(n−1) on up to GOMAXPROCS goroutines.
func run(n int, f func(int)) {
	workers := min(runtime.GOMAXPROCS(0), n)
	var wg sync.WaitGroup
	next := make(chan int)
	for range workers {
		wg.Go(func() {
			for i := range next {
				f(i)
			}
		})
	}
	for i := range n {
		next <- i
	}
	close(next)
	wg.Wait()
}

// sizeRow sizes one combination into a row.
func sizeRow(s Spec) Row {
	row := Row{Pressure: s.Design.Pressure, PumpSpeed: s.Design.PumpSpeed}
	fl, err := s.validated()
	if err != nil {
		row.Error = err.Error()
		return row
	}
	r, err := sizeAt(s, fl, s.Design.Pressure, components.CallerRule("design.pressure"))
	if err != nil {
		row.Error = err.Error()
		return row
	}
	return r.row()
}

// row condenses a report into a comparison row.
func (r Report) row() Row {
	row := Row{Pressure: r.Basis.Pressure.Value, PumpSpeed: r.Basis.PumpSpeed.Value,
		Pump: r.Pump.Displacement.Chosen, PumpFlow: r.Pump.Delivered.Value, Relief: r.Valves.Relief.Value,
		Motor: r.Drive.Rating.Chosen, RMS: r.Drive.RMS.Value, Heat: r.Heat.Load.Value, Cooler: r.Heat.Cooler.Value,
		Reservoir: r.Heat.Reservoir.Chosen, Oil: r.Heat.Running.Value, Findings: len(r.Findings)}
	for _, a := range r.Actuators {
		row.Actuators = append(row.Actuators, RowActuator{Name: a.Name, Bore: a.Bore.Chosen, Rod: a.Rod.Chosen, Displacement: a.Displacement.Chosen})
	}
	for _, l := range r.Lines {
		row.Lines = append(row.Lines, RowLine{Name: l.Name, Size: l.Size})
	}
	if w, ok := r.Findings.Worst(); ok {
		row.Worst = w.String()
	}
	return row
}

// sizeBest sizes a spec over its pressure range and returns the report of
// the pressure with the smallest drive rating (then the smallest RMS power,
// then the lowest pressure).
func sizeBest(s Spec, fl fluid.Fluid, pr PressureRange) (Report, error) {
	var pressures []units.Pressure
	for p := pr.From; p <= pr.To*(1+1e-12); p += pr.Step {
		pressures = append(pressures, p)
	}
	reports := make([]Report, len(pressures))
	errs := make([]error, len(pressures))
	run(len(pressures), func(i int) {
		t := s
		t.Design.Pressure, t.Design.PressureRange = pressures[i], nil
		reports[i], errs[i] = sizeAt(t, fl, pressures[i], components.CallerRule("design.pressure_range"))
	})
	best := -1
	for i, r := range reports {
		if errs[i] != nil || !r.Drive.Rating.OK() && r.Drive.Kind == "electric" {
			continue
		}
		if best < 0 || better(r, reports[best]) {
			best = i
		}
	}
	if best < 0 {
		for _, err := range errs {
			if err != nil {
				return Report{}, err
			}
		}
		best = 0
	}
	r := reports[best]
	r.Findings = r.Findings.Merge(components.NewFinding(components.Notice, components.NoHazard, "hydro.pressure-chosen",
		components.OurRule("smallest drive rating, then smallest RMS power, then lowest pressure"),
		"Sized at %v, the best of %v pressures from %v to %v.", r.Basis.Pressure.Value, float64(len(pressures)), pr.From, pr.To)).Sorted()
	return r, nil
}

// better orders reports for sizeBest.
func better(a, b Report) bool {
	if a.Drive.Rating.Chosen != b.Drive.Rating.Chosen {
		return a.Drive.Rating.Chosen < b.Drive.Rating.Chosen
	}
	if a.Drive.RMS.Value != b.Drive.RMS.Value {
		return a.Drive.RMS.Value < b.Drive.RMS.Value
	}
	return a.Basis.Pressure.Value < b.Basis.Pressure.Value
}
