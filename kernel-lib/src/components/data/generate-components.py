# Generates components.json (run: python3 generate-components.py, needs numpy; then format the JSON
# with prettier). The constants below are the author's recollections of the cited sources (see
# SOURCES); this script only converts Perry's scaled Aly-Lee coefficients, fits the group-additivity
# (Benson), group-contribution (Joback) and rigid-rotor harmonic-oscillator heat capacities to
# polynomials, and derives entropies where marked "derived-entropy". Not shipped with the library.
import os
import json, numpy as np

SOURCES = {
 "poling5": "Poling, B.E., Prausnitz, J.M., O'Connell, J.P. (2001), The Properties of Gases and Liquids, 5th ed., McGraw-Hill, Appendix A (from memory of the table; not re-checked against the printed book)",
 "rpp4": "Reid, R.C., Prausnitz, J.M., Poling, B.E. (1987), The Properties of Gases and Liquids, 4th ed., McGraw-Hill, Appendix A (from memory)",
 "poling5-cp": "Poling, Prausnitz & O'Connell (2001), The Properties of Gases and Liquids, 5th ed., Appendix A, ideal-gas cp/R polynomial (from memory)",
 "janaf": "Chase, M.W. Jr. (1998), NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data Monograph 9 (from memory)",
 "codata": "Cox, J.D., Wagman, D.D., Medvedev, V.A. (1989), CODATA Key Values for Thermodynamics, Hemisphere (from memory)",
 "webbook": "NIST Chemistry WebBook, NIST Standard Reference Database 69, gas-phase thermochemistry (from memory)",
 "gri30": "Smith, G.P. et al. (1999), GRI-Mech 3.0 thermodynamic data: NASA 7-coefficient polynomials (cp/R, two segments joined at 1000 K) fitted to JANAF and Burcat data (coefficients from memory)",
 "burcat": "Burcat, A., Ruscic, B. (2005), Third Millennium Ideal Gas and Condensed Phase Thermochemical Database, ANL-05/20 / TAE 960, NASA 7-coefficient polynomials (from memory)",
 "perry-aly-lee": "Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-156: ideal-gas heat capacities in the Aly-Lee (DIPPR 107) form, from the DIPPR 801 database (coefficients from memory)",
 "benson-fit": "Benson group additivity, cubic cp/R polynomial fitted by least squares (this project) to the group heat capacities at 300, 400, 500, 600, 800 and 1000 K of Benson, S.W. (1976), Thermochemical Kinetics, 2nd ed., Wiley, Table A.1 (group values from memory); expect about 1-2 % uncertainty; the fit is used from 298.15 K (Benson's lowest tabulated temperature is 300 K) to 1000 K. Not extended lower: the same fit for n-butane to n-decane reads 3-5 % below Perry's Aly-Lee correlations at 233 K and about 10 % below at 200 K",
 "joback": "Joback, K.G., Reid, R.C. (1987), Chem. Eng. Commun. 57, 233-243, group contributions for ideal-gas cp (group values from memory of Poling et al. 2001, Table 2-2); stated range 273-1000 K (not extended lower: for ethanol and n-butane the Joback cp reads 4-5 % below Perry's Aly-Lee correlations at 233 K); expect errors of a few per cent (about 4 % low for methylcyclohexane, within 1 % for the mercaptans at 298 K)",
 "no-formation": "not included: the author could not recall reliable values (NaN; use a zero-at reference state)",
 "rrho-linear": "rigid-rotor harmonic-oscillator ideal-gas cp of a linear molecule (7/2 R plus Planck-Einstein terms) from the fundamental wavenumbers (COS: 859, 520 x2, 2062 cm-1; CS2: 658, 397 x2, 1535 cm-1; from memory of Shimanouchi 1972, NSRDS-NBS 39), fitted by least squares (this project) to degree-5 polynomials on 200-600 K and 600-1500 K (fit error < 0.05 %); anharmonicity neglected (a few tenths of a per cent at 1000 K)",
 "derived-entropy": "derived from the enthalpy and Gibbs energy of formation: S = (Hf - Gf)/298.15 K + sum of the element entropies (CODATA 1989 key values); not an independent value",
 "janaf-fit-methane": "degree-6 cp/R polynomial fitted by least squares (this project) to the NIST-JANAF methane table (Chase 1998) at 200, 298.15 and 300-1500 K in 100 K steps (table values from memory; above 298 K they agree with a rigid-rotor harmonic-oscillator calculation from the four fundamental frequencies to 0.01 %); fit error below 0.08 %",
 "perry-aly-lee-propane": "Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-156 (DIPPR 107 / Aly-Lee form, from the DIPPR 801 database): propane C1 = 0.5192e5, C2 = 1.9245e5, C3 = 1.6265e3, C4 = 1.168e5, C5 = 723.6 (J/(kmol K) and K), 200-1500 K (coefficients from memory of the handbook; cp(298.15 K) = 73.47 J/(mol K) against 73.6 in the NIST WebBook, and within 1 % of the GRI-Mech 3.0 polynomial from 300 to 1500 K, which it replaces because that one starts at 300 K)",
 "rrho-low": "Rigid-rotor harmonic-oscillator cp fit (this project) below the first segment joint, the correlation cited next above it; below the joint, a cp/R polynomial fitted by least squares to the rigid-rotor harmonic-oscillator heat capacity from the molecular constants of idealgas/molecular/data/molecules.json (classical rotation, harmonic fundamentals), which for these rigid molecules is exact at these temperatures to well within 0.1 % (at 100 and 200 K it reproduces NIST-JANAF, e.g. CH4 33.258 and 33.473 J/(mol K), from memory of Chase 1998); fit error < 0.02 %; cp jump at the joint < 0.2 %. Ethylene and CO2 start at 90 K (ethylene 33.27, 35.35, 42.89 J/(mol K) at 100, 200, 298.15 K against 33.270, 35.359, 42.886 from memory of NIST-JANAF); ethylene's molecular cp is scaled smoothly between 200 and 298.15 K by up to 0.08 %, its difference to GRI-Mech 3.0 at the joint, so that cp joins without a step. Hydrogen sulfide starts at 90 K (33.26 J/(mol K) = 4 R at 90-120 K, the bending mode at 1183 cm-1 still frozen; 33.258 at 100 K from memory of NIST-JANAF), joined at 150 K to Perry's Aly-Lee correlation (0.09 % above the molecular cp from 90 to 150 K) by scaling the molecular cp smoothly between 100 and 150 K",
 "molecular-low": "Statistical-mechanics cp fit (this project) below the first segment joint, the correlation cited next above it: a cp/R polynomial fitted by least squares to the ideal-gas heat capacity from the molecular constants of idealgas/molecular/data/molecules.json (classical rotation, harmonic fundamentals, methyl torsions as hindered rotors with exact levels; the same model as idealGasFromMolecule), which is reliable at these temperatures because anharmonicity is negligible there and only the low-frequency modes count; fit error < 0.02 %. Ethane: 35.74, 42.34, 52.50 J/(mol K) at 100, 200, 298.15 K against 35.7, 42.3 and 52.49 from memory of the TRC tables / Chao, Wilhoit & Hall, J. Phys. Chem. Ref. Data 2 (1973) 427 (ideal-gas ethane); joined to GRI-Mech 3.0 at 298.15 K (jump < 0.01 %), which reads 0.5 % low at 200 K. Propane: joined to Perry's Aly-Lee correlation at 200 K, the molecular cp scaled smoothly between 150 and 200 K by up to 0.43 %, their difference at 200 K, so that cp joins without a step (the two routes differ by at most 0.85 % from 200 to 298.15 K, and the molecular value at 298.15 K, 73.59, is within 0.01 % of the NIST WebBook's 73.6, from memory). Propylene (one methyl top on a rigid frame; constants from memory, see molecules.json): 39.56, 50.56 J/(mol K) at 100, 200 K, joined at 250 K to the Poling et al. polynomial (which reads 2.6 % below the molecular cp at 90-100 K and within 0.1 % of it at 250-300 K), scaled smoothly between 200 and 250 K by at most their 0.05 % difference at the joint; the torsion's parameters (barrier 1.98-2.17 kcal/mol, torsion 174-188 cm-1 in the literature as recalled) move cp at 100 K by about 1.2 %, the uncertainty of this segment",
 "aly-lee-poly": "rewritten (this project) as cp/R polynomials on joint-300 K (joint 200 K for propane, 150 K for hydrogen sulfide), 300-600 and 600-1500 K, least squares through the correlation's values at the segment ends (no cp step at the joints), fit error < 0.02 %, so that the low-temperature segment can precede it",
 "nist-fluid": "NIST Chemistry WebBook fluid data (Lemmon, McLinden & Friend), critical point and boiling point (from memory)",
 "iapws95": "Wagner, W., Pruss, A. (2002), The IAPWS Formulation 1995 for the thermodynamic properties of ordinary water substance, J. Phys. Chem. Ref. Data 31, 387-535: critical point (Tc, Pc, rho_c = 322 kg/m3)",
}

