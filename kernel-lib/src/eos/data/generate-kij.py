# Generates kij.json (run: python3 generate-kij.py; then format the JSON with prettier). The values
# below are the author's recollections of the cited compilations (no copy of them was at hand),
# rounded to two decimals; the script only writes one record per pair and family with the full
# source text, so that the source strings stay consistent. Not shipped with the library.
# Hydrocarbon/hydrocarbon (alkane/alkane) pairs are NOT listed: interactionTable.ts predicts them
# from the table's critical volumes with the method under "predictions" (computed in code).
import os, json

PR, SRK = "peng-robinson", "soave-redlich-kwong"

SRC = {
 "knapp-pr": "from memory of the Peng-Robinson k_ij tables of Knapp, Doering, Oellrich, Ploecker & Prausnitz, Vapor-Liquid Equilibria for Mixtures of Low Boiling Substances, DECHEMA Chemistry Data Series Vol. VI (1982), as reproduced in textbook compilations of N2, CO2 and H2S with paraffins; rounded to 0.01, recall uncertain by about +-{u}",
 "knapp-srk": "from memory of the Soave-Redlich-Kwong k_ij tables of Knapp et al., DECHEMA Chemistry Data Series Vol. VI (1982) and of Graboski & Daubert, Ind. Eng. Chem. Process Des. Dev. 17 (1978) 443-448 (CO2, H2S and N2 with paraffins); rounded to 0.01, recall uncertain by about +-{u}",
 "srk-as-pr": "from memory: the Soave-Redlich-Kwong tables (Knapp et al., DECHEMA Vol. VI 1982; Graboski & Daubert 1978) give values within about 0.02 of the Peng-Robinson ones for this kind of pair; the Peng-Robinson value recalled from Knapp et al. 1982 is used; uncertain by about +-{u}",
 "interp-pr": "interpolated (this project) between the neighbouring n-alkanes' Peng-Robinson values recalled from Knapp et al., DECHEMA Vol. VI (1982); no value for this pair recalled; uncertain by about +-{u}",
 "interp-srk": "interpolated (this project) between the neighbouring n-alkanes' values recalled from the Soave-Redlich-Kwong tables (Knapp et al. 1982; Graboski & Daubert 1978); no value for this pair recalled; uncertain by about +-{u}",
 "sw": "from memory of Soreide & Whitson, Fluid Phase Equilib. 77 (1992) 217-240, k_ij of the non-aqueous (gas or hydrocarbon-liquid) phase for Peng-Robinson with their modified water alpha function (e.g. methane 0.4850, nitrogen 0.4778, CO2 0.1896, H2S 0.1903); rounded to 0.01; with the standard alpha of water expect somewhat different best values; describes the water content of the gas, NOT the gas solubility in water (one k_ij cannot do both with van der Waals mixing); uncertain by about +-{u}",
 "water-heavy-pr": "common practice, rounded: about 0.5 for water with the heavier n-alkanes in the hydrocarbon phase (from memory of Peng & Robinson's two- and three-phase calculations with water, Can. J. Chem. Eng. 54 (1976) 595-599, and of the trend of Soreide & Whitson 1992); describes the hydrocarbon phase only; uncertain by about +-{u}",
 "water-srk": "common practice, no specific Soave-Redlich-Kwong source recalled: the Peng-Robinson value ({pr}) reused, as both equations need k_ij of about 0.5 (0.2 for CO2 and H2S) with water for the water content of the gas phase; describes the non-aqueous phase only; uncertain by about +-{u}",
}

def rec(a, b, fam, k, key, u, **kw):
    return {"components": [a, b], "family": fam, "kij": k, "source": SRC[key].format(u=u, **kw)}

P = []
# ---- non-hydrocarbon pairs (PR, SRK): value, uncertainty
P += [rec("nitrogen", "carbon-dioxide", PR, -0.02, "knapp-pr", 0.01), rec("nitrogen", "carbon-dioxide", SRK, -0.02, "srk-as-pr", 0.02)]
P += [rec("nitrogen", "hydrogen-sulfide", PR, 0.17, "knapp-pr", 0.02), rec("nitrogen", "hydrogen-sulfide", SRK, 0.17, "srk-as-pr", 0.03)]
P += [rec("carbon-dioxide", "hydrogen-sulfide", PR, 0.10, "knapp-pr", 0.01), rec("carbon-dioxide", "hydrogen-sulfide", SRK, 0.10, "knapp-srk", 0.01)]

