package hydro

import (
	"encoding/json"
	"regexp"
	"testing"

	"github.com/hydrosize/hydrosize/hydro/contamination"
)

// specPath is the form of a caller's rule in a report: a JSON path into
// the spec, such as "design.pressure" or "cycle.phases[].moves[].torque".
var specPath = regexp.MustCompile(`^(name|actuators|cycle|supply|site|fluid|cleanliness|circuit|design|units)(\[\])?(\.[a-z_0-9]+(\[\])?)*$`)

// reportRules collects the rules of kind "caller" anywhere in v, a report
// read back from JSON.
func reportRules(v any, out *[]string) {
	switch x := v.(type) {
	case map[string]any:
		if x["kind"] == "caller" {
			s, _ := x["source"].(string)
			*out = append(*out, s)
		}
		for _, e := range x {
			reportRules(e, out)
		}
	case []any:
		for _, e := range x {
			reportRules(e, out)
		}
	}
}

// TestCallerRulesNameTheSpec: a figure the report credits to the caller
// names the spec field it came from. A figure the sizer chose itself — a
// motor's breakdown torque, a filter's bypass setting, a pump's least inlet
// pressure — is ours, and says so: a reviewer must not take it for the
// customer's.
func TestCallerRulesNameTheSpec(t *testing.T) {
	us := demoSpec(t)
	us.Units = "us"
	pressureFilter := demoSpec(t)
	pressureFilter.Cleanliness.MostSensitive = "servo valve"
	target := demoSpec(t)
	target.Cleanliness.Target = contamination.Code{Form: contamination.Counter,
		N: [3]contamination.Number{{Scale: 15}, {Scale: 13}, {Scale: 10}}}
	for name, s := range map[string]Spec{"demo": demoSpec(t), "us": us, "crane": craneSpec(t), "clamp": clampSpec(),
		"pressure filter": pressureFilter, "target given": target} {
		r, err := Size(s)
		if err != nil {
			t.Fatal(err)
		}
		b, err := json.Marshal(r)
		if err != nil {
			t.Fatal(err)
		}
		var v any
		if err := json.Unmarshal(b, &v); err != nil {
			t.Fatal(err)
		}
		var sources []string
		reportRules(v, &sources)
		seen := map[string]bool{}
		for _, src := range sources {
			if !specPath.MatchString(src) && !seen[src] {
				seen[src] = true
				t.Errorf("%s: a rule credits the caller with %q, which is no field of the spec", name, src)
			}
		}
	}
}

// TestReportValuesWritten: a number with its rule is written even when it
// is zero ("0 bar" of back pressure, a residual of 0 K): a program reading
// the JSON finds "value" beside every "rule", never a rule alone.
func TestReportValuesWritten(t *testing.T) {
	b, err := json.Marshal(demoReport(t))
	if err != nil {
		t.Fatal(err)
	}
	var v any
	if err := json.Unmarshal(b, &v); err != nil {
		t.Fatal(err)
	}
	var walk func(path string, v any)
	walk = func(path string, v any) {
		switch x := v.(type) {
		case map[string]any:
			if _, ok := x["rule"]; ok && len(x) == 1 {
				t.Errorf("%s: a rule with no value", path)
			}
			for k, e := range x {
				walk(path+"."+k, e)
			}
		case []any:
			for _, e := range x {
				walk(path+"[]", e)
			}
		}
	}
	walk("", v)
}

// TestReportNumbersHaveRules: every number in the report's JSON sits beside
// its rule (a Value, a Choice, a Check), is a count, or is a list whose
// rule is named beside it ("required_beta" and "required_beta_rule").
func TestReportNumbersHaveRules(t *testing.T) {
	for name, s := range map[string]Spec{"demo": demoSpec(t), "crane": craneSpec(t), "clamp": clampSpec()} {
		r, err := Size(s)
		if err != nil {
			t.Fatal(err)
		}
		b, err := json.Marshal(r)
		if err != nil {
			t.Fatal(err)
		}
		var v any
		if err := json.Unmarshal(b, &v); err != nil {
			t.Fatal(err)
		}
		counts := map[string]bool{"count": true, "iterations": true}
		var walk func(path string, v any)
		walk = func(path string, v any) {
			m, ok := v.(map[string]any)
			if !ok {
				if l, ok := v.([]any); ok {
					for _, e := range l {
						walk(path+"[]", e)
					}
				}
				return
			}
			_, ruled := m["rule"]
			for k, e := range m {
				switch x := e.(type) {
				case float64:
					if !ruled && !counts[k] {
						t.Errorf("%s: %s.%s = %v has no rule beside it", name, path, k, x)
					}
				case []any:
					if len(x) > 0 {
						if _, num := x[0].(float64); num {
							if _, ok := m[k+"_rule"]; !ok {
								t.Errorf("%s: %s.%s, a list of numbers, has no %s_rule beside it", name, path, k, k)
							}
							continue
						}
					}
				}
				walk(path+"."+k, e)
			}
		}
		walk("", v)
	}
}
