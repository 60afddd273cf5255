package hydro

import "github.com/hydrosize/hydrosize/hydro/valve"

// center returns the directional valves' center: the spec's, or tandem.
func (z *sizer) center() valve.Center {
	c, err := valve.ParseCenter(z.spec.Circuit.Center)
	if err != nil || z.spec.Circuit.Center == "" {
		return valve.TandemCenter
	}
	return c
}

// centerTraits says where the center sends the pump's flow.
func (z *sizer) centerTraits() (valve.CenterTraits, error) { return z.center().Traits() }