# ---- N2, CO2, H2S with the paraffins: (PR, PR source key, SRK, SRK source key, uncertainty)
HC = ["methane", "ethane", "propane", "isobutane", "n-butane", "isopentane", "n-pentane",
      "n-hexane", "n-heptane", "n-octane", "n-nonane", "n-decane"]
N2 = {
 "methane":   (0.03, "knapp-pr", 0.03, "knapp-srk", 0.01),
 "ethane":    (0.05, "knapp-pr", 0.05, "srk-as-pr", 0.02),
 "propane":   (0.09, "knapp-pr", 0.09, "srk-as-pr", 0.02),
 "isobutane": (0.10, "knapp-pr", 0.10, "srk-as-pr", 0.02),
 "n-butane":  (0.08, "knapp-pr", 0.08, "srk-as-pr", 0.02),
 "isopentane":(0.09, "knapp-pr", 0.09, "srk-as-pr", 0.03),
 "n-pentane": (0.10, "knapp-pr", 0.10, "srk-as-pr", 0.03),
 "n-hexane":  (0.15, "knapp-pr", 0.15, "srk-as-pr", 0.03),
 "n-heptane": (0.14, "knapp-pr", 0.14, "srk-as-pr", 0.03),
 "n-octane":  (0.13, "interp-pr", 0.13, "interp-srk", 0.04),
 "n-nonane":  (0.12, "interp-pr", 0.12, "interp-srk", 0.04),
 "n-decane":  (0.11, "knapp-pr", 0.11, "srk-as-pr", 0.04),
}
CO2 = {
 "methane":   (0.10, "knapp-pr", 0.09, "knapp-srk", 0.01),
 "ethane":    (0.13, "knapp-pr", 0.13, "knapp-srk", 0.01),
 "propane":   (0.13, "knapp-pr", 0.13, "knapp-srk", 0.01),
 "isobutane": (0.12, "knapp-pr", 0.13, "knapp-srk", 0.02),
 "n-butane":  (0.13, "knapp-pr", 0.13, "knapp-srk", 0.02),
 "isopentane":(0.12, "knapp-pr", 0.13, "knapp-srk", 0.02),
 "n-pentane": (0.12, "knapp-pr", 0.13, "knapp-srk", 0.02),
 "n-hexane":  (0.11, "knapp-pr", 0.12, "knapp-srk", 0.02),
 "n-heptane": (0.10, "knapp-pr", 0.12, "knapp-srk", 0.02),
 "n-octane":  (0.10, "interp-pr", 0.12, "interp-srk", 0.03),
 "n-nonane":  (0.11, "interp-pr", 0.12, "interp-srk", 0.03),
 "n-decane":  (0.11, "knapp-pr", 0.12, "knapp-srk", 0.02),
}
H2S = {
 "methane":   (0.08, "knapp-pr", 0.08, "knapp-srk", 0.01),
 "ethane":    (0.08, "knapp-pr", 0.08, "srk-as-pr", 0.02),
 "propane":   (0.08, "knapp-pr", 0.08, "srk-as-pr", 0.02),
 "isobutane": (0.05, "knapp-pr", 0.05, "srk-as-pr", 0.02),
 "n-butane":  (0.06, "knapp-pr", 0.06, "srk-as-pr", 0.02),
 "isopentane":(0.06, "knapp-pr", 0.06, "srk-as-pr", 0.03),
 "n-pentane": (0.06, "knapp-pr", 0.06, "srk-as-pr", 0.03),
 "n-hexane":  (0.06, "interp-pr", 0.06, "interp-srk", 0.03),
 "n-heptane": (0.06, "interp-pr", 0.06, "interp-srk", 0.03),
 "n-octane":  (0.06, "interp-pr", 0.06, "interp-srk", 0.03),
 "n-nonane":  (0.06, "interp-pr", 0.06, "interp-srk", 0.03),
 "n-decane":  (0.06, "interp-pr", 0.06, "interp-srk", 0.03),
}
for gas, tab in (("nitrogen", N2), ("carbon-dioxide", CO2), ("hydrogen-sulfide", H2S)):
    for hc in HC:
        pr, kpr, srk, ksrk, u = tab[hc]
        if (gas, hc) in (("nitrogen", "methane"), ("carbon-dioxide", "methane"), ("hydrogen-sulfide", "methane")):
            a, b = hc, gas  # keep the order of the earlier table
        else:
            a, b = gas, hc
        P.append(rec(a, b, PR, pr, kpr, u))
        P.append(rec(a, b, SRK, srk, ksrk, u))

