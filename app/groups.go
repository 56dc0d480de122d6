package main

import (
	"strings"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// option is one side of an either/or group of inputs: the parameters it
// uses and the label of its switch.
type option struct {
	key    string
	label  string
	params []string
}

// groups are inputs given one way or another; the scenario holds only the
// parameters of the side in use, so the link never carries a value that is
// silently ignored. The first option is the default.
var groups = map[string][]option{
	"pt1":   {{"v", "velocity", []string{"v1"}}, {"d", "inside diameter", []string{"d1"}}},
	"pt2":   {{"v", "velocity", []string{"v2"}}, {"d", "inside diameter", []string{"d2"}}},
	"fric":  {{"run", "from the pipe run", []string{"l"}}, {"hf", "typed in", []string{"hf"}}},
	"pipe":  {{"nps", "nominal size", []string{"nps", "sch"}}, {"d", "inside diameter", []string{"d"}}},
	"rough": {{"mat", "material", []string{"mat"}}, {"eps", "roughness", []string{"eps"}}},
	"site":  {{"alt", "altitude", []string{"alt"}}, {"baro", "barometer", []string{"baro"}}},
	"npsh":  {{"sheet", "from the data sheet", []string{"pnpsh"}}, {"typed", "typed in", []string{"npshr"}}},
}

// groupOptions returns the options of a group. A segment's group ("s2.pipe")
// is the single run's group ("pipe") with the segment's parameters.
func groupOptions(group string) []option {
	pre, base, ok := strings.Cut(group, ".")
	if !ok {
		return groups[group]
	}
	opts := groups[base]
	out := make([]option, len(opts))
	for i, o := range opts {
		out[i] = option{key: o.key, label: o.label}
		for _, p := range o.params {
			out[i].params = append(out[i].params, pre+"."+p)
		}
	}
	return out
}

// current is the side of a group in use: the one whose parameters are in
// the scenario, else the last one switched to, else the default.
func (s *sheet) current(group string) string {
	opts := groupOptions(group)
	for _, o := range opts {
		for _, p := range o.params {
			if s.scen.Has(p) {
				return o.key
			}
		}
	}
	if m := s.mode[group]; m != "" {
		return m
	}
	return opts[0].key
}

// switchTo moves a group to one side: the other side's parameters leave the
// scenario (their boxes keep the text, so switching back restores it).
func (s *sheet) switchTo(group, key string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("switching how an input is given")
		s.mode[group] = key
		for _, o := range groupOptions(group) {
			for _, p := range o.params {
				if o.key == key {
					s.store(p)
				} else {
					_ = s.scen.Set(p, "")
				}
			}
		}
		s.changed()
	}
}

// toggle draws a group's switch.
func (s *sheet) toggle(group, label string) app.UI {
	return &field{S: s, Kind: switchField, P: group, Label: label, Cur: s.current(group)}
}

// domID makes a parameter or group name fit for an element id that CSS
// selectors can name without escaping: segment parameters carry a dot
// ("s2.l" → "s2-l").
func domID(name string) string { return strings.ReplaceAll(name, ".", "-") }

// classIf returns base, plus extra when cond holds.
func classIf(base string, cond bool, extra string) string {
	if cond {
		return base + " " + extra
	}
	return base
}
