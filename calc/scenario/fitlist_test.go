package scenario

import (
	"errors"
	"reflect"
	"testing"

	"fieldhead/calc"
)

func TestParseFittings(t *testing.T) {
	// The fitting-list syntax of the share link (ours): key[:count][@K].
	cases := []struct {
		text string
		want []calc.FittingCount
	}{
		{"", nil},
		{"gate:2,elbow90lr:6,exit", []calc.FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "exit", Count: 1}}},
		{"gate:2@0.12", []calc.FittingCount{{Key: "gate", Count: 2, K: 0.12, Override: true}}},
		{" Exit @ 0.9 , globe:0", []calc.FittingCount{{Key: "exit", Count: 1, K: 0.9, Override: true}}},
		{"check_swing@0", []calc.FittingCount{{Key: "check_swing", Count: 1, K: 0, Override: true}}},
	}
	for _, c := range cases {
		got, err := ParseFittings(c.text)
		if err != nil || !reflect.DeepEqual(got, c.want) {
			t.Errorf("ParseFittings(%q) = %+v, %v; want %+v", c.text, got, err, c.want)
		}
		// Written back, the list reads the same.
		again, err := ParseFittings(FormatFittings(got))
		if err != nil || !reflect.DeepEqual(again, got) {
			t.Errorf("round trip of %q via %q: %+v, %v", c.text, FormatFittings(got), again, err)
		}
	}
	for _, bad := range []string{"widget", "gate:2,gate:1", "gate:-1", "gate:x", "gate:1001", "gate@", "gate@-1",
		"gate@NaN", "gate@1e9", "gate@0,5", "gate:2@0.1@0.2"} {
		var fe *calc.FieldError
		if got, err := ParseFittings(bad); !errors.As(err, &fe) || fe.Field != "fit" {
			t.Errorf("ParseFittings(%q) = %+v, %v; want a *calc.FieldError for fit", bad, got, err)
		}
	}
}