# ---- water: the non-aqueous phase (gas water content), Soreide & Whitson (1992) for PR
WATER = {
 "methane": (0.48, "sw", 0.03), "ethane": (0.49, "sw", 0.03), "propane": (0.55, "sw", 0.03),
 "isobutane": (0.51, "sw", 0.03), "n-butane": (0.51, "sw", 0.03),
 "nitrogen": (0.48, "sw", 0.03), "carbon-dioxide": (0.19, "sw", 0.03), "hydrogen-sulfide": (0.19, "sw", 0.03),
}
for hc in ["isopentane", "n-pentane", "n-hexane", "n-heptane", "n-octane", "n-nonane", "n-decane"]:
    WATER[hc] = (0.50, "water-heavy-pr", 0.05)
for other in ["nitrogen", "carbon-dioxide", "hydrogen-sulfide"] + HC:
    k, key, u = WATER[other]
    P.append(rec(other, "water", PR, k, key, u))
    P.append(rec(other, "water", SRK, k, "water-srk", u + 0.02, pr=k))

out = {
 "description": "Binary interaction parameters k_ij of the van der Waals one-fluid rule a_ij = sqrt(a_i a_j) (1 - k_ij), by equation-of-state family. Symmetric: k_ij = k_ji. Pairs listed under 'pairs' are read as given; unlisted pairs that a rule under 'predictions' covers are predicted in code (eos/interaction/interactionTable.ts) and every result lists them as predicted; all other pairs default to 0 and every result says which pairs were defaulted. Edit this file (or kernel-lib/src/eos/data/generate-kij.py) or pass a kij matrix to override. Not covered (defaulted): hydrogen with everything (no value recalled; the alkane prediction is not meant for a quantum gas), olefins, aromatics and the other table components.",
 "caution": "The values below are recalled from compilations, rounded to two decimals, with the uncertainty of the recollection stated per pair, and meant as starting values; fit k_ij to the plant's own VLE data before a design decision. Water pairs describe the water content of the gas or hydrocarbon liquid, not the solubility of gases in water.",
 "predictions": [
  {
   "method": "chueh-prausnitz",
   "families": [PR, SRK],
   "appliesTo": "alkane/alkane",
   "exponent": 1,
   "source": "predicted by the Chueh-Prausnitz critical-volume correlation k_ij = 1 - (2 (Vc_i Vc_j)^(1/6) / (Vc_i^(1/3) + Vc_j^(1/3)))^n (Chueh & Prausnitz, AIChE J. 13 (1967) 1099-1107) with n = 1 and the table's critical volumes; the original n = 3 belongs to the paper's Redlich-Kwong T_cij rule and gives values about three times larger. n = 1 was chosen (this project) because it puts methane/ethane at 0.002, methane/propane at 0.007 and methane/n-decane at 0.045, inside the ranges of Peng-Robinson values fitted to VLE data that the author recalls (about 0 to 0.01, 0 to 0.02 and 0.03 to 0.06; from memory of Knapp et al., DECHEMA Vol. VI 1982). Meant for alkane/alkane pairs (methane to n-decane, branched included); uncertain by about +-0.02"
  }
 ],
 "pairs": P,
}
json.dump(out, open(os.path.join(os.path.dirname(os.path.abspath(__file__)), "kij.json"), "w"), indent=1)
print(len(P))
