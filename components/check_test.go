package components

import (
	"encoding/json"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func TestCheck(t *testing.T) {
	r := PracticeRule("pressure line at most 5 m/s")
	for _, c := range []struct {
		name  string
		c     Check[units.Velocity]
		ok    bool
		ratio float64
	}{
		{"below an upper limit", Within[units.Velocity](4, 5, r), true, 0.8},
		{"at an upper limit", Within[units.Velocity](5, 5, r), true, 1},
		{"above an upper limit", Within[units.Velocity](6, 5, r), false, 1.2},
		{"above a lower limit", Reaches[units.Velocity](6, 5, r), true, 1.2},
		{"below a lower limit", Reaches[units.Velocity](4, 5, r), false, 0.8},
		{"NaN never passes", Within(units.Velocity(math.NaN()), 5, r), false, math.NaN()},
		{"zero limit", Reaches[units.Velocity](1, 0, r), true, 0},
	} {
		if c.c.OK() != c.ok {
			t.Errorf("%s: OK = %v", c.name, c.c.OK())
		}
		if got := c.c.Ratio(); !(math.Abs(got-c.ratio) < 1e-15 || math.IsNaN(got) && math.IsNaN(c.ratio)) {
			t.Errorf("%s: Ratio = %v; want %v", c.name, got, c.ratio)
		}
	}
}

func TestCheckJSON(t *testing.T) {
	c := Reaches(3.1, 4.0, PracticeRule("buckling safety factor 4"))
	b, err := json.Marshal(c)
	if err != nil {
		t.Fatal(err)
	}
	want := `{"value":3.1,"limit":4,"bound":"at least","ratio":0.775,"ok":false,"rule":{"kind":"common practice","source":"buckling safety factor 4"}}`
	if string(b) != want {
		t.Errorf("JSON = %s; want %s", b, want)
	}
	var back Check[float64]
	if err := json.Unmarshal(b, &back); err != nil || back != c {
		t.Errorf("round trip = %+v, %v", back, err)
	}
	p := Within(210*units.Bar, 250*units.Bar, CallerRule("rating"))
	b, _ = json.Marshal(p)
	if want := `{"value":"210 bar","limit":"250 bar","bound":"at most","ratio":0.84,"ok":true,"rule":{"kind":"caller","source":"rating"}}`; string(b) != want {
		t.Errorf("JSON = %s; want %s", b, want)
	}
}

func TestChoiceJSON(t *testing.T) {
	c := Choice[units.Length]{Required: 56e-3, Chosen: 63e-3, Series: "bores", Rule: StandardRule("ISO 3320")}
	b, err := json.Marshal(c)
	if err != nil {
		t.Fatal(err)
	}
	want := `{"required":"56 mm","chosen":"63 mm","series":"bores","margin":0.125,"ok":true,"rule":{"kind":"standard","source":"ISO 3320"}}`
	if string(b) != want {
		t.Errorf("JSON = %s; want %s", b, want)
	}
	var back Choice[units.Length]
	if err := json.Unmarshal(b, &back); err != nil || back != c {
		t.Errorf("round trip = %+v, %v", back, err)
	}
}
