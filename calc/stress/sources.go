package stress

import "github.com/plinth-calc/plinth/calc/trace"

// Sources of the stress solutions.
var (
	Boussinesq1885 = trace.Source{Key: "Boussinesq1885", Citation: "Boussinesq, J. (1885). Application des potentiels à l'étude de l'équilibre et du mouvement des solides élastiques. Gauthier-Villars, Paris."}
	Newmark1935    = trace.Source{Key: "Newmark1935", Citation: "Newmark, N.M. (1935). Simplified computation of vertical pressures in elastic foundations. University of Illinois Engineering Experiment Station, Circular No. 24."}
	PoulosDavis    = trace.Source{Key: "PoulosDavis1974", Citation: "Poulos, H.G. & Davis, E.H. (1974). Elastic Solutions for Soil and Rock Mechanics. John Wiley & Sons, New York."}
	Grasshoff1955  = trace.Source{Key: "Grasshoff1955", Citation: "Graßhoff, H. (1955). Setzungsberechnungen starrer Fundamente mit Hilfe des kennzeichnenden Punktes. Der Bauingenieur 30(2), 53–54."}
	HoltzKovacs    = trace.Source{Key: "HoltzKovacs1981", Citation: "Holtz, R.D. & Kovacs, W.D. (1981). An Introduction to Geotechnical Engineering. Prentice-Hall, Englewood Cliffs, NJ."}
)
