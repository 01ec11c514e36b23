package design

import (
	"fmt"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
)

// DefaultPsi0 is the combination factor ψ0 given to a variable action that
// states none, when the approach sets no default of its own: the EN 1990
// Table A1.1 recommended value for imposed loads in categories A to D.
// It is conservative for wind (0.6) and snow below 1000 m (0.5), not for
// storage (category E, 1.0).
const DefaultPsi0 = 0.7

// DefaultFSSliding is the global factor on sliding used by an
// allowable-stress approach that sets none (common practice: 1.5).
const DefaultFSSliding = 1.5

// ActionSet holds partial factors on actions (EN 1997-1 Table A.3).
type ActionSet struct {
	Name      string  `yaml:"name" json:"name"`
	GammaGSup float64 `yaml:"gamma_G_sup" json:"gamma_G_sup"` // permanent, unfavourable, 1–2
	GammaGInf float64 `yaml:"gamma_G_inf" json:"gamma_G_inf"` // permanent, favourable, 0–γ_G,sup
	GammaQ    float64 `yaml:"gamma_Q" json:"gamma_Q"`         // variable, unfavourable, 1–2 (favourable: 0)
}

// MaterialSet holds partial factors on soil parameters (EN 1997-1
// Table A.4). GammaPhi applies to tan φ′.
type MaterialSet struct {
	Name       string  `yaml:"name" json:"name"`
	GammaPhi   float64 `yaml:"gamma_phi" json:"gamma_phi"`     // on tan φ′, 1–2
	GammaC     float64 `yaml:"gamma_c" json:"gamma_c"`         // on c′, 1–2
	GammaCu    float64 `yaml:"gamma_cu" json:"gamma_cu"`       // on c_u, 1–2
	GammaGamma float64 `yaml:"gamma_gamma" json:"gamma_gamma"` // on unit weight, 1–2
}

// ResistanceSet holds partial factors on the resistances of spread
// foundations (EN 1997-1 Table A.5).
type ResistanceSet struct {
	Name    string  `yaml:"name" json:"name"`
	GammaRv float64 `yaml:"gamma_Rv" json:"gamma_Rv"` // bearing, 1–3
	GammaRh float64 `yaml:"gamma_Rh" json:"gamma_Rh"` // sliding, 1–3
}

// Combination is one set of partial factors checked together (DA1 has
// two). For DA3 Actions is the set applied to structural actions, which
// is all a footing's actions carry here.
type Combination struct {
	Name       string        `yaml:"name" json:"name"` // "C1"; "" when the approach has one
	Actions    ActionSet     `yaml:"actions" json:"actions"`
	Material   MaterialSet   `yaml:"material" json:"material"`
	Resistance ResistanceSet `yaml:"resistance" json:"resistance"`
}

// Approach is a design approach: the combinations to check, or, when FS is
// positive, allowable-stress design with a global factor of safety FS on
// the net ultimate bearing pressure (its single combination then has all
// factors 1).
type Approach struct {
	Name         string        `yaml:"name" json:"name"`     // "DA1", "FS(3)"
	Source       string        `yaml:"source" json:"source"` // where the values come from, printed with the result
	Combinations []Combination `yaml:"combinations" json:"combinations"`
	FS           float64       `yaml:"fs,omitempty" json:"fs,omitempty"`                 // global factor on bearing, (1, 10]; 0 = partial factors
	FSSliding    float64       `yaml:"fs_sliding,omitempty" json:"fs_sliding,omitempty"` // global factor on sliding, [1, 10]; 0 = DefaultFSSliding
	Psi0Default  float64       `yaml:"psi0_default,omitempty" json:"psi0_default,omitempty"`
}

// Allowable reports whether a is an allowable-stress (global factor)
// approach.
func (a Approach) Allowable() bool { return a.FS > 0 }

// Psi0 returns the default ψ0 of the approach.
func (a Approach) Psi0() float64 {
	if a.Psi0Default > 0 {
		return a.Psi0Default
	}
	return DefaultPsi0
}

