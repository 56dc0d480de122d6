package calc

import (
	"go/ast"
	"go/parser"
	"go/token"
	"path/filepath"
	"slices"
	"strings"
	"testing"
)

// dimNames maps the dimensions' constant names, as call sites write them,
// to their values.
var dimNames = map[string]Dimension{
	"Dimensionless": Dimensionless, "Length": Length, "Pressure": Pressure, "Velocity": Velocity,
	"Flow": Flow, "Temperature": Temperature, "Density": Density, "DynamicViscosity": DynamicViscosity,
	"KinematicViscosity": KinematicViscosity, "Power": Power, "Area": Area, "Mass": Mass,
	"Duration": Duration, "SpecificEnergy": SpecificEnergy, "SpecificEnergyHead": SpecificEnergyHead,
	"Frequency": Frequency,
}

// figureSite is one call that gives a caution's or a reason's figures.
type figureSite struct {
	pos  string
	code string   // the constant's name: CautionX or ReasonX
	dims []string // the figures' dimensions as written; "?…" where not a Fig or Num
}

// figureSites finds every Warn(field, CautionX, figs…) and
// Because(ReasonX, figs…) in the non-test files of dirs, following local
// variables (place := []Figure{…}; append(place, …)).
func figureSites(t *testing.T, dirs ...string) []figureSite {
	t.Helper()
	fset := token.NewFileSet()
	var out []figureSite
	for _, dir := range dirs {
		files, _ := filepath.Glob(filepath.Join(dir, "*.go"))
		for _, f := range files {
			if strings.HasSuffix(f, "_test.go") {
				continue
			}
			af, err := parser.ParseFile(fset, f, nil, 0)
			if err != nil {
				t.Fatal(err)
			}
			locals := map[string]ast.Expr{}
			var dimsOf func(e ast.Expr) []string
			dimsOf = func(e ast.Expr) []string {
				switch x := e.(type) {
				case *ast.Ident:
					if v, ok := locals[x.Name]; ok {
						return dimsOf(v)
					}
				case *ast.CompositeLit:
					var out []string
					for _, el := range x.Elts {
						out = append(out, dimsOf(el)...)
					}
					return out
				case *ast.CallExpr:
					switch exprName(x.Fun) {
					case "Fig":
						return []string{exprName(x.Args[1])}
					case "Num":
						return []string{"Dimensionless"}
					case "append":
						var out []string
						for _, a := range x.Args {
							out = append(out, dimsOf(a)...)
						}
						return out
					}
				}
				return []string{"?" + exprName(e)}
			}
			ast.Inspect(af, func(n ast.Node) bool {
				if as, ok := n.(*ast.AssignStmt); ok && as.Tok == token.DEFINE && len(as.Lhs) == len(as.Rhs) {
					for i, l := range as.Lhs {
						locals[exprName(l)] = as.Rhs[i]
					}
				}
				c, ok := n.(*ast.CallExpr)
				if !ok {
					return true
				}
				if fn := exprName(c.Fun); fn != "Warn" && fn != "Because" {
					return true
				}
				if exprName(c.Fun) == "Warn" && len(c.Args) > 1 && !strings.HasPrefix(exprName(c.Args[1]), "Caution") {
					// A caution held in a variable: its figures cannot be
					// matched to it here.
					out = append(out, figureSite{pos: fset.Position(c.Pos()).String(), code: "?" + exprName(c.Args[1])})
					return true
				}
				for i, a := range c.Args {
					nm := exprName(a)
					if (strings.HasPrefix(nm, "Caution") || strings.HasPrefix(nm, "Reason")) && nm != "Caution" && nm != "Reason" {
						s := figureSite{pos: fset.Position(c.Pos()).String(), code: nm}
						for _, r := range c.Args[i+1:] {
							s.dims = append(s.dims, dimsOf(r)...)
						}
						out = append(out, s)
						break
					}
				}
				return true
			})
		}
	}
	return out
}

func exprName(e ast.Expr) string {
	switch x := e.(type) {
	case *ast.Ident:
		return x.Name
	case *ast.SelectorExpr:
		return x.Sel.Name
	}
	return ""
}

// TestFigureCallSites: every call that gives a caution's or a reason's
// figures gives them in the dimensions and order FigureDims declares, so a
// figure cannot land in another's slot unnoticed (a flow where the wording
// expects a head, three figures where it words four).
func TestFigureCallSites(t *testing.T) {
	byName := map[string][]Dimension{}
	for _, c := range Cautions() {
		byName["Caution"+cautionConstName(c)] = c.FigureDims()
	}
	for _, r := range Reasons() {
		byName["Reason"+reasonConstName(r)] = r.FigureDims()
	}
	sites := figureSites(t, ".", "scenario")
	if len(sites) < 100 {
		t.Fatalf("found %d call sites; the scan is not finding them", len(sites))
	}
	for _, s := range sites {
		want, ok := byName[s.code]
		if !ok {
			t.Errorf("%s: %s is not a caution or reason this test knows", s.pos, s.code)
			continue
		}
		var got []Dimension
		for _, d := range s.dims {
			v, ok := dimNames[d]
			if !ok {
				t.Errorf("%s: %s: a figure that is not Fig(v, Dim) or Num(v) (%s): the test cannot check its slot", s.pos, s.code, d)
			}
			got = append(got, v)
		}
		if !slices.Equal(got, want) {
			t.Errorf("%s: %s gets figures %v, FigureDims declares %v", s.pos, s.code, s.dims, want)
		}
	}
}

// cautionConstName and reasonConstName turn a code's name ("npsh low
// margin") back into its constant's ("NPSHLowMargin") by matching the
// constants' names in the source, so the test needs no second list.
func cautionConstName(c Caution) string { return constName(c.String(), "Caution") }
func reasonConstName(r Reason) string   { return constName(r.String(), "Reason") }

var constNames = map[string]map[string]string{}

func constName(words, prefix string) string {
	m, ok := constNames[prefix]
	if !ok {
		m = map[string]string{}
		fset := token.NewFileSet()
		for _, f := range []string{"cautions.go", "reasons.go"} {
			af, err := parser.ParseFile(fset, f, nil, 0)
			if err != nil {
				panic(err)
			}
			ast.Inspect(af, func(n ast.Node) bool {
				if id, ok := n.(*ast.Ident); ok && strings.HasPrefix(id.Name, prefix) && id.Obj != nil && id.Obj.Kind == ast.Con {
					m[squash(strings.TrimPrefix(id.Name, prefix))] = strings.TrimPrefix(id.Name, prefix)
				}
				return true
			})
		}
		constNames[prefix] = m
	}
	return m[squash(words)]
}

// squash lower-cases and drops spaces: "NPSHLowMargin" and "npsh low
// margin" both become "npshlowmargin".
func squash(s string) string { return strings.ToLower(strings.ReplaceAll(s, " ", "")) }
