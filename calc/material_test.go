package calc

import (
	"errors"
	"math"
	"testing"
)

func TestMaterialTable(t *testing.T) {
	tab := MaterialTable()
	seen := map[string]Material{}
	for _, m := range tab {
		if _, dup := seen[m.Key]; dup {
			t.Errorf("duplicate key %q", m.Key)
		}
		seen[m.Key] = m
		if !(m.Roughness > 0) || m.HazenC < HazenCMin || m.HazenC > HazenCMax || m.Name == "" || m.Source == "" {
			t.Errorf("incomplete row %+v", m)
		}
	}
	for _, k := range []string{"steel", "ss", "ss_ep", "ci", "ci_asphalt", "galv", "pe", "pvc", "concrete", "ductile", "copper"} {
		if _, ok := seen[k]; !ok {
			t.Errorf("missing material %q", k)
		}
	}
	// Moody (1944) chart roughness values: commercial steel 0.045 mm (from
	// memory); cast iron 0.259 mm, galvanized 0.152 mm, drawn tubing
	// 0.00152 mm (python3-fluids 1.0.22 fluids.friction._roughness);
	// cement lining 0.033 mm, Cr13 bare 0.055 mm (Farshad & Rieke 2006, as
	// fluids' _Farshad_roughness); concrete within the chart's 0.3–3 mm.
	for k, eps := range map[string]float64{"steel": 0.045e-3, "ci": 0.259e-3, "galv": 0.152e-3, "copper": 1.52e-6,
		"ductile": 0.033e-3, "ss": 0.055e-3, "ss_ep": 0.030e-3, "ci_asphalt": 0.122e-3} {
		if math.Abs(seen[k].Roughness-eps) > 1e-12 {
			t.Errorf("%s roughness %g m, want %g m", k, seen[k].Roughness, eps)
		}
	}
	if c := seen["concrete"].Roughness; c < 0.3e-3 || c > 3e-3 {
		t.Errorf("concrete roughness %g m outside 0.3–3 mm", c)
	}
	// Plastics are the smoothest common pipes (common practice).
	if !(seen["pe"].Roughness < seen["steel"].Roughness && seen["pvc"].HazenC >= seen["ci"].HazenC) {
		t.Error("plastic pipe should be smoother than steel")
	}
	tab[0].Roughness = -1
	if MaterialTable()[0].Roughness == -1 {
		t.Error("MaterialTable shares its backing array")
	}
}

func TestMaterialLookup(t *testing.T) {
	if m, err := LookupMaterial("STEEL"); err != nil || m.Key != "steel" {
		t.Errorf("LookupMaterial(\"STEEL\") = %+v, %v", m, err)
	}
	var fe *FieldError
	if _, err := LookupMaterial("unobtainium"); !errors.As(err, &fe) || fe.Field != "mat" {
		t.Errorf("LookupMaterial(\"unobtainium\"): %v, want *FieldError for \"mat\"", err)
	}
}
