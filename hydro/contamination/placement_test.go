package contamination

import (
	"strings"
	"testing"
)

func TestPlacementAdvice(t *testing.T) {
	all := AllPlacementAdvice()
	if len(all) != int(placementCount) {
		t.Fatalf("%d placements, want %d", len(all), placementCount)
	}
	for i, a := range all {
		if a.Placement != Placement(i) || a.Name == "" || a.Rating == "" || a.Purpose == "" || a.Source != "common practice" {
			t.Errorf("placement %d: %+v", i, a)
		}
		if a.Cautions[len(a.Cautions)-1] != indicator {
			t.Errorf("%s: no clogging-indicator caution", a.Name)
		}
		if a.Placement.String() != a.Name {
			t.Errorf("String() = %q, want %q", a.Placement.String(), a.Name)
		}
	}
	// Suction elements: coarse (about 100–250 µm, common practice per
	// CHECKS.md) and warned for cavitation.
	s, _ := PlacementAdvice(SuctionStrainer)
	if !strings.Contains(s.Rating, "100–250 µm") || !strings.Contains(strings.Join(s.Cautions, " "), "cavitation") {
		t.Errorf("suction advice: %+v", s)
	}
	// Callers may change what they get without touching the next call.
	s.Cautions[0] = "changed"
	if again, _ := PlacementAdvice(SuctionStrainer); again.Cautions[0] == "changed" {
		t.Error("PlacementAdvice shares its cautions")
	}
	if _, ok := PlacementAdvice(placementCount); ok || Placement(99).String() != "Placement(99)" {
		t.Error("unknown placement accepted")
	}
}