// SlidingFS returns the global factor on sliding of an allowable-stress
// approach.
func (a Approach) SlidingFS() float64 {
	if a.FSSliding > 0 {
		return a.FSSliding
	}
	return DefaultFSSliding
}

// CombinationName names combination i as printed: "DA1-C1", or the
// approach name alone when the combination has no name.
func (a Approach) CombinationName(i int) string {
	c := a.Combinations[i]
	if c.Name == "" {
		return a.Name
	}
	return a.Name + "-" + c.Name
}

// Validate checks every factor's range and returns all problems as
// *site.RangeError or *site.InputError values.
func (a Approach) Validate() error {
	var errs site.Errors
	w := "approach " + strconv.Quote(a.Name)
	if a.Name == "" {
		errs = append(errs, &site.InputError{Where: "approach", Param: "name", Msg: "the approach has no name"})
	}
	if len(a.Combinations) == 0 {
		errs = append(errs, &site.InputError{Where: w, Param: "combinations", Msg: "the approach has no combinations"})
	}
	rng := func(where, p string, v, lo, hi float64) {
		if v < lo || v > hi || v != v {
			errs = append(errs, &site.RangeError{Where: where, Param: p, Value: v, Min: lo, Max: hi})
		}
	}
	for i, c := range a.Combinations {
		cw := w + " combination " + strconv.Quote(a.CombinationName(i))
		rng(cw, "gamma_G_sup", c.Actions.GammaGSup, 1, 2)
		rng(cw, "gamma_G_inf", c.Actions.GammaGInf, 0, c.Actions.GammaGSup)
		rng(cw, "gamma_Q", c.Actions.GammaQ, 1, 2)
		rng(cw, "gamma_phi", c.Material.GammaPhi, 1, 2)
		rng(cw, "gamma_c", c.Material.GammaC, 1, 2)
		rng(cw, "gamma_cu", c.Material.GammaCu, 1, 2)
		rng(cw, "gamma_gamma", c.Material.GammaGamma, 1, 2)
		rng(cw, "gamma_Rv", c.Resistance.GammaRv, 1, 3)
		rng(cw, "gamma_Rh", c.Resistance.GammaRh, 1, 3)
	}
	if a.FS != 0 {
		if a.FS <= 1 || a.FS > 10 || a.FS != a.FS {
			errs = append(errs, &site.RangeError{Where: w, Param: "FS", Value: a.FS, Min: 1, Max: 10, Reason: "a global factor of safety must exceed 1"})
		}
	}
	if a.FSSliding != 0 {
		rng(w, "FS_sliding", a.FSSliding, 1, 10)
	}
	if a.Psi0Default != 0 {
		rng(w, "psi_0 default", a.Psi0Default, 0, 1)
	}
	return errs.Err()
}

// The EN 1997-1:2004 Annex A recommended sets.
var (
	a1 = ActionSet{Name: "A1", GammaGSup: 1.35, GammaGInf: 1.0, GammaQ: 1.5}
	a2 = ActionSet{Name: "A2", GammaGSup: 1.0, GammaGInf: 1.0, GammaQ: 1.3}
	m1 = MaterialSet{Name: "M1", GammaPhi: 1.0, GammaC: 1.0, GammaCu: 1.0, GammaGamma: 1.0}
	m2 = MaterialSet{Name: "M2", GammaPhi: 1.25, GammaC: 1.25, GammaCu: 1.4, GammaGamma: 1.0}
	r1 = ResistanceSet{Name: "R1", GammaRv: 1.0, GammaRh: 1.0}
	r2 = ResistanceSet{Name: "R2", GammaRv: 1.4, GammaRh: 1.1}
	r3 = ResistanceSet{Name: "R3", GammaRv: 1.0, GammaRh: 1.0}
)

const annexA = "EN 1997-1:2004 Annex A, recommended values (Tables A.3, A.4, A.5)"

