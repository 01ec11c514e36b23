package stress

import (
	"math"

	"github.com/plinth-calc/plinth/calc/site"
)

// Circle returns Δσ_z/q at depth z below a point at distance r from the
// centre of a uniformly loaded circle of the given radius.
//
// On the axis (r = 0) it is Boussinesq's closed form
// 1 − [1 + (R/z)²]^(−3/2) (Boussinesq 1885; e.g. Poulos & Davis 1974).
// Elsewhere the point-load solution of Boussinesq (1885),
// dσ_z = 3 q z³ dA / (2π ρ⁵), is integrated over the loaded area in polar
// coordinates centred on the point: the radial integral is exact,
// (1/2π)[1 − z³/(ρ_e² + z²)^(3/2)] for a ray reaching the edge at ρ_e, and
// the angular integral is evaluated by adaptive Gauss–Legendre quadrature
// to about 1e-12. Outside the circle the angle is substituted
// (sin θ = (R/r) sin φ) to remove the square-root end behaviour. The
// results agree with the tables of Ahlvin & Ulery (1962).
func Circle(radius, r, z float64) (float64, error) {
	var errs site.Errors
	errs = checkPos(errs, "R", radius)
	errs = checkDepth(errs, z)
	if !(r >= 0) || math.IsInf(r, 0) {
		errs = append(errs, &site.RangeError{Param: "r", Value: r, Min: 0, Max: math.Inf(1), Unit: "m", Reason: "radial distance from the centre"})
	}
	if err := one(errs); err != nil {
		return 0, err
	}
	return circle(radius, r, z), nil
}

func circleAxis(radius, z float64) float64 {
	if z == 0 {
		return 1
	}
	x := radius / z
	// 1 − (1 + x²)^(−3/2), written to keep precision for small x.
	return -math.Expm1(-1.5 * math.Log1p(x*x))
}

func circle(radius, r, z float64) float64 {
	if r == 0 {
		return circleAxis(radius, z)
	}
	if z == 0 {
		switch {
		case r < radius:
			return 1
		case r == radius:
			return 0.5
		}
		return 0
	}
	z3 := z * z * z
	k := func(rho float64) float64 { // z³/(ρ² + z²)^(3/2)
		d := math.Hypot(rho, z)
		return z3 / (d * d * d)
	}
	switch {
	case r < radius:
		f := func(t float64) float64 {
			s := math.Sin(t)
			rho := -r*math.Cos(t) + math.Sqrt(radius*radius-r*r*s*s)
			return 1 - k(rho)
		}
		return integrate(f, 0, math.Pi) / math.Pi
	case r == radius:
		f := func(t float64) float64 { return 1 - k(-2*radius*math.Cos(t)) }
		return integrate(f, math.Pi/2, math.Pi) / math.Pi
	}
	ratio := radius / r
	f := func(p float64) float64 {
		sp, cp := math.Sin(p), math.Cos(p)
		ct := math.Sqrt(1 - ratio*ratio*sp*sp)
		h := radius * cp
		near, far := r*ct-h, r*ct+h
		return (k(near) - k(far)) * ratio * cp / ct
	}
	return integrate(f, 0, math.Pi/2) / math.Pi
}

// Gauss–Legendre nodes and weights on [−1, 1], computed once by Newton's
// iteration on the Legendre polynomial (common practice).
var glX, glW = legendre(12)

func legendre(n int) ([]float64, []float64) {
	x := make([]float64, n)
	w := make([]float64, n)
	for i := 0; i < n; i++ {
		t := math.Cos(math.Pi * (float64(i) + 0.75) / (float64(n) + 0.5))
		var dp float64
		for it := 0; it < 100; it++ {
			p0, p1 := 1.0, t
			for k := 2; k <= n; k++ {
				p0, p1 = p1, ((2*float64(k)-1)*t*p1-(float64(k)-1)*p0)/float64(k)
			}
			dp = float64(n) * (t*p1 - p0) / (t*t - 1)
			dt := p1 / dp
			t -= dt
			if math.Abs(dt) < 1e-16 {
				break
			}
		}
		p0, p1 := 1.0, t
		for k := 2; k <= n; k++ {
			p0, p1 = p1, ((2*float64(k)-1)*t*p1-(float64(k)-1)*p0)/float64(k)
		}
		dp = float64(n) * (t*p1 - p0) / (t*t - 1)
		x[i] = t
		w[i] = 2 / ((1 - t*t) * dp * dp)
	}
	return x, w
}

func gl(f func(float64) float64, a, b float64) float64 {
	h, c := (b-a)/2, (a+b)/2
	var s float64
	for i, x := range glX {
		s += glW[i] * f(c+h*x)
	}
	return s * h
}

// integrate is adaptive Gauss–Legendre quadrature: a panel is accepted
// when its value and the sum over its halves agree to 1e-13.
func integrate(f func(float64) float64, a, b float64) float64 {
	var rec func(a, b, whole float64, depth int) float64
	rec = func(a, b, whole float64, depth int) float64 {
		m := (a + b) / 2
		l, r := gl(f, a, m), gl(f, m, b)
		if depth > 40 || math.Abs(l+r-whole) <= 1e-13 {
			return l + r
		}
		return rec(a, m, l, depth+1) + rec(m, b, r, depth+1)
	}
	return rec(a, b, gl(f, a, b), 0)
}
