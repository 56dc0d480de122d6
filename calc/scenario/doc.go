// Package scenario is Fieldhead's one vocabulary: a URL query string that
// holds a whole calculation. The share link, the state kept in the browser's
// localStorage and the test cases in testdata/cases are all such a string.
//
// Values carry their unit in the text, as a person would write them
// (z2=38.5m, q=240gpm, p1=-18kPa). A value typed without a unit takes the
// default unit of the chosen unit system (units=si or units=us); the default
// is shown beside the field in the app, so it is never a hidden guess.
// Parse keeps exactly what was typed (Scenario.Get returns it), so a bad
// value is reported and kept, never dropped. Every parameter is described
// once, in Table: its label, kind, dimension, default units, choices,
// either/or group and the message asking for it when it is missing.
//
// # Parameters
//
// General:
//
//	view    balance | convert | regime | line | pump | report   the view the link opens on
//	        (regime is the Run view, "Run and sizes": the link value is kept
//	        from its first name so that old links open on it)
//	units   si | us                          default and display units (default si)
//	name    free text                        a title for the sheet (shown as text, never markup)
//
// Liquid and site:
//
//	liq     water | seawater | eg | pg | custom   the liquid (default water; seawater is 35 g/kg,
//	                                         0–40 °C; eg and pg are ethylene and propylene glycol
//	                                         in water, from the mix's freezing point to 100 °C)
//	gly     glycol share by mass, e.g. 30%   eg and pg: 0 to 60 % by mass
//	glyv    glycol share by volume, e.g. 30% eg and pg, instead of gly: the glycol's volume over the
//	                                         glycol's and the water's measured apart at 20 °C
//	                                         (0 to about 57 % for eg, 59 % for pg); converted
//	                                         to the share by mass, which the sheet shows too
//	t       temperature, e.g. 18C, 64F       required for water, seawater and glycol mixes
//	rho     density, e.g. 998kg/m3           custom liquid only
//	mu      dynamic viscosity, e.g. 1.0mPa.s custom liquid only
//	pv      vapour pressure (absolute)       custom liquid only
//	alt     site altitude, e.g. 210m         site pressure from the ISO 2533 standard atmosphere
//	baro    barometer reading (absolute)     used instead of alt when given
//
// When neither alt nor baro is given the standard sea-level pressure
// 101.325 kPa is used and a warning says so.
//
//	pl      line pressure, e.g. 1.8MPa, 250psig  the pressure water and seawater
//	                                          properties are taken at
//	plref   g | a                            gauge (default) or absolute, as pnref
//
// Water's and seawater's density and viscosity depend on the absolute
// pressure in the line (their vapour pressure is the saturation pressure,
// whatever the line's). That pressure is, in this order: pl when given
// (gauge on the site pressure unless absolute); else the mean of the
// absolute pressures of the points whose pressure is typed (p1 and p2, but
// not the one being solved for); else the site pressure. When the one it
// needs is in error (a point's pressure, pl, the site) the liquid is left
// out, never taken at another pressure. A stated pl below
// the vapour pressure or above the formulation's range (10 MPa for both
// liquids) is an error on pl; a mean of the points outside the range is an
// error on pl asking for it; one below the vapour pressure takes the
// vapour pressure with a warning. Result.Fluid.Pressure and
// Result.LiquidFrom say which was used.
// A glycol mix (liq=eg or pg) below its freezing point, or with a share
// outside the range, is an error on t, gly or glyv. Every glycol mix
// carries a warning on liq that a commercial (inhibited) glycol differs and
// that its maker's data sheet governs; the mix's properties are Melinder's
// (2010) fits, its vapour pressure Raoult's law. Above 40 °C, where the
// source's tables stop, the fits are extrapolated and t carries a warning
// saying so. A share of 1.5 % or less draws a warning naming the share
// probably meant (0.3 typed for 30 %). Result.Glycol holds the share both
// ways and the freezing point.
//
// The two points of the energy balance (n = 1 in, 2 out):
//
//	pn      pressure, e.g. -18kPa, 430kPa, 14.7psia
//	pnref   g | a                            gauge (default) or absolute; psig/psia, barg/bara override
//	zn      elevation of the point, e.g. 212m
//	vn      mean velocity at the point (0 for a large tank surface), or
//	dn      inside diameter at the point: the velocity is q/(πd²/4)
//
// Flow, heads and the unknown:
//
//	q       volumetric flow, e.g. 45L/s, 240gpm
//	hp      head added by a pump (m or ft of the liquid)
//	ht      head taken by a turbine
//	hf      friction head between the points, when not computed from a pipe run
//	solve   p1 | p2 | z1 | z2 | q | hp | ht | hf     the one unknown (default hp)
//	alpha   auto | 1 | pl                    kinetic-energy factor: from the regime
//	                                          (2 laminar, 1 turbulent), 1 always, or
//	                                          a power-law profile estimate
//
// The value of the unknown's own parameter, if present, is kept but not used.
//
// A pipe run (used for hf in the balance when l is given, and by the Run view):
//
//	l       length of the run, e.g. 640m
//	d       inside diameter, or
//	nps,sch a size and a class of a pipe catalogue, e.g. nps=8&sch=40 (steel,
//	        NPS 8 schedule 40), nps=160&sch=SDR11 (PE, OD 160 mm),
//	        nps=200&sch=K9 (ductile iron, DN 200); Choices("sch") lists
//	        the classes with their catalogue
//	mat     material key (roughness and Hazen–Williams C), or
//	eps     absolute roughness, e.g. 0.045mm
//	fit     fittings as key:count, comma separated, e.g. gate:2,elbow90lr:6,exit:1;
//	        a K from the maker's data sheet follows an @, per fitting:
//	        gate:2@0.12 (otherwise K is worked out for the pipe's size)
//	k       extra loss coefficient ΣK added to the fittings
//	fm      colebrook | swamee-jain | haaland | hazen-williams   (default colebrook)
//	chw     Hazen–Williams C (default from mat)
//
// The Convert view:
//
//	cv      a pressure, water-column or head value to convert, e.g. 430kPa, 12mH2O, 40ft
//	cvref   g | a                            whether cv is gauge (default) or absolute
//
// A line of several segments (the Line view), numbered from point 1, N from
// 1 to 20; each takes the single-run parameters under the prefix sN.:
//
//	sN.l sN.d sN.nps sN.sch sN.mat sN.eps sN.fit sN.k   as for the single run
//	sN.z    elevation of the segment's end, e.g. s1.z=214.5m
//	sN.cmp  components on the segment (optional), comma separated, each
//	        name:drop@flow or name:cvN / name:kvN, e.g.
//	        s2.cmp=chiller:45kPa@12L/s,coil:3.2m@12L/s,valve:kv40
//
// A component's name is what the budget and the loss table show (any text
// without , : or @, at most 40 characters). drop@flow is a drop at a rated
// flow, a pressure (kPa, bar, psi…) or a head of the flowing liquid (m,
// ft), and the flow with its unit; it scales with the flow squared and is
// taken as rated on the liquid in service. cvN and kvN are a control
// valve's flow coefficient at its present opening: Cv in US gal/min at
// 1 psi, Kv in m³/h at 1 bar (IEC 60534-1, ANSI/ISA-75.01.01; Cv = 1.156·Kv),
// its drop 1 bar·(Q/Kv)²·ρ/ρ0, ρ0 water at 15 °C (IEC 60534-2-1). Units
// are required. A comma between two digits is a decimal comma when what
// follows it up to the next comma holds no ":" (it starts no component).
//
// When segments are given they are the friction path of the balance (and a
// single run l must not be given as well). Losses where the diameter
// changes between segments are added automatically.
//
// The pump (the Pump view). Lists carry one unit, written after the last
// value; every list has one value per data-sheet point:
//
//	pq      data-sheet flows, e.g. 0,20,40,55,70L/s
//	ph      data-sheet heads, e.g. 62,59,52,44,33m
//	peff    data-sheet efficiencies (optional), e.g. 0,55,72,76,70%
//	pnpsh   data-sheet NPSH required (optional), e.g. 2,2.2,2.8,3.6,4.9m
//	spd     speed as a share of the data sheet's, e.g. 95% (affinity laws);
//	        or in rpm (over nrat), e.g. 1380rpm; or a drive's frequency in
//	        Hz (over fmains), e.g. 47.5Hz. Above 100 % is flagged as overspeed
//	nrat    the data sheet's (rated) speed, e.g. 1450rpm (optional)
//	fmains  the mains frequency the rated speed is given at, e.g. 50Hz (optional)
//	qsp     a flow to reach by a speed change, e.g. 55L/s: the speed at which
//	        the pumps meet the system curve there (affinity laws, Brent's
//	        method), or "no speed in range" (10 % to 200 %)
//	hsp     or a head to reach, e.g. 50m: the flow where the line needs it,
//	        then the speed for that duty (either qsp or hsp)
//	pumps   1 | 2p | 2s | 3p | 3s            identical pumps, in parallel (p) or series (s)
//	zp      pump centreline elevation (for NPSH), e.g. 214.5m
//	pafter  the pump sits after segment N (default 1 with segments, else at point 1)
//	npshr   NPSH required, typed (instead of the pnpsh list)
//	hs      suction loss, typed, e.g. 0.35m (instead of the losses of
//	        segments 1 to pafter)
//
// NPSH needs only the suction side: liq and t (or the custom liquid's
// properties), alt or baro, p1 and p1ref (the pressure on the source
// surface: 0 gauge when open to the air, a vessel's pressure otherwise),
// z1 (the source surface), zp, and hs or segments before the pump with q.
// NPSHr is npshr, else the data sheet's pnpsh at the operating flow (or at
// q without an operating point). The discharge side is not needed.
//
// The Run view (view=regime) shows one run: the single run, or a segment
// of the line, and the same run in every size of a pipe class:
//
//	rseg    the segment shown, e.g. 2 (default 1; ignored without segments)
//	szsch   the class whose sizes the table compares, e.g. SDR11, 40
//	        (default: the run's own class, or the class of a size with the
//	        run's inside diameter and material)
//	vlo,vhi the velocity band marked, e.g. 0.6m/s and 2.4m/s (the defaults,
//	        common practice)
//	grad    the pipe friction marked as the most, per 100 of length, a plain
//	        number (m per 100 m, or ft per 100 ft: the same figure), e.g. 4
//	        (the default, common practice)
//
// With a pump curve and solve=hp, the operating point is where the pump
// curve meets the system curve; q is then only the duty asked for.
//
// The field check of a running pump, from gauge readings:
//
//	ps, pd  suction and discharge gauge readings (gauge pressure)
//	zs, zd  the gauges' heights (any common datum), e.g. zs=0m&zd=0.8m
//	ds, dd  inside diameters of the pipe at the gauges
//	qm      measured flow
//	pin     measured electrical input to the motor, e.g. 31kW
//	etam    the motor's efficiency (nameplate), e.g. 93%: with pin, the
//	        shaft power and the pump's own efficiency
//
// Efficiencies (etam, etat, peff) are percentages: 1.5 % or less is
// refused as a fraction typed into a percentage box ("did you mean 78 %?").
// The electrical input is in kW on US sheets too (power meters read kW).
//
// How sure the test is (optional; each a limit, ±), and the verdict:
//
//	gcs, gss  suction gauge accuracy class (EN 837-1, % of span), e.g. 1.6%,
//	          and its span (full scale less the scale's start), e.g. 250kPa
//	gcd, gsd  the discharge gauge's, e.g. 1%, 1000kPa
//	uqm       flow meter accuracy, % of reading, e.g. 2%
//	upin      power meter accuracy, % of reading, e.g. 1.5%
//	uz        how well each gauge's height is known, e.g. 10mm
//	grade     ISO 9906 acceptance grade: 1B | 1E | 1U | 2B | 2U | 3B
//	          (tolerance factors from memory); the verdict is within,
//	          outside, or "this test cannot tell" with the reading to improve
//
// A test at several points: the discharge valve throttled, a reading at
// each flow with the same instruments and gauges. Reading 1 is qm, ps, pd
// and pin above; readings 2 to 8 are numbered (so a sheet of one reading
// is written as it always was, and a decimal comma stays a decimal comma):
//
//	qm2 … qm8    the flow of reading 2 … 8, e.g. qm2=30L/s
//	ps2 … ps8    its suction gauge, gauge or absolute as ps
//	pd2 … pd8    its discharge gauge
//	pin2 … pin8  the motor's electrical input (optional; needed at every
//	             reading for the tested efficiency curve)
//
// From two readings on the tested head curve (and efficiency curve) runs
// through them by the data sheet's monotone interpolation, with its band.
// With a grade, the test is judged by the guarantee point (ISO 9906's
// tolerance cross; one reading only with qg given):
//
//	qg      guarantee flow (blank: the duty flow q)
//	hg      guarantee head (blank: the data sheet's at qg)
//	etag    guaranteed efficiency of the pump alone (blank: the data
//	        sheet's at qg; none: efficiency not judged)
//
// The pump's tag gathers the sheets of one pump into its history in the
// site book:
//
//	tag     e.g. BS-3 P1 (free text)
//
// Energy per volume pumped (from the measured input, else the operating
// point), with an optional yearly cost:
//
//	hours   running hours per year, e.g. 3000 (a plain number)
//	tariff  energy tariff per kWh in any currency, e.g. 0.18
//
// The turbine side (with solve=ht):
//
//	etat    turbine-and-generator efficiency, e.g. 82%
//
// Surge on a fast closure at point 2 (a screening estimate: Korteweg's
// wave speed, Joukowsky's rise; with a pipe run or a line, and asked for
// by tc):
//
//	tc      the valve's closing time, e.g. 2s; slower than the wave's
//	        round trip 2L/a, the Joukowsky figure is only an upper bound
//	dv      the velocity stopped, e.g. 1.5m/s (blank: the whole flow
//	        velocity in the pipe at point 2)
//	wall    the pipe's wall thickness, e.g. 14.6mm, for every pipe of the
//	        line (blank: each from its size and schedule picked; needed
//	        where an inside diameter is typed)
//	epipe   the wall's elastic modulus, e.g. 1GPa, for every pipe (blank:
//	        each from its material, from memory)
//	kliq    the liquid's bulk modulus, e.g. 2.2GPa (blank: water from the
//	        IAPWS-IF97 speed of sound, seawater from Mackenzie's; another
//	        liquid needs it)
//	cr      the restraint factor c, a plain number (blank: 1, a pipe with
//	        expansion joints; 1 − ν² for one anchored throughout)
//	zv      a closed loop's closing valve's elevation, on the datum of zp
//	        (blank: at the pump's level); the static pressure at the valve
//	        is the loop's (pexp at zexp) carried by elevation, and a loop
//	        without pexp has no known static pressure for the peak
//
// Heating and cooling loops (loop.go, heat.go, valve.go):
//
//	loop    1 for a closed loop (the two points are one, at the pump's
//	        inlet: no static head; p1, z1, v1… are kept but unread), 0 or
//	        blank for a line between two points
//	pexp    the loop's static pressure where its expansion vessel or
//	        pressurisation unit connects (pexpref g or a), for NPSH, the
//	        valves' check and the liquid's pressure; zexp that
//	        connection's elevation, on the datum of zp
//	load    a heating or cooling load, e.g. 250kW, 850000Btu/h, 70TR: the
//	        flow is worked out from it (either q or load, group qby);
//	tsup    the supply and return temperatures; with q instead of load,
//	tret    the load the flow carries is shown
//	dpc     the drop of the circuit the control valves vary (blank: the
//	        rest of the line), for their authority
//	sal     seawater's absolute salinity in g/kg, 0–120 (blank: 35)
//
// A control valve's FL and xFz follow its Kv or Cv in sN.cmp:
// valve:kv40 fl0.9 xfz0.45.
//
// The link's integrity field (see CheckParam, Sign):
//
//	ck      written first by "Copy link": eight hex digits, the CRC-32 of
//	        the canonical query, a dot, one character per block of about
//	        four values (each value is in two blocks, by its name), a dot
//	        and the number of values, e.g. ck=1f0c22aa.Qx3d-kPbZ_0e.42. A
//	        link whose ck does not match what arrived (cut or altered on
//	        the way) is reported as damaged, naming the values whose both
//	        blocks fail and whether a value was lost; its sheet is
//	        unverified until the person confirms the values. Links signed
//	        with the eight hex digits alone (before the blocks) still read
//	        and find damage without naming values; links typed by hand may
//	        leave ck out. A first field whose name is one or two of the
//	        letters c and k, in either case ("k", "Ck"), with a
//	        value of ck's form is read as ck with its name altered in
//	        transit; a link whose first field is the extra ΣK k with such a
//	        value escapes its first character (k=%312345678), so that it
//	        reads back as k. A value holding a line break or another
//	        control character is kept verbatim and refused at its box.
//	keep    the values kept as typed though they look like slips (a
//	        gauge reading typed in Pa, a fraction in a percentage box, an
//	        accuracy finer than 0.1 %): their names, comma separated.
//	        A kept value that changes is judged again.
//
// A mail program's "&amp;" in place of "&" reads as "&".
//
// Sheets kept on a device are exported to a sheets file, one line per
// sheet (title, a tab, the link); see sheets.go.
//
// Every parameter is optional in the link; a computation that needs a
// missing one reports it by name ("t: enter the liquid temperature").
//
// Evaluate runs one evaluator per part of the result. Each reads its
// inputs through a gather (gather.go), which keeps what is missing or in
// error, and returns its result with the problems it found; Evaluate adds
// them to Result.Errors in one place, the first for a parameter kept.
package scenario
