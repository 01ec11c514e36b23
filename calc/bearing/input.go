package bearing

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// Drainage selects the short-term (undrained) and long-term (drained)
// checks. In an undrained case fine-grained layers with c_u act undrained
// (total stress) and coarse layers drained; in a drained case every layer
// acts drained (effective stress).
type Drainage int

const (
	// DrainageAuto: both where the founding layer or a layer within 2B
	// below the base is fine-grained, else drained.
	DrainageAuto Drainage = iota
	Undrained
	Drained
	Both
)

var drainageNames = [...]string{"auto", "undrained", "drained", "both"}

func (d Drainage) String() string {
	if d >= 0 && int(d) < len(drainageNames) {
		return drainageNames[d]
	}
	return fmt.Sprintf("Drainage(%d)", int(d))
}

// ParseDrainage reads a drainage option as written in a sheet.
func ParseDrainage(s string) (Drainage, bool) { return parseEnum[Drainage](s, drainageNames[:]) }

// Method selects the bearing-capacity factors.
type Method int

const (
	EC7      Method = iota // EN 1997-1:2004 Annex D
	Vesic                  // Vesić (1973, 1975)
	Meyerhof               // Meyerhof (1963)
	Hansen                 // Brinch Hansen (1970)
	Terzaghi               // Terzaghi (1943), Nγ of Kumbhojkar (1993)
)

var methodNames = [...]string{"ec7", "vesic", "meyerhof", "hansen", "terzaghi"}

func (m Method) String() string {
	if m >= 0 && int(m) < len(methodNames) {
		return methodNames[m]
	}
	return fmt.Sprintf("Method(%d)", int(m))
}

var methodTitles = [...]string{"EN 1997-1:2004 Annex D", "Vesić (1973, 1975)", "Meyerhof (1963)", "Brinch Hansen (1970)", "Terzaghi (1943)"}

// Title names the method for the reader ("EN 1997-1:2004 Annex D").
func (m Method) Title() string {
	if m >= 0 && int(m) < len(methodTitles) {
		return methodTitles[m]
	}
	return m.String()
}

// ParseMethod reads a method option as written in a sheet.
func ParseMethod(s string) (Method, bool) { return parseEnum[Method](s, methodNames[:]) }

// Switch is a three-way option.
type Switch int

const (
	Auto Switch = iota
	Yes
	No
)

var switchNames = [...]string{"auto", "yes", "no"}

func (s Switch) String() string {
	if s >= 0 && int(s) < len(switchNames) {
		return switchNames[s]
	}
	return fmt.Sprintf("Switch(%d)", int(s))
}

// ParseSwitch reads auto, yes or no.
func ParseSwitch(s string) (Switch, bool) { return parseEnum[Switch](s, switchNames[:]) }

func parseEnum[T ~int](s string, names []string) (T, bool) {
	s = strings.ToLower(strings.TrimSpace(s))
	for i, n := range names {
		if n == s {
			return T(i), true
		}
	}
	return 0, false
}

// Interface describes the base–soil interface for sliding.
type Interface struct {
	// Delta is the characteristic interface friction angle δ_k, rad,
	// [0, 45] deg. Not set: δ_d = KDelta·φ′_cv,d of the founding layer (its
	// peak φ′ with a warning when φ′_cv is not given).
	Delta site.Opt
	// KDelta is δ_d/φ′_cv,d, (0, 1]; 0 means 1 (concrete cast in situ,
	// EN 1997-1 6.5.3(10); use 2/3 for smooth precast).
	KDelta float64
	// Sealed says water and air cannot reach the interface of a footing on
	// undrained clay, so the limit R_d ≤ 0.4 V_d of EN 1997-1 6.5.3(12)P
	// is not applied. The zero value (limit applied) is the safe one.
	Sealed bool
}

// Options are the bearing block's options. The zero value is the default
// of every option: drainage auto, method ec7, approach DA1, local shear
// auto, sliding auto, two-layer auto, δ = φ′, 0.4 V_d limit applied,
// load spread 1H:2V.
type Options struct {
	Drainage   Drainage
	Method     Method
	Approach   design.Approach // zero value (no name): design.DA1()
	LocalShear Switch          // auto: by the founding layer's density or consistency
	Sliding    Switch          // auto: when any action has horizontal load
	TwoLayer   Switch          // auto (= yes) or no
	Interface  Interface
	// SpreadTan is the load-spread gradient through the upper layer,
	// horizontal per vertical, (0, 1]; 0 means 0.5 (1H:2V).
	SpreadTan float64
	// Ks overrides the punching shear coefficient K_s, (0, 100].
	Ks site.Opt
	// CaRatio overrides the adhesion ratio c_a/c_1, [0, 1].
	CaRatio site.Opt
	// FSOnGross divides the gross ultimate pressure by the global factor
	// of an allowable-stress approach (q_a = q_ult/FS, as in the
	// textbooks that do so) instead of the net (q_a = q_net,ult/FS + q,
	// the default). Only with an allowable-stress approach.
	FSOnGross bool

	spreadSet bool // SpreadTan was given (set by validate)
	kDeltaSet bool // Interface.KDelta was given (set by validate)
}

