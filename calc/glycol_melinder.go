package calc

// The coefficient sets of Melinder (2010) for aqueous ethylene glycol and
// propylene glycol: Å. Melinder, Properties of Secondary Working Fluids for
// Indirect Systems, 2nd ed., International Institute of Refrigeration,
// Paris, 2010. Each property is
//
//	f(x, t) = Σ c[i][j]·(x − xm)^i·(t − tm)^j
//
// with x the glycol's share in per cent by mass and t in °C; the viscosity
// column is ln(μ / mPa·s). The freezing point depends on x alone: only its
// j = 0 terms are kept (the published set also lists t terms of order
// 1e-6 K and smaller, which carry no meaning for a freezing point).
//
// Transcribed from the published sets. A wrong term shows at 0 %, where
// the fits must close on water: with these terms the viscosity meets
// IAPWS water within 0.8 % from 0 to 40 °C (a sign slip in c[2][1] or
// c[2][2] puts it about 4 % off; TestGlycolWaterLimit).

// melinderPoly holds c[i][j] for i ≤ 5, j ≤ 3, i + j ≤ 5 (18 terms; the
// rest are zero).
type melinderPoly [6][4]float64

// melinderFit is one glycol's set: the centre (xm in %, tm in °C) and a
// polynomial per property.
type melinderFit struct {
	xm, tm float64
	// freeze holds the j = 0 terms of the freezing point, °C.
	freeze [6]float64
	// rho in kg/m³, cp in J/(kg·K), lambda in W/(m·K), lnMu ln(μ/mPa·s).
	rho, cp, lambda, lnMu melinderPoly
}

// melinderEthylene is the set for ethylene glycol ("MEG" in the source).
var melinderEthylene = melinderFit{
	xm: 30.8462, tm: 31.728,
	freeze: [6]float64{-15.25, -0.808, -0.01334, -7.293e-5, 1.006e-6, 1.14e-9},
	rho: melinderPoly{
		{1034.0, -0.4781, -0.002692, 4.725e-6},
		{1.311, -0.006876, 4.805e-5, 1.69e-8},
		{7.49e-5, 7.855e-5, -3.995e-7, 4.982e-9},
		{-0.0001062, 1.229e-6, -1.153e-8},
		{-9.623e-7, -7.211e-8},
		{4.891e-8},
	},
	cp: melinderPoly{
		{3737.0, 2.93, -0.004675, -1.389e-5},
		{-17.99, 0.1046, -0.0004147, 1.847e-7},
		{-0.09933, 0.0003516, 5.109e-6, -7.138e-8},
		{0.00261, -1.189e-6, -1.643e-7},
		{1.537e-5, -4.272e-7},
		{-1.618e-6},
	},
	lambda: melinderPoly{
		{0.472, 0.0008903, -1.058e-6, -2.789e-9},
		{-0.004286, -1.473e-5, 1.059e-7, -1.142e-10},
		{1.747e-5, 6.814e-8, -3.612e-9, 2.365e-12},
		{3.017e-8, -2.412e-9, 4.004e-11},
		{-1.322e-9, 2.555e-11},
		{2.678e-11},
	},
	lnMu: melinderPoly{
		{0.4705, -0.0255, 0.0001782, -7.669e-7},
		{0.02471, -0.0001171, 1.052e-6, -1.634e-8},
		{3.328e-6, 1.086e-6, 1.051e-8, -6.475e-10},
		{1.659e-6, 3.157e-9, 4.063e-10},
		{3.089e-8, 1.831e-10},
		{-1.865e-9},
	},
}

// melinderPropylene is the set for propylene glycol ("MPG" in the source).
var melinderPropylene = melinderFit{
	xm: 30.7031, tm: 32.7083,
	freeze: [6]float64{-13.25, -0.6631, -0.01094, -0.0002283, -3.409e-6, 1.465e-8},
	rho: melinderPoly{
		{1018.0, -0.5406, -0.002666, 1.347e-5},
		{0.7604, -0.00945, 5.541e-5, -1.343e-7},
		{-0.002498, 2.7e-5, -4.018e-7, 3.376e-9},
		{-0.000155, 2.829e-6, -7.175e-9},
		{-1.131e-6, -2.221e-8},
		{2.342e-8},
	},
	cp: melinderPoly{
		{3882.0, 2.699, -0.001659, -1.032e-5},
		{-13.04, 0.0507, -4.752e-5, 1.522e-6},
		{-0.1598, 9.534e-5, 1.167e-5, -4.87e-8},
		{0.0003539, 3.102e-5, -2.95e-7},
		{5.0e-5, -7.135e-7},
		{-4.959e-7},
	},
	lambda: melinderPoly{
		{0.4513, 0.0007955, 3.482e-8, -5.966e-9},
		{-0.004795, -1.678e-5, 8.941e-8, 1.493e-10},
		{2.076e-5, 1.563e-7, -4.615e-9, 9.897e-12},
		{-9.083e-8, -2.518e-9, 6.543e-11},
		{-5.952e-10, -3.605e-11},
		{2.104e-11},
	},
	lnMu: melinderPoly{
		{0.6837, -0.03045, 0.0002525, -1.399e-6},
		{0.03328, -0.0003984, 4.332e-6, -1.86e-8},
		{5.453e-5, -8.6e-8, -1.593e-8, -4.465e-11},
		{-3.9e-6, 1.054e-7, -1.589e-9},
		{-1.587e-8, 4.475e-10},
		{3.564e-9},
	},
}