// Annex is a named collection of approaches: the recommended values, or a
// national annex loaded from a file.
type Annex struct {
	Name       string          `yaml:"name" json:"name"`
	Source     string          `yaml:"source" json:"source"`
	Actions    []ActionSet     `yaml:"actions" json:"actions"`
	Material   []MaterialSet   `yaml:"material" json:"material"`
	Resistance []ResistanceSet `yaml:"resistance" json:"resistance"`
	Approaches []Approach      `yaml:"approaches" json:"approaches"`
}

// Recommended returns the EN 1997-1:2004 Annex A recommended sets and the
// approaches DA1, DA2 and DA3 (2.4.7.3.4). Each call returns a fresh copy.
func Recommended() Annex {
	return Annex{
		Name:       "EN 1997-1 recommended",
		Source:     annexA,
		Actions:    []ActionSet{a1, a2},
		Material:   []MaterialSet{m1, m2},
		Resistance: []ResistanceSet{r1, r2, r3},
		Approaches: []Approach{DA1(), DA2(), DA3()},
	}
}

// DA1 returns Design Approach 1: C1 = A1 + M1 + R1, C2 = A2 + M2 + R1.
func DA1() Approach {
	return Approach{Name: "DA1", Source: annexA, Combinations: []Combination{
		{Name: "C1", Actions: a1, Material: m1, Resistance: r1},
		{Name: "C2", Actions: a2, Material: m2, Resistance: r1},
	}}
}

// DA2 returns Design Approach 2: A1 + M1 + R2.
func DA2() Approach {
	return Approach{Name: "DA2", Source: annexA, Combinations: []Combination{
		{Actions: a1, Material: m1, Resistance: r2},
	}}
}

// DA3 returns Design Approach 3: A1 on structural actions (all of a
// footing's actions are taken as structural) + M2 + R3.
func DA3() Approach {
	return Approach{Name: "DA3", Source: annexA, Combinations: []Combination{
		{Actions: a1, Material: m2, Resistance: r3},
	}}
}

// FS returns allowable-stress design with global factor fs on the net
// ultimate bearing pressure (q_a = q_net,ult/FS + overburden) and
// DefaultFSSliding on sliding; actions and parameters are characteristic.
func FS(fs float64) Approach {
	one := Combination{
		Actions:    ActionSet{Name: "characteristic", GammaGSup: 1, GammaGInf: 1, GammaQ: 1},
		Material:   MaterialSet{Name: "characteristic", GammaPhi: 1, GammaC: 1, GammaCu: 1, GammaGamma: 1},
		Resistance: ResistanceSet{Name: "none", GammaRv: 1, GammaRh: 1},
	}
	return Approach{
		Name:         "FS(" + strconv.FormatFloat(fs, 'g', -1, 64) + ")",
		Source:       "allowable-stress design with a global factor of safety (common practice)",
		Combinations: []Combination{one},
		FS:           fs,
	}
}

// Lookup returns the approach named s ("DA1", case-insensitive), or for
// "FS(x)" an allowable-stress approach with factor x.
func (a Annex) Lookup(s string) (Approach, error) {
	t := strings.TrimSpace(s)
	u := strings.ToUpper(t)
	if strings.HasPrefix(u, "FS(") && strings.HasSuffix(u, ")") {
		x, err := strconv.ParseFloat(strings.TrimSpace(t[3:len(t)-1]), 64)
		if err != nil {
			return Approach{}, &site.InputError{Where: "approach", Param: "FS", Msg: fmt.Sprintf("%q: expected a number in FS(...)", s)}
		}
		ap := FS(x)
		return ap, ap.Validate()
	}
	names := make([]string, 0, len(a.Approaches)+1)
	for _, ap := range a.Approaches {
		if strings.EqualFold(ap.Name, t) {
			return ap, nil
		}
		names = append(names, ap.Name)
	}
	names = append(names, "FS(x)")
	return Approach{}, &site.InputError{Where: "approach", Param: "approach", Msg: fmt.Sprintf("unknown approach %q; expected one of %s", s, strings.Join(names, ", "))}
}

// Parse looks s up among the recommended approaches (see Annex.Lookup).
func Parse(s string) (Approach, error) { return Recommended().Lookup(s) }