// Input is everything one bearing calculation needs.
type Input struct {
	Ground  site.Ground
	Footing site.Footing
	Actions []site.Action // characteristic, at the underside of the footing
	Options Options
	// gross is set by CapacityAt: drained cases keep the unit load whole
	// (no water pressure deducted), and the table adds u_0 back to the
	// effective resistance pressure to give a gross one.
	gross bool
}

const (
	kPa  = 1e3
	kN   = 1e3
	degr = 3.141592653589793 / 180
)

// validate checks the input and returns the options with defaults filled.
func validate(in Input) (Options, error) {
	var errs site.Errors
	add := func(err error) {
		if err == nil {
			return
		}
		if l, ok := err.(site.Errors); ok {
			errs = append(errs, l...)
		} else {
			errs = append(errs, err)
		}
	}
	add(in.Ground.Validate())
	add(in.Footing.Validate())
	add(site.ValidateActions(in.Footing.Name, in.Actions))
	o := in.Options
	if o.Approach.Name == "" && len(o.Approach.Combinations) == 0 {
		o.Approach = design.DA1()
	}
	add(o.Approach.Validate())
	if o.Drainage < DrainageAuto || o.Drainage > Both {
		errs = append(errs, &site.InputError{Where: "bearing", Param: "drainage", Msg: "expected undrained, drained, both or auto"})
	}
	if o.Method < EC7 || o.Method > Terzaghi {
		errs = append(errs, &site.InputError{Where: "bearing", Param: "method", Msg: "expected ec7, vesic, meyerhof, hansen or terzaghi"})
	}
	for _, s := range []struct {
		n string
		v Switch
	}{{"local_shear", o.LocalShear}, {"sliding", o.Sliding}, {"two_layer", o.TwoLayer}} {
		if s.v < Auto || s.v > No {
			errs = append(errs, &site.InputError{Where: "bearing", Param: s.n, Msg: "expected auto, yes or no"})
		}
	}
	rng := func(p string, v, scale, lo, hi float64, unit string, open bool) {
		errs.Range("bearing", p, v, scale, lo, hi, open, unit)
	}
	if o.Interface.Delta.Set {
		rng("delta", o.Interface.Delta.V, degr, 0, 45, "deg", false)
	}
	if o.Interface.KDelta != 0 {
		rng("k_delta", o.Interface.KDelta, 1, 0, 1, "", true)
	}
	if o.SpreadTan != 0 {
		rng("spread", o.SpreadTan, 1, 0, 1, "", true)
	}
	if o.Ks.Set {
		rng("K_s", o.Ks.V, 1, 0, 100, "", true)
	}
	if o.CaRatio.Set {
		rng("c_a/c_1", o.CaRatio.V, 1, 0, 1, "", false)
	}
	if o.FSOnGross && !o.Approach.Allowable() {
		errs = append(errs, &site.InputError{Where: "bearing", Param: "fs_on", Msg: "fs_on = gross needs an allowable-stress approach, FS(factor)"})
	}
	o.kDeltaSet = o.Interface.KDelta != 0
	if o.Interface.KDelta == 0 {
		o.Interface.KDelta = 1
	}
	o.spreadSet = o.SpreadTan != 0
	if o.SpreadTan == 0 {
		o.SpreadTan = 0.5
	}
	if in.Footing.Shape == site.Strip {
		for _, a := range in.Actions {
			if a.HL != 0 || a.ML != 0 {
				errs = append(errs, &site.InputError{Where: in.Footing.Name + ": action " + fmt.Sprintf("%q", a.Name), Param: "H_L, M_L",
					Msg: "a strip is calculated per metre run across its width: it carries no load or moment along its length"})
				break
			}
		}
	}
	if len(errs) > 0 {
		return o, errs
	}
	// parameters the checks will need from the founding layer
	g, f := in.Ground, in.Footing
	i := g.At(f.D)
	l := g.Layers[i]
	if !l.Phi.Set && !(l.Fine() && l.Cu.Set) {
		errs = append(errs, &site.InputError{Where: layerName(g, i), Param: "phi'", Msg: "the founding layer needs phi' (drained) or, for a fine-grained layer, c_u (undrained)"})
	}
	if o.Drainage == Undrained && !l.Cu.Set && !l.Phi.Set {
		errs = append(errs, &site.InputError{Where: layerName(g, i), Param: "c_u", Msg: "an undrained check needs c_u of the founding layer"})
	}
	if (o.Drainage == Drained || o.Drainage == Both) && !l.Phi.Set {
		errs = append(errs, &site.InputError{Where: layerName(g, i), Param: "phi'", Msg: "a drained check needs phi' of the founding layer"})
	}
	if (o.Drainage == Undrained || o.Drainage == Both) && !l.Cu.Set && l.Fine() {
		errs = append(errs, &site.InputError{Where: layerName(g, i), Param: "c_u", Msg: "an undrained check needs c_u of the fine-grained founding layer"})
	}
	return o, errs.Err()
}

func layerName(g site.Ground, i int) string {
	if n := g.Layers[i].Name; n != "" {
		return fmt.Sprintf("layer %q", n)
	}
	return fmt.Sprintf("layer %d", i+1)
}
