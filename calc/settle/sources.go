package settle

import "github.com/plinth-calc/plinth/calc/trace"

// Sources of the settlement methods. Keys are unique across the engine.
var (
	Steinbrenner1934 = trace.Source{Key: "Steinbrenner1934", Citation: "Steinbrenner, W. (1934). Tafeln zur Setzungsberechnung. Die Straße 1, 121–124."}
	Bowles1996       = trace.Source{Key: "Bowles1996", Citation: "Bowles, J.E. (1996). Foundation Analysis and Design, 5th ed. McGraw-Hill, New York."}
	Terzaghi1943     = trace.Source{Key: "Terzaghi1943", Citation: "Terzaghi, K. (1943). Theoretical Soil Mechanics. John Wiley & Sons, New York."}
	TPM1996          = trace.Source{Key: "TPM1996", Citation: "Terzaghi, K., Peck, R.B. & Mesri, G. (1996). Soil Mechanics in Engineering Practice, 3rd ed. John Wiley & Sons, New York."}
	Craig2012        = trace.Source{Key: "Craig2012", Citation: "Knappett, J.A. & Craig, R.F. (2012). Craig's Soil Mechanics, 8th ed. Spon Press, Abingdon."}
	SB1957           = trace.Source{Key: "SkemptonBjerrum1957", Citation: "Skempton, A.W. & Bjerrum, L. (1957). A contribution to the settlement analysis of foundations on clay. Géotechnique 7(4), 168–178."}
	Scott1963        = trace.Source{Key: "Scott1963", Citation: "Scott, R.F. (1963). Principles of Soil Mechanics. Addison-Wesley, Reading, MA."}
	Schmertmann1970  = trace.Source{Key: "Schmertmann1970", Citation: "Schmertmann, J.H. (1970). Static cone to compute static settlement over sand. J. Soil Mech. Found. Div. ASCE 96(SM3), 1011–1043."}
	Schmertmann1978  = trace.Source{Key: "Schmertmann1978", Citation: "Schmertmann, J.H., Hartman, J.P. & Brown, P.R. (1978). Improved strain influence factor diagrams. J. Geotech. Eng. Div. ASCE 104(GT8), 1131–1135."}
	BB1985           = trace.Source{Key: "BurlandBurbidge1985", Citation: "Burland, J.B. & Burbidge, M.C. (1985). Settlement of foundations on sand and gravel. Proc. Instn Civ. Engrs, Part 1, 78(6), 1325–1381."}
	Brent1973        = trace.Brent1973
	SM1956           = trace.Source{Key: "SkemptonMacDonald1956", Citation: "Skempton, A.W. & MacDonald, D.H. (1956). The allowable settlements of buildings. Proc. Instn Civ. Engrs, Part III, 5, 727–768."}
	Bjerrum1963      = trace.Source{Key: "Bjerrum1963", Citation: "Bjerrum, L. (1963). Allowable settlement of structures. Proc. 3rd European Conf. Soil Mech. Found. Eng., Wiesbaden, Vol. 2, 135–137."}
)