def gri(lo, hi, mid=1000.0, low=None, high=None):
    return {"form": "polynomial", "minTemperatureK": lo, "maxTemperatureK": hi, "segments": [
        {"minTemperatureK": lo, "maxTemperatureK": mid, "coefficients": low},
        {"minTemperatureK": mid, "maxTemperatureK": hi, "coefficients": high}]}

def poly(lo, hi, a):
    return {"form": "polynomial", "minTemperatureK": lo, "maxTemperatureK": hi, "segments": [{"minTemperatureK": lo, "maxTemperatureK": hi, "coefficients": a}]}

def poling(lo, hi, a0, a1, a2, a3, a4):
    return poly(lo, hi, [a0, a1*1e-3, a2*1e-5, a3*1e-8, a4*1e-11])

def alylee(lo, hi, c1, c2, c3, c4, c5):
    # Perry's table: C1, C2, C4 in J/(kmol K) (printed x 1e-5), C3, C5 in K (C3 printed x 1e-3)
    return {"form": "aly-lee", "aJPerMolK": round(c1*100, 6), "bJPerMolK": round(c2*100, 6), "cK": round(c3*1000, 6),
            "dJPerMolK": round(c4*100, 6), "eK": c5, "minTemperatureK": lo, "maxTemperatureK": hi}

CONST = lambda: poly(50, 6000, [2.5])

# Benson (1976) Table A.1 group heat capacities, cal/(mol K) at 300, 400, 500, 600, 800, 1000 K
BT = [300, 400, 500, 600, 800, 1000]
BG = {
 "CH3": [6.19, 7.84, 9.40, 10.79, 13.02, 14.77],
 "CH2": [5.50, 6.95, 8.25, 9.35, 11.07, 12.34],
 "CH":  [4.54, 6.00, 7.17, 8.05, 9.31, 10.05],
 "C":   [4.37, 6.13, 7.36, 8.12, 8.77, 8.76],
 "CdH2": [5.10, 6.36, 7.51, 8.50, 10.07, 11.27],
 "CdCH": [4.16, 5.03, 5.81, 6.50, 7.65, 8.45],
 "CCdH2": [5.12, 6.86, 8.32, 9.49, 11.22, 12.48],
}
R = 8.314462618
# Joback & Reid (1987) ideal-gas cp group parameters a, b, c, d (J/(mol K), powers of T in K)
JG = {
 "CH3": (1.95e1, -8.08e-3, 1.53e-4, -9.67e-8),
 "CH2": (-9.09e-1, 9.50e-2, -5.44e-5, 1.19e-8),
 "rCH2": (-6.03, 8.54e-2, -8.00e-6, -1.80e-8),
 "rCH": (-2.05e1, 1.62e-1, -1.60e-4, 6.24e-8),
 "OH": (2.57e1, -6.91e-2, 1.77e-4, -9.88e-8),
 "NH2": (2.69e1, -4.12e-2, 1.64e-4, -9.76e-8),
 "SH": (3.53e1, -7.58e-2, 1.85e-4, -1.03e-7),
}
def joback(groups):
    a = sum(JG[g][0]*n for g, n in groups.items()) - 37.93
    b = sum(JG[g][1]*n for g, n in groups.items()) + 0.210
    c = sum(JG[g][2]*n for g, n in groups.items()) - 3.91e-4
    d = sum(JG[g][3]*n for g, n in groups.items()) + 2.06e-7
    return poly(273, 1000, [float("%.6e" % (v/R)) for v in (a, b, c, d)])

