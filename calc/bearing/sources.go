package bearing

import "github.com/plinth-calc/plinth/calc/trace"

// Publications the bearing engine cites (EN 1997-1 and EN 1990 are shared,
// in package trace).
var (
	SrcPrandtl       = trace.Source{Key: "Prandtl1921", Citation: "Prandtl, L. (1921) Über die Eindringungsfestigkeit (Härte) plastischer Baustoffe und die Festigkeit von Schneiden. Zeitschrift für angewandte Mathematik und Mechanik, 1(1), 15–20."}
	SrcTerzaghi      = trace.Source{Key: "Terzaghi1943", Citation: "Terzaghi, K. (1943) Theoretical Soil Mechanics. John Wiley & Sons, New York."}
	SrcKumbhojkar    = trace.Source{Key: "Kumbhojkar1993", Citation: "Kumbhojkar, A. S. (1993) Numerical evaluation of Terzaghi's Nγ. Journal of Geotechnical Engineering, ASCE, 119(3), 598–607; values as tabulated in Das, B. M., Principles of Foundation Engineering, 7th ed., Cengage Learning, 2011, Table 3.1."}
	SrcMeyerhof1953  = trace.Source{Key: "Meyerhof1953", Citation: "Meyerhof, G. G. (1953) The bearing capacity of foundations under eccentric and inclined loads. Proc. 3rd International Conference on Soil Mechanics and Foundation Engineering, Zürich, Vol. 1, 440–445."}
	SrcMeyerhof1963  = trace.Source{Key: "Meyerhof1963", Citation: "Meyerhof, G. G. (1963) Some recent research on the bearing capacity of foundations. Canadian Geotechnical Journal, 1(1), 16–26."}
	SrcHansen1970    = trace.Source{Key: "Hansen1970", Citation: "Brinch Hansen, J. (1970) A revised and extended formula for bearing capacity. Danish Geotechnical Institute, Bulletin No. 28, 5–11."}
	SrcVesic1973     = trace.Source{Key: "Vesic1973", Citation: "Vesić, A. S. (1973) Analysis of ultimate loads of shallow foundations. Journal of the Soil Mechanics and Foundations Division, ASCE, 99(SM1), 45–73."}
	SrcVesic1975     = trace.Source{Key: "Vesic1975", Citation: "Vesić, A. S. (1975) Bearing capacity of shallow foundations. In Winterkorn, H. F. & Fang, H.-Y. (eds), Foundation Engineering Handbook, Van Nostrand Reinhold, New York, ch. 3, 121–147."}
	SrcBowles        = trace.Source{Key: "Bowles1996", Citation: "Bowles, J. E. (1996) Foundation Analysis and Design, 5th ed. McGraw-Hill, New York (Tables 4-1, 4-5a and 4-5b: factors of Meyerhof, Hansen and Vesić)."}
	SrcDas           = trace.Source{Key: "Das2011", Citation: "Das, B. M. (2011) Principles of Foundation Engineering, 7th ed. Cengage Learning, Stamford CT."}
	SrcMeyerhofHanna = trace.Source{Key: "MeyerhofHanna1978", Citation: "Meyerhof, G. G. & Hanna, A. M. (1978) Ultimate bearing capacity of foundations on layered soils under inclined load. Canadian Geotechnical Journal, 15(4), 565–572."}
	SrcBR470         = trace.Source{Key: "BR470", Citation: "BRE (2004) BR 470 Working platforms for tracked plant: good practice guide to the design, installation, maintenance and repair of ground-supported working platforms. Building Research Establishment, Watford (Table A2: Kp·tanδ)."}
	SrcISO14688      = trace.Source{Key: "ISO14688-2", Citation: "EN ISO 14688-2:2004 Geotechnical investigation and testing – Identification and classification of soil – Part 2: Principles for a classification. CEN, Brussels (Table 4 density index; Table 5 undrained shear strength)."}
	SrcTerzaghiPeck  = trace.Source{Key: "TerzaghiPeck1948", Citation: "Terzaghi, K. & Peck, R. B. (1948) Soil Mechanics in Engineering Practice. John Wiley & Sons, New York (density of sands from SPT N)."}
	SrcGere          = trace.Source{Key: "GereTimoshenko1997", Citation: "Gere, J. M. & Timoshenko, S. P. (1997) Mechanics of Materials, 4th ed. PWS Publishing, Boston (the core, or kern, of a rectangular cross section: a rhombus with diagonals b/3 and h/3; section from memory)."}
	SrcAPI           = trace.Source{Key: "API-RP2GEO", Citation: "API RP 2GEO (2011) Geotechnical and Foundation Design Considerations, 1st ed. American Petroleum Institute, Washington DC (effective area of a circular base under eccentric load, after API RP 2A)."}
)