def rrho_linear(modes, lo=200, mid=600, hi=1500, deg=5):
    def cpr(T):
        cp = np.full_like(T, 3.5)
        for nu, g in modes:
            x = 1.438776877*nu/T
            cp += g*x*x*np.exp(x)/np.expm1(x)**2
        return cp
    segs = []
    for a, b in ((lo, mid), (mid, hi)):
        T = np.linspace(a, b, 81)
        c = np.polyfit(T, cpr(T), deg)
        c = [float("%.9e" % v) for v in c]
        err = np.max(np.abs(np.polyval(c, T)/cpr(T)-1))
        assert err < 5e-4, err
        segs.append({"minTemperatureK": a, "maxTemperatureK": b, "coefficients": c[::-1]})
    return {"form": "polynomial", "minTemperatureK": lo, "maxTemperatureK": hi, "segments": segs}

MOLECULES = {m["id"]: m for m in json.load(open(os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..", "idealgas", "molecular", "data", "molecules.json")))["molecules"]}

def hindered_rotor_levels(v0, fold, ired):
    """Levels (cm-1, from the ground level) of H = -B d2/dphi2 + V0/2 (1 - cos(n phi)) in the
    free-rotor basis exp(i m phi), the same variational treatment as
    idealgas/molecular/hinderedRotor.ts (basis: B M^2 > V0 + 50 kB 3000 K)."""
    b = 16.857629/ired
    M = int(np.ceil(np.sqrt((v0 + 50*0.6950348*3000)/b))) + 2*fold
    m = np.arange(-M, M+1)
    H = np.diag(b*m*m + v0/2.0)
    for i in range(len(m) - fold):
        H[i, i+fold] = H[i+fold, i] = -v0/4.0
    E = np.linalg.eigvalsh(H)
    return E - E[0]

def rrho_cpr(mol_id, T):
    """cp/R from the shipped molecular constants: classical rotation, harmonic fundamentals, and
    each listed internal rotor as a hindered rotor (exact levels, replacing its torsion). Valid where
    rotation is classical; electronic levels above 5000 cm-1 contribute nothing below 300 K and are
    ignored."""
    m = MOLECULES[mol_id]
    assert all(e["energyInvCm"] == 0 or e["energyInvCm"] > 5000 for e in m["electronicLevels"])
    cp = np.full_like(T, 3.5 if m["geometry"] == "linear" else 4.0)
    for v in m["vibrations"]:
        if "internalRotorIndex" in v:
            continue
        x = 1.438776877*v["wavenumberInvCm"]/T
        cp += v["degeneracy"]*x*x*np.exp(x)/np.expm1(x)**2
    for r in m["internalRotors"]:
        E = hindered_rotor_levels(r["barrierInvCm"], r["fold"], r["reducedMomentAmuA2"])
        x = 1.438776877*E[None, :]/T[:, None]
        w = np.exp(-x)
        q = w.sum(1)
        cp += (x*x*w).sum(1)/q - ((x*w).sum(1)/q)**2
    return cp

def fit_through_ends(T, y, d):
    """Least-squares polynomial of degree d in T (relative residuals) through (T[0], y[0]) and
    (T[-1], y[-1]) exactly, so that neighbouring segments fitted this way join without a cp step.
    Fitted in u = (T - mid)/half for conditioning, returned as ascending raw-power coefficients in
    T rounded to 10 significant digits."""
    m, h = (T[0] + T[-1])/2, (T[-1] - T[0])/2
    u = (T - m)/h
    A = np.vander(u, d + 1, increasing=True)/y[:, None]
    C = np.vander(np.array([-1.0, 1.0]), d + 1, increasing=True)
    K = np.block([[2*A.T @ A, C.T], [C, np.zeros((2, 2))]])
    rhs = np.concatenate([2*A.T @ np.ones_like(y), [y[0], y[-1]]])
    q = np.linalg.solve(K, rhs)[:d + 1]
    raw = np.polynomial.Polynomial(q)(np.polynomial.Polynomial([-m/h, 1/h])).coef
    return [float("%.9e" % v) for v in raw]

def alylee_cpr(c):
    A, B, Cc, D, E = c["aJPerMolK"], c["bJPerMolK"], c["cK"], c["dJPerMolK"], c["eK"]
    return lambda T: (A + B*((Cc/T)/np.sinh(Cc/T))**2 + D*((E/T)/np.cosh(E/T))**2)/R

def alylee_as_poly(c, joints=(300, 600), deg=5):
    """Aly-Lee correlation rewritten as cp/R polynomial segments (least squares, error < 2e-4), so
    that a low-temperature polynomial segment can be put in front of it."""
    A, B, Cc, D, E = c["aJPerMolK"], c["bJPerMolK"], c["cK"], c["dJPerMolK"], c["eK"]
    f = lambda T: (A + B*((Cc/T)/np.sinh(Cc/T))**2 + D*((E/T)/np.cosh(E/T))**2)/R
    edges = [c["minTemperatureK"], *joints, c["maxTemperatureK"]]
    segs = []
    for a, b in zip(edges[:-1], edges[1:]):
        T = np.linspace(a, b, 121)
        co = fit_through_ends(T, f(T), deg)
        err = np.max(np.abs(np.polyval(co[::-1], T)/f(T)-1))
        assert err < 2e-4, err
        segs.append({"minTemperatureK": a, "maxTemperatureK": b, "coefficients": co})
    return {"form": "polynomial", "minTemperatureK": edges[0], "maxTemperatureK": edges[-1], "segments": segs}

def with_rrho_low(cp, mol_id, lo, joint, deg=5, max_jump=2e-3, splits=(), blend=None, continuous=False):
    """Prepends low-temperature segments lo..joint (split at `splits`) fitted to the cp from the
    molecular constants (see SOURCES["rrho-low"], SOURCES["molecular-low"]); the correlation above
    starts at the joint. blend = (t0, f): between t0 and the joint the molecular cp/R is scaled by
    1 + w(T) (f(joint)/mol(joint) - 1), w = 3u^2 - 2u^3, u = (T - t0)/(joint - t0), f the correlation's
    cp/R (evaluated only at the joint, inside its range), so that cp joins without a step where the
    two differ by more than the fit error; the change never exceeds that difference.
    continuous=True: the low pieces go exactly through the target at their ends and the last one
    through the correlation's value at the joint (no cp step anywhere; fit_through_ends)."""
    target = lambda T: rrho_cpr(mol_id, T)
    if blend is not None:
        t0, f = blend
        ratio = f(np.array([float(joint)]))[0]/rrho_cpr(mol_id, np.array([float(joint)]))[0] - 1
        def target(T, t0=t0, ratio=ratio):
            u = np.clip((T - t0)/(joint - t0), 0, 1)
            return rrho_cpr(mol_id, T)*(1 + (3*u*u - 2*u**3)*ratio)
    # lowest degree (up to deg) that fits within 2e-4: raw-power polynomials of high degree on a
    # short interval cancel badly when integrated (cp/T) in double precision
    edges = [lo, *splits, joint]
    low = []
    segs = [dict(sg) for sg in cp["segments"] if sg["maxTemperatureK"] > joint]
    above_at_joint = np.polyval(segs[0]["coefficients"][::-1], joint)
    for a, b in zip(edges[:-1], edges[1:]):
        T = np.linspace(a, b, 81)
        y = target(T)
        if continuous and b == joint:
            y = y.copy()
            y[-1] = above_at_joint
        for d in range(1 if continuous else 0, deg + 1):
            if continuous:
                c = fit_through_ends(T, y, d)[::-1]
            else:
                c = np.polyfit(T, y, d)
                c = [float("%.9e" % v) for v in c]
            err = np.max(np.abs(np.polyval(c, T)/target(T)-1))
            if err < 2e-4:
                break
        assert err < 2e-4, (mol_id, a, b, err)
        low.append({"minTemperatureK": a, "maxTemperatureK": b, "coefficients": c[::-1]})
    segs[0]["minTemperatureK"] = joint
    above = np.polyval(segs[0]["coefficients"][::-1], joint)
    assert abs(above/np.polyval(c, joint)-1) < max_jump, (mol_id, above, np.polyval(c, joint))
    return {"form": "polynomial", "minTemperatureK": lo, "maxTemperatureK": cp["maxTemperatureK"],
            "segments": low + segs}

def benson(groups):
    cp = np.zeros(6)
    for g, n in groups.items():
        cp += n*np.array(BG[g])*4.184
    T = np.array(BT, float)
    c = np.polyfit(T, cp/R, 3)[::-1]
    return poly(298.15, 1000, [float("%.6e" % v) for v in c])

# id, name, formula, cas, synonyms, M g/mol, Tb K, Tc K, Pc bar, Vc cm3/mol, Zc, omega, Hf kJ/mol, Gf kJ/mol, S J/molK, cp, sources
C = []
def add(id, name, formula, cas, syn, M, Tb, Tc, Pc, Vc, Zc, w, Hf, Gf, S, cp, crit="poling5", tb=None, form="poling5", ent="webbook", cps="perry-aly-lee", note=None):
    d = {"id": id, "name": name, "formula": formula, "casNumber": cas, "synonyms": syn,
         "molarMassGPerMol": M, "normalBoilingPointK": Tb, "criticalTemperatureK": Tc, "criticalPressureBar": Pc,
         "criticalVolumeCm3PerMol": Vc, "criticalCompressibility": Zc, "acentricFactor": w,
         "enthalpyOfFormationKJPerMol": Hf, "gibbsEnergyOfFormationKJPerMol": Gf, "absoluteEntropyJPerMolK": S,
         "idealGasCp": cp,
         "sources": {"critical": crit, "boilingPoint": tb or crit, "formation": form, "entropy": ent, "heatCapacity": cps}}
    if note: d["note"] = note
    C.append(d)

# ---- permanent gases, acid gases, inorganics
add("hydrogen","Hydrogen","H2","1333-74-0",["H2"],2.016,20.28,33.19,13.13,64.1,0.305,-0.216,0,0,130.680,
    gri(200,3500,low=[2.34433112,7.98052075e-3,-1.94781510e-5,2.01572094e-8,-7.37611761e-12],high=[3.33727920,-4.94024731e-5,4.99456778e-7,-1.79566394e-10,2.00255376e-14]),form="janaf",ent="janaf",cps="gri30")
add("nitrogen","Nitrogen","N2","7727-37-9",["N2"],28.014,77.35,126.20,33.98,90.1,0.289,0.037,0,0,191.609,
    with_rrho_low(gri(200,6000,low=[3.53100528,-1.23660988e-4,-5.02999433e-7,2.43530612e-9,-1.40881235e-12],high=[2.95257637,1.39690040e-3,-4.92631603e-7,7.86010195e-11,-4.60755204e-15]),"nitrogen",90,200),form="janaf",ent="janaf",cps="rrho-low+burcat")
add("oxygen","Oxygen","O2","7782-44-7",["O2"],31.999,90.17,154.58,50.43,73.4,0.288,0.022,0,0,205.147,
    with_rrho_low(gri(200,3500,low=[3.78245636,-2.99673416e-3,9.84730201e-6,-9.68129509e-9,3.24372837e-12],high=[3.28253784,1.48308754e-3,-7.57966669e-7,2.09470555e-10,-2.16717794e-14]),"oxygen",90,200),form="janaf",ent="janaf",cps="rrho-low+gri30")
add("argon","Argon","Ar","7440-37-1",["Ar"],39.948,87.27,150.86,48.98,74.57,0.291,-0.002,0,0,154.845,CONST(),form="janaf",ent="janaf",cps="janaf")
add("helium","Helium","He","7440-59-7",["He","helium-4"],4.003,4.22,5.19,2.27,57.4,0.302,-0.390,0,0,126.152,CONST(),tb="nist-fluid",form="janaf",ent="janaf",cps="janaf")
add("neon","Neon","Ne","7440-01-9",["Ne"],20.180,27.10,44.49,26.79,41.87,0.303,-0.0387,0,0,146.327,CONST(),crit="nist-fluid",form="codata",ent="codata",cps="janaf")
add("krypton","Krypton","Kr","7439-90-9",["Kr"],83.798,119.73,209.48,55.25,92.17,0.292,-0.0009,0,0,164.084,CONST(),crit="nist-fluid",form="codata",ent="codata",cps="janaf")
add("xenon","Xenon","Xe","7440-63-3",["Xe"],131.293,165.05,289.73,58.42,119.0,0.289,0.0036,0,0,169.684,CONST(),crit="nist-fluid",form="codata",ent="codata",cps="janaf")
add("carbon-monoxide","Carbon monoxide","CO","630-08-0",["CO"],28.010,81.66,132.85,34.94,93.1,0.292,0.045,-110.527,-137.163,197.653,
    with_rrho_low(gri(200,3500,low=[3.57953347,-6.10353680e-4,1.01681433e-6,9.07005884e-10,-9.04424499e-13],high=[2.71518561,2.06252743e-3,-9.98825771e-7,2.30053008e-10,-2.03647716e-14]),"carbon-monoxide",90,200),form="janaf",ent="janaf",cps="rrho-low+gri30")
add("carbon-dioxide","Carbon dioxide","CO2","124-38-9",["CO2"],44.010,194.67,304.12,73.74,94.07,0.274,0.225,-393.522,-394.389,213.795,
    with_rrho_low(gri(200,3500,low=[2.35677352,8.98459677e-3,-7.12356269e-6,2.45919022e-9,-1.43699548e-13],high=[3.85746029,4.41437026e-3,-2.21481404e-6,5.23490188e-10,-4.72084164e-14]),"carbon-dioxide",90,200),form="janaf",ent="janaf",cps="rrho-low+gri30",
    note="CO2 has no liquid at 1 atm: the 'normal boiling point' is the normal sublimation point")
add("water","Water","H2O","7732-18-5",["H2O","steam"],18.015,373.12,647.096,220.64,55.95,0.229,0.3443,-241.826,-228.582,188.834,
    gri(200,3500,low=[4.19864056,-2.03643410e-3,6.52040211e-6,-5.48797062e-9,1.77197817e-12],high=[3.03399249,2.17691804e-3,-1.64072518e-7,-9.70419870e-11,1.68200992e-14]),crit="iapws95",tb="poling5",form="janaf",ent="janaf",cps="gri30")
add("hydrogen-sulfide","Hydrogen sulfide","H2S","7783-06-4",["H2S","sour gas"],34.082,212.84,373.4,89.63,98.6,0.284,0.090,-20.6,-33.4,205.81,
    with_rrho_low(alylee_as_poly(alylee(100,1500,0.33288,0.26086,0.9134,-0.17979,949.4)),"hydrogen-sulfide",90,150,continuous=True,
                  blend=(100, alylee_cpr(alylee(100,1500,0.33288,0.26086,0.9134,-0.17979,949.4)))),form="codata",ent="codata",cps="rrho-low+perry-aly-lee+aly-lee-poly")
add("sulfur-dioxide","Sulfur dioxide","O2S","7446-09-5",["SO2"],64.065,263.13,430.80,78.84,122.2,0.269,0.245,-296.81,-300.09,248.223,
    with_rrho_low(gri(200,6000,low=[3.26653380,5.32379020e-3,6.84375520e-7,-5.28100470e-9,2.55904540e-12],high=[5.24513640,1.97042040e-3,-8.03757690e-7,1.51499690e-10,-1.05580040e-14]),"sulfur-dioxide",100,273.15),form="codata",ent="codata",cps="rrho-low+burcat")
add("carbonyl-sulfide","Carbonyl sulfide","COS","463-58-1",["COS","carbon oxysulfide"],60.075,223.0,378.8,63.49,137.0,0.276,0.097,-142.09,-169.2,231.57,
    rrho_linear([(859,1),(520,2),(2062,1)]),form="janaf",ent="janaf",cps="rrho-linear")
add("carbon-disulfide","Carbon disulfide","CS2","75-15-0",["CS2"],76.141,319.37,552.0,79.0,160.0,0.275,0.109,116.94,66.9,237.98,
    rrho_linear([(658,1),(397,2),(1535,1)]),form="janaf",ent="janaf",cps="rrho-linear")
add("methyl-mercaptan","Methyl mercaptan","CH4S","74-93-1",["methanethiol","MeSH"],48.107,279.11,469.95,72.30,145.0,0.268,0.153,-22.9,-9.3,255.2,
    joback({"CH3":1,"SH":1}),cps="joback")
add("ethyl-mercaptan","Ethyl mercaptan","C2H6S","75-08-1",["ethanethiol","EtSH"],62.134,308.15,499.15,54.90,207.0,0.274,0.191,-46.1,-4.8,296.2,
    joback({"CH3":1,"CH2":1,"SH":1}),cps="joback")
add("ammonia","Ammonia","H3N","7664-41-7",["NH3"],17.031,239.82,405.40,113.53,72.47,0.244,0.257,-45.898,-16.367,192.774,
    gri(200,6000,low=[4.28602740,-4.66052300e-3,2.17185130e-5,-2.28088870e-8,8.26380460e-12],high=[2.63445210,5.66625600e-3,-1.72786760e-6,2.38671610e-10,-1.25787860e-14]),form="janaf",ent="janaf",cps="gri30")
add("nitric-oxide","Nitric oxide","NO","10102-43-9",["NO","nitrogen monoxide"],30.006,121.38,180.0,64.80,58.0,0.251,0.583,90.291,86.600,210.758,
    gri(200,6000,low=[4.21847630,-4.63897600e-3,1.10410220e-5,-9.33613540e-9,2.80357700e-12],high=[3.26060560,1.19110430e-3,-4.29170480e-7,6.94576690e-11,-4.03360990e-15]),form="janaf",ent="janaf",cps="gri30")
add("nitrous-oxide","Nitrous oxide","N2O","10024-97-2",["N2O","dinitrogen monoxide"],44.013,184.67,309.57,72.45,97.4,0.274,0.162,82.05,104.18,219.957,
    gri(200,6000,low=[2.25715020,1.13047280e-2,-1.36713190e-5,9.68198060e-9,-2.93071820e-12],high=[4.82307290,2.62702510e-3,-9.58508740e-7,1.60007120e-10,-9.77523030e-15]),form="janaf",ent="janaf",cps="gri30")
add("hydrogen-cyanide","Hydrogen cyanide","CHN","74-90-8",["HCN"],27.026,298.85,456.65,53.90,139.0,0.197,0.410,135.143,124.7,201.828,
    gri(200,6000,low=[2.25898860,1.00511700e-2,-1.33517630e-5,1.00923490e-8,-3.00890280e-12],high=[3.80223920,3.14642280e-3,-1.06321850e-6,1.66197570e-10,-9.79975700e-15]),form="janaf",ent="janaf",cps="gri30")
add("hydrogen-chloride","Hydrogen chloride","ClH","7647-01-0",["HCl"],36.461,188.15,324.65,83.09,81.0,0.249,0.131,-92.312,-95.300,186.902,
    alylee(50,1500,0.29157,0.09048,2.0938,-0.00107,120),form="janaf",ent="janaf")
add("chlorine","Chlorine","Cl2","7782-50-5",["Cl2"],70.906,239.12,416.9,79.91,123.8,0.285,0.069,0,0,223.081,
    alylee(50,1500,0.29142,0.09176,0.949,0.1003,425),form="codata",ent="codata")

# ---- n-alkanes
add("methane","Methane","CH4","74-82-8",["C1","CH4"],16.043,111.66,190.56,45.99,98.6,0.286,0.011,-74.873,-50.768,186.251,
    with_rrho_low(poly(200,1500,[5.46363337,-0.0184728187,7.41265412e-05,-1.06820644e-07,8.15639829e-11,-3.25587649e-14,5.33044089e-18]),"methane",90,300),form="janaf",ent="janaf",cps="rrho-low+janaf-fit-methane")
add("ethane","Ethane","C2H6","74-84-0",["C2"],30.070,184.55,305.32,48.72,145.5,0.279,0.099,-83.82,-31.86,229.2,
    with_rrho_low(gri(200,3500,low=[4.29142492,-5.50154270e-3,5.99438288e-5,-7.08466285e-8,2.68685771e-11],high=[1.07188150,2.16852677e-2,-1.00256067e-5,2.21412001e-9,-1.90002890e-13]),"ethane",90,298.15,splits=(180,),continuous=True),cps="molecular-low+gri30")
add("propane","Propane","C3H8","74-98-6",["C3"],44.097,231.02,369.83,42.48,200.0,0.276,0.152,-104.68,-24.29,270.3,
    with_rrho_low(alylee_as_poly(alylee(200,1500,0.5192,1.9245,1.6265,1.168,723.6)),"propane",90,200,splits=(150,),
                  blend=(150, alylee_cpr(alylee(200,1500,0.5192,1.9245,1.6265,1.168,723.6))),continuous=True),cps="molecular-low+perry-aly-lee-propane+aly-lee-poly")
add("n-butane","n-Butane","C4H10","106-97-8",["butane","nC4","n-C4"],58.123,272.66,425.12,37.96,255.0,0.274,0.200,-125.79,-16.57,310.0,
    alylee(200,1500,0.7134,2.43,1.63,1.5033,730.42))
add("isobutane","Isobutane","C4H10","75-28-5",["2-methylpropane","iC4","i-C4","i-butane"],58.123,261.34,407.85,36.40,262.7,0.278,0.186,-134.99,-21.44,295.4,
    alylee(200,1500,0.6549,2.4776,1.587,1.575,-706.99))
add("n-pentane","n-Pentane","C5H12","109-66-0",["pentane","nC5","n-C5"],72.150,309.22,469.70,33.70,311.0,0.270,0.252,-146.76,-8.81,349.0,
    alylee(200,1500,0.8805,3.011,1.6502,1.892,747.6))
add("isopentane","Isopentane","C5H12","78-78-4",["2-methylbutane","iC5","i-C5","i-pentane"],72.150,300.99,460.40,33.80,306.0,0.270,0.229,-153.7,-14.05,343.7,
    alylee(200,1500,0.7460,3.265,1.545,1.923,666.7))
add("neopentane","Neopentane","C5H12","463-82-1",["2,2-dimethylpropane","neo-C5"],72.150,282.65,433.80,31.96,307.0,0.272,0.196,-168.1,-17.2,306.0,
    benson({"CH3":4,"C":1}),cps="benson-fit")
add("n-hexane","n-Hexane","C6H14","110-54-3",["hexane","nC6","n-C6"],86.177,341.88,507.60,30.25,368.0,0.266,0.300,-166.92,0.15,388.8,
    alylee(200,1500,1.0440,3.523,1.6946,2.369,761.6))
add("2-methylpentane","2-Methylpentane","C6H14","107-83-5",["isohexane"],86.177,333.41,497.70,30.40,367.0,0.270,0.278,-174.3,-5.3,380.5,
    benson({"CH3":3,"CH2":2,"CH":1}),cps="benson-fit")
add("3-methylpentane","3-Methylpentane","C6H14","96-14-0",[],86.177,336.42,504.60,31.20,367.0,0.273,0.272,-171.6,-2.1,379.8,
    benson({"CH3":3,"CH2":2,"CH":1}),cps="benson-fit")
add("2,2-dimethylbutane","2,2-Dimethylbutane","C6H14","75-83-2",["neohexane"],86.177,322.88,488.70,30.80,359.0,0.272,0.233,-185.6,-9.6,358.2,
    benson({"CH3":4,"CH2":1,"C":1}),cps="benson-fit")
add("2,3-dimethylbutane","2,3-Dimethylbutane","C6H14","79-29-8",["diisopropyl"],86.177,331.13,500.00,31.30,358.0,0.270,0.248,-178.1,-3.1,None,
    benson({"CH3":4,"CH":2}),cps="benson-fit",ent="derived-entropy")
add("n-heptane","n-Heptane","C7H16","142-82-5",["heptane","nC7","n-C7"],100.204,371.58,540.20,27.40,428.0,0.261,0.350,-187.8,8.00,427.9,
    alylee(200,1500,1.2015,4.001,1.6766,2.74,756.4))
add("n-octane","n-Octane","C8H18","111-65-9",["octane","nC8","n-C8"],114.231,398.83,568.70,24.90,492.0,0.256,0.399,-208.75,16.0,467.1,
    alylee(200,1500,1.3554,4.431,1.6356,3.054,746.4))
add("n-nonane","n-Nonane","C9H20","111-84-2",["nonane","nC9","n-C9"],128.258,423.97,594.60,22.90,555.0,0.257,0.445,-228.74,24.83,None,
    alylee(200,1500,1.5175,4.915,1.6448,3.47,749.6),ent="derived-entropy")
add("n-decane","n-Decane","C10H22","124-18-5",["decane","nC10","n-C10"],142.285,447.30,617.70,21.10,624.0,0.256,0.490,-249.46,33.32,None,
    alylee(200,1500,1.672,5.353,1.6141,3.782,742.0),ent="derived-entropy")
add("n-undecane","n-Undecane","C11H24","1120-21-4",["undecane","nC11","n-C11"],156.312,469.08,639.00,19.50,689.0,0.253,0.535,-270.3,41.6,None,
    benson({"CH3":2,"CH2":9}),cps="benson-fit",ent="derived-entropy")
add("n-dodecane","n-Dodecane","C12H26","112-40-3",["dodecane","nC12","n-C12"],170.338,489.47,658.00,18.20,754.0,0.251,0.576,-289.66,49.73,None,
    alylee(200,1500,2.1295,6.633,1.7155,4.5161,777.5),ent="derived-entropy")
add("n-hexadecane","n-Hexadecane","C16H34","544-76-3",["hexadecane","cetane","nC16","n-C16"],226.446,560.01,723.00,14.00,969.0,0.226,0.717,-374.17,82.15,None,
    benson({"CH3":2,"CH2":14}),cps="benson-fit",ent="derived-entropy")

# ---- olefins, diolefins, acetylene
add("ethylene","Ethylene","C2H4","74-85-1",["ethene","C2="],28.054,169.42,282.34,50.41,131.1,0.281,0.087,52.467,68.421,219.330,
    with_rrho_low(gri(200,3500,low=[3.95920148,-7.57052247e-3,5.70990292e-5,-6.91588753e-8,2.69884373e-11],high=[2.03611116,1.46454151e-2,-6.71077915e-6,1.47222923e-9,-1.25706061e-13]),"ethylene",90,298.15,splits=(180,),continuous=True,
                  blend=(200, lambda T: np.polyval([2.69884373e-11,-6.91588753e-8,5.70990292e-5,-7.57052247e-3,3.95920148], T))),form="janaf",ent="janaf",cps="rrho-low+gri30")
add("propylene","Propylene","C3H6","115-07-1",["propene","C3="],42.081,225.46,364.90,46.00,181.0,0.274,0.142,20.23,62.72,267.0,
    with_rrho_low(poling(50,1000,3.834,3.893,4.688,-6.013,2.283),"propylene",50,250,splits=(150,),continuous=True,
                  blend=(200, lambda T: np.polyval([2.283e-11,-6.013e-8,4.688e-5,3.893e-3,3.834], T))),cps="molecular-low+poling5-cp",crit="rpp4",tb="poling5")
add("1-butene","1-Butene","C4H8","106-98-9",["but-1-ene","1-C4="],56.108,266.92,419.50,40.20,239.3,0.277,0.194,-0.54,70.37,307.86,
    poling(50,1000,4.389,7.984,6.143,-8.197,3.165),cps="poling5-cp")
add("isobutene","Isobutene","C4H8","115-11-7",["isobutylene","2-methylpropene","i-C4="],56.108,266.25,417.90,40.00,238.9,0.275,0.189,-16.9,58.1,293.6,
    poling(50,1000,3.231,20.949,2.313,-3.988,1.454),cps="poling5-cp")
add("1-pentene","1-Pentene","C5H10","109-67-1",["pent-1-ene"],70.134,303.11,464.80,35.60,298.4,0.275,0.237,-21.28,79.1,None,
    benson({"CdH2":1,"CdCH":1,"CCdH2":1,"CH2":1,"CH3":1}),cps="benson-fit",ent="derived-entropy")
add("1-hexene","1-Hexene","C6H12","592-41-6",["hex-1-ene"],84.161,336.63,504.00,32.10,348.0,0.267,0.281,-41.7,87.4,None,
    benson({"CdH2":1,"CdCH":1,"CCdH2":1,"CH2":2,"CH3":1}),cps="benson-fit",ent="derived-entropy")
add("1,3-butadiene","1,3-Butadiene","C4H6","106-99-0",["butadiene","buta-1,3-diene"],54.092,268.62,425.17,42.77,221.0,0.267,0.195,109.24,149.73,278.7,
    poling(50,1000,3.607,5.085,8.253,-12.371,5.321),cps="poling5-cp")
add("acetylene","Acetylene","C2H2","74-86-2",["ethyne"],26.038,188.40,308.30,61.14,112.7,0.271,0.189,227.400,209.88,200.958,
    gri(200,3500,low=[8.08681094e-1,2.33615629e-2,-3.55171815e-5,2.80152437e-8,-8.50072974e-12],high=[4.14756964,5.96166664e-3,-2.37294852e-6,4.67412171e-10,-3.61235213e-14]),form="janaf",ent="janaf",cps="gri30",
    note="acetylene sublimes at 1 atm: the 'normal boiling point' is the normal sublimation point")

# ---- naphthenes
add("cyclopentane","Cyclopentane","C5H10","287-92-3",[],70.134,322.38,511.70,45.10,260.0,0.276,0.196,-77.1,38.6,292.9,
    poling(100,1000,5.019,-19.734,17.917,-21.696,8.215),cps="poling5-cp")
add("cyclohexane","Cyclohexane","C6H12","110-82-7",[],84.161,353.93,553.50,40.73,308.0,0.273,0.211,-123.14,31.76,297.3,
    poling(100,1000,4.035,-4.433,16.834,-20.775,7.746),cps="poling5-cp")

add("methylcyclohexane","Methylcyclohexane","C7H14","108-87-2",["MCH"],98.188,374.09,572.10,34.80,368.0,0.269,0.236,-154.7,27.3,343.3,
    joback({"CH3":1,"rCH2":5,"rCH":1}),cps="joback")

# ---- aromatics
add("benzene","Benzene","C6H6","71-43-2",[],78.114,353.24,562.05,48.95,256.0,0.268,0.210,82.88,129.75,269.2,
    alylee(200,1500,0.44767,2.3085,1.4792,1.6836,677.66))
add("toluene","Toluene","C7H8","108-88-3",["methylbenzene"],92.141,383.79,591.75,41.08,316.0,0.264,0.264,50.17,122.2,320.7,
    alylee(200,1500,0.5814,2.863,1.4406,1.898,650.43))
add("ethylbenzene","Ethylbenzene","C8H10","100-41-4",[],106.167,409.36,617.15,36.09,374.0,0.263,0.304,29.92,130.73,360.6,
    alylee(200,1500,0.7844,3.399,1.559,2.426,702.0))
add("o-xylene","o-Xylene","C8H10","95-47-6",["1,2-dimethylbenzene","ortho-xylene"],106.167,417.59,630.30,37.32,370.0,0.263,0.312,19.08,122.2,353.6,
    alylee(200,1500,0.8521,3.2954,1.4944,2.115,675.8))
add("m-xylene","m-Xylene","C8H10","108-38-3",["1,3-dimethylbenzene","meta-xylene"],106.167,412.34,617.00,35.41,375.0,0.259,0.327,17.32,119.0,357.7,
    alylee(200,1500,0.7568,3.3924,1.496,2.247,675.1))
add("p-xylene","p-Xylene","C8H10","106-42-3",["1,4-dimethylbenzene","para-xylene"],106.167,411.53,616.20,35.11,378.0,0.259,0.322,18.03,121.2,352.4,
    alylee(200,1500,0.7512,3.397,1.4928,2.247,675.1))

# ---- amines
add("monoethanolamine","Monoethanolamine","C2H7NO","141-43-5",["MEA","ethanolamine","2-aminoethanol"],61.084,443.5,678.20,71.24,225.0,0.284,0.447,None,None,None,
    joback({"CH2":2,"OH":1,"NH2":1}),cps="joback",form="no-formation",ent="no-formation",
    note="MEA decomposes below its critical point: Tc, Pc, Vc are estimates")

# ---- oxygenates
add("methanol","Methanol","CH4O","67-56-1",["methyl alcohol","MeOH"],32.042,337.69,512.64,80.97,118.0,0.224,0.565,-200.94,-162.24,239.9,
    gri(200,3500,low=[5.71539582,-1.52309129e-2,6.52441155e-5,-7.10806889e-8,2.61352698e-11],high=[1.78970791,1.40938292e-2,-6.36500835e-6,1.38171085e-9,-1.17060220e-13]),cps="gri30")
add("ethanol","Ethanol","C2H6O","64-17-5",["ethyl alcohol","EtOH"],46.069,351.39,513.92,61.48,167.0,0.240,0.649,-234.95,-167.73,280.6,
    alylee(200,1500,0.492,1.4577,1.6628,0.939,744.7))
add("acetone","Acetone","C3H6O","67-64-1",["propanone","2-propanone","dimethyl ketone"],58.080,329.22,508.20,47.01,209.0,0.233,0.307,-217.57,-153.05,295.3,
    alylee(200,1500,0.5704,1.632,1.607,0.968,731.5))

import re
EL = {"C": 5.74, "H": 65.34, "O": 102.576, "N": 95.8045, "S": 32.054, "Cl": 111.5405}
for c in C:
    if c["sources"]["heatCapacity"] == "joback":
        c["warnings"] = [{"code": "accuracy", "message": c["id"] + ": ideal-gas cp from Joback group contributions, typically a few per cent off (about 4 % low for methylcyclohexane at 298 K); check against measured data for design work."}]
    if c["sources"]["formation"] == "no-formation":
        c.setdefault("warnings", []).append({"code": "model-limitation", "message": c["id"] + ": no enthalpy of formation or absolute entropy in the table; only a zero-at reference state works for it."})
    if c["absoluteEntropyJPerMolK"] is None and c["enthalpyOfFormationKJPerMol"] is not None:
        sel = sum(EL[e]*(int(n) if n else 1) for e, n in re.findall(r"([A-Z][a-z]?)(\d*)", c["formula"]))
        c["absoluteEntropyJPerMolK"] = round((c["enthalpyOfFormationKJPerMol"]-c["gibbsEnergyOfFormationKJPerMol"])*1000/298.15 + sel, 2)
out = {
  "description": "Pure-component constants for isochor: critical constants, acentric factor, normal boiling point, ideal-gas formation properties at 298.15 K and 1 bar, and ideal-gas heat-capacity correlations. Units are in the field names; the loader converts to SI. Every value was written from the author's memory of the cited source (no copy of the sources was at hand); tests/unit/components check internal consistency (Gf = Hf - T(S - sum S_elements), Zc = Pc Vc/(R Tc)) and compare heat capacities with independently remembered table values.",
  "elementEntropiesJPerMolK": {"_source": "codata", "C": 5.74, "H": 65.34, "O": 102.576, "N": 95.8045, "S": 32.054, "Cl": 111.5405, "Ar": 154.846, "He": 126.153, "Ne": 146.328, "Kr": 164.085, "Xe": 169.685},
  "sources": SOURCES,
  "components": C,
}
json.dump(out, open(os.path.join(os.path.dirname(os.path.abspath(__file__)), "components.json"), "w"), indent=1)
print(len(C))