// Refs used throughout.
var (
	refD1     = trace.Ref{Source: trace.EN1997, Clause: "Annex D, D.1 (effective dimensions)"}
	refD3     = trace.Ref{Source: trace.EN1997, Clause: "Annex D, D.3"}
	refD4     = trace.Ref{Source: trace.EN1997, Clause: "Annex D, D.4"}
	ref652    = trace.Ref{Source: trace.EN1997, Clause: "6.5.2.1, eq. (6.1)"}
	ref654    = trace.Ref{Source: trace.EN1997, Clause: "6.5.4(1)P"}
	ref6521   = trace.Ref{Source: trace.EN1997, Clause: "2.4.2(4) (water pressures are actions), 6.5.2.1"}
	refA4     = trace.Ref{Source: trace.EN1997, Clause: "Annex A, Table A.4"}
	refA5     = trace.Ref{Source: trace.EN1997, Clause: "Annex A, Table A.5"}
	refMat    = trace.Ref{Source: trace.EN1997, Clause: "2.4.6.2, eq. (2.2)"}
	refSlide  = trace.Ref{Source: trace.EN1997, Clause: "6.5.3, eqs. (6.3a), (6.3b)"}
	refSlideU = trace.Ref{Source: trace.EN1997, Clause: "6.5.3, eqs. (6.4a), (6.4b)"}
	ref04V    = trace.Ref{Source: trace.EN1997, Clause: "6.5.3(12)P, eq. (6.5)"}
	refDelta  = trace.Ref{Source: trace.EN1997, Clause: "6.5.3(10)"}
	refMey53  = trace.Ref{Source: SrcMeyerhof1953, Clause: "effective width B′ = B − 2e"}
	refWater  = trace.Ref{Source: SrcDas, Clause: "effect of the water table, cases I–III"}
	refTerz   = trace.Ref{Source: SrcTerzaghi, Clause: "bearing capacity factors"}
	refLocal  = trace.Ref{Source: SrcTerzaghi, Clause: "local shear: c* = 2c/3, tan φ* = (2/3) tan φ"}
	refKumb   = trace.Ref{Source: SrcKumbhojkar, Clause: "Nγ, Das (2011) Table 3.1, linear interpolation"}
	refMey63  = trace.Ref{Source: SrcBowles, Clause: "Tables 4-1, 4-5a (Meyerhof 1963)"}
	refHan70  = trace.Ref{Source: SrcBowles, Clause: "Tables 4-1, 4-5a, 4-5b (Hansen 1970)"}
	refVes75  = trace.Ref{Source: SrcBowles, Clause: "Tables 4-1, 4-5a, 4-5b (Vesić 1973, 1975)"}
	refMH     = trace.Ref{Source: SrcMeyerhofHanna, Clause: "stronger over weaker layer; rectangular form as given by Das (2011)"}
	refKs     = trace.Ref{Source: SrcBR470, Clause: "Table A2, Kp·tanδ = Ks·tanφ′ (Meyerhof & Hanna 1978)"}
	refCa     = trace.Ref{Source: SrcMeyerhofHanna, Clause: "adhesion ratio ca/c1 against q2/q1 (chart)"}
	refCircle = trace.Ref{Source: SrcAPI, Clause: "effective area of a circular foundation"}
	refMode   = trace.Ref{Source: SrcVesic1973, Clause: "failure modes against relative density"}
	refKern   = trace.Ref{Source: SrcGere, Clause: "core (kern) of a rectangular section; Bowles (1996) §4-7, biaxial eccentricity (from memory)"}
	refPrandt = trace.Ref{Source: SrcPrandtl, Clause: "Nc = π + 2 for φ = 0"}
)
