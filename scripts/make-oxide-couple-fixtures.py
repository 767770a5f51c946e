#!/usr/bin/env python3
"""Metal/oxide and oxide/oxide standard potentials at 25–300 °C from an independent compilation, written once to
tests/reference/fixtures/high-temperature/oxide-couples.json.

Run only to regenerate the fixture (needs the iapws Python package, e.g. Debian's python3-iapws 1.5.x);
the tests read the committed JSON and never need Python.

E°(ox/red) vs SHE at T is −ΔrG°(T)/(nF) of  ox + (n/2) H2(g) → red + w H2O(l), both electrodes at T:
  - solids and H2(g): the seven-coefficient polynomials of McBride, Gordon & Reno 1993 (NASA TM-4513), lower
    interval (200/300–1000 K), H and S of each species on the 298.15 K enthalpy-of-formation scale:
      H/RT = a1 + a2 T/2 + a3 T²/3 + a4 T³/4 + a5 T⁴/5 + a6/T
      S/R  = a1 ln T + a2 T + a3 T²/2 + a4 T³/3 + a5 T⁴/4 + a7
    (Fe3O4's interval starts at 300 K: at 298.15 K it is extrapolated by 1.85 K.)
  - liquid water: ΔfH° = −285.830 kJ/mol and S° = 69.95 J/(mol·K) at 298.15 K (CODATA 1989, Cox, Wagman &
    Medvedev), with H(T) − H(298.15 K) and S(T) − S(298.15 K) from IAPWS-95 (Wagner & Pruss 2002): liquid at
    0.101325 MPa below 100 °C, saturated liquid from 100 °C (the pressures the engine's temperature range uses).
  - chromium and eskolaite: the nine-coefficient polynomials of McBride, Zehe & Gordon 2002 (NASA TP-2002-211556;
    Cr from Chase 1998, Cr2O3 from Gurvich 1982, as that database cites), in pieces split at their magnetic
    transitions (Cr 311.5 K; Cr2O3 306, 310 and 335 K):
      H/RT = −a1 T⁻² + a2 ln T / T + a3 + a4 T/2 + a5 T²/3 + a6 T³/4 + a7 T⁴/5 + b1/T
      S/R  = −a1 T⁻²/2 − a2/T + a3 ln T + a4 T + a5 T²/2 + a6 T³/3 + a7 T⁴/4 + b2
  - solids are taken at 1 bar at every temperature (the pressure term V·ΔP is below 1 mV at 86 bar).
"""
import json
import math
import iapws
from iapws.iapws95 import IAPWS95

R = 8.314462618  # J/(mol·K), CODATA 2018
F = 96485.33212  # C/mol
M_WATER = 18.015268e-3  # kg/mol, IAPWS-95

# McBride, Gordon & Reno 1993 (NASA TM-4513), lower temperature interval: a1..a7
NASA7 = {
    "Fe(s)": [2.41337476, -1.57780744e-03, 2.14701339e-05, -3.80171438e-08, 2.20426984e-11, -774.380998, -10.6560296],
    "Fe3O4(s)": [36.198148, -0.17437976, 5.2475673e-04, -5.4238219e-07, 1.7996202e-10, -1.413873e05, -155.56683],
    "Fe2O3(s)": [-7.7037843, 0.13647471, -3.2905655e-04, 3.8150478e-07, -1.6310285e-10, -1.0080076e05, 25.292085],
    "Cu(s)": [1.76672074, 7.34699432e-03, -1.5471296e-05, 1.50539591e-08, -5.24861335e-12, -743.882087, -7.70454044],
    "Cu2O(s)": [3.3832466, 0.022954176, -3.9542304e-05, 3.4020401e-08, -1.1043809e-11, -2.2273157e04, -13.530713],
    "CuO(s)": [0.88403866, 0.024158852, -4.3894142e-05, 3.7586181e-08, -1.2088275e-11, -1.9788382e04, -5.472388],
    "H2(g)": [2.34433112, 7.98052075e-03, -1.9478151e-05, 2.01572094e-08, -7.37611761e-12, -917.935173, 0.683010238],
}

# McBride, Zehe & Gordon 2002 (NASA TP-2002-211556): (T low, T high, a1..a7, b1, b2) per piece
NASA9 = {
    "Cr(s)": [
        (200.0, 311.5, [8.051084050e5, -1.339842819e4, 8.273507290e1, -2.075857041e-1, 2.008764131e-4, 0, 0],
         [6.182357950e4, -4.559971660e2]),
        (311.5, 1000.0, [-2.534425357e5, 3.119404093e3, -1.358439770e1, 4.323570220e-2, -5.624102820e-5,
                         3.652910710e-8, -8.973298370e-12], [-1.606559079e4, 7.858043710e1]),
    ],
    "Cr2O3(s)": [
        (200.0, 306.0, [-2.112979833e6, 0, 2.207431906e2, -1.164973854, 1.853971249e-3, 0, 0],
         [-1.746831159e5, -9.949025210e2]),
        (306.0, 310.0, [0, 0, 6.705915562e3, -4.303760534e1, 6.919229155e-2, 0, 0], [-8.349875160e5, -2.844167579e4]),
        (310.0, 335.0, [0, 0, 2.443570337e2, -1.399445548, 2.113509996e-3, 0, 0], [-1.665032895e5, -1.059172219e3]),
        (335.0, 2705.0, [-3.415474875e5, 0, 1.616932327e1, -1.517828471e-3, 1.014852348e-6, 0, 0],
         [-1.430478214e5, -8.374919535e1]),
    ],
}

# ox + h H2(g) -> products (with water), n electrons
COUPLES = [
    ("Fe3O4(s)", "Fe(s)", {"Fe3O4(s)": 1, "H2(g)": 4}, {"Fe(s)": 3, "H2O(l)": 4}, 8),
    ("Fe2O3(s)", "Fe3O4(s)", {"Fe2O3(s)": 3, "H2(g)": 1}, {"Fe3O4(s)": 2, "H2O(l)": 1}, 2),
    ("Cu2O(s)", "Cu(s)", {"Cu2O(s)": 1, "H2(g)": 1}, {"Cu(s)": 2, "H2O(l)": 1}, 2),
    ("CuO(s)", "Cu2O(s)", {"CuO(s)": 2, "H2(g)": 1}, {"Cu2O(s)": 1, "H2O(l)": 1}, 2),
    ("Cr2O3(s)", "Cr(s)", {"Cr2O3(s)": 1, "H2(g)": 3}, {"Cr(s)": 2, "H2O(l)": 3}, 6),
]


def nasa_gibbs(a, T):
    """G = H − TS, J/mol, on the enthalpy-of-formation scale."""
    H = R * T * (a[0] + a[1] * T / 2 + a[2] * T**2 / 3 + a[3] * T**3 / 4 + a[4] * T**4 / 5 + a[5] / T)
    S = R * (a[0] * math.log(T) + a[1] * T + a[2] * T**2 / 2 + a[3] * T**3 / 3 + a[4] * T**4 / 4 + a[6])
    return H - T * S


def nasa9_gibbs(pieces, T):
    """G = H − TS, J/mol, from the piece whose interval holds T."""
    low, high, a, b = next(p for p in pieces if p[0] <= T <= p[1])
    H = R * T * (-a[0] / T**2 + a[1] * math.log(T) / T + a[2] + a[3] * T / 2 + a[4] * T**2 / 3 + a[5] * T**3 / 4
                 + a[6] * T**4 / 5 + b[0] / T)
    S = R * (-a[0] / T**2 / 2 - a[1] / T + a[2] * math.log(T) + a[3] * T + a[4] * T**2 / 2 + a[5] * T**3 / 3
             + a[6] * T**4 / 4 + b[1])
    return H - T * S


WATER_REF = IAPWS95(T=298.15, P=0.101325)


def water_gibbs(celsius):
    T = celsius + 273.15
    state = IAPWS95(T=T, P=0.101325) if celsius < 100 else IAPWS95(T=T, x=0)
    dH = (state.h - WATER_REF.h) * 1000 * M_WATER  # kJ/kg -> J/mol
    dS = (state.s - WATER_REF.s) * 1000 * M_WATER
    return -285830.0 + dH - T * (69.95 + dS)


def gibbs(name, celsius):
    if name == "H2O(l)":
        return water_gibbs(celsius)
    if name in NASA9:
        return nasa9_gibbs(NASA9[name], celsius + 273.15)
    return nasa_gibbs(NASA7[name], celsius + 273.15)


WATER = "IAPWS-95 (Wagner & Pruss 2002) with CODATA 1989 for water (scripts/make-oxide-couple-fixtures.py, iapws " + iapws.__version__ + ")"
SOURCE = "computed from McBride, Gordon & Reno 1993 (NASA TM-4513) polynomials for the solids and H2, " + WATER
SOURCE_CR = ("computed from McBride, Zehe & Gordon 2002 (NASA TP-2002-211556) polynomials for Cr and Cr2O3, "
             "McBride, Gordon & Reno 1993 for H2, " + WATER)

checks = []
for ox, red, reactants, products, n in COUPLES:
    for celsius in [25, 100, 150, 200, 250, 300]:
        dG = sum(v * gibbs(s, celsius) for s, v in products.items()) - sum(
            v * gibbs(s, celsius) for s, v in reactants.items()
        )
        checks.append({
            "id": f"E°({ox.removesuffix('(s)')}/{red.removesuffix('(s)')}) at {celsius} °C",
            "inputs": {"oxidized": ox, "reduced": red, "celsius": celsius},
            "value": round(-dG / (n * F), 5),
            "tolerance": 0.03,
            "unit": "V",
            "source": SOURCE_CR if ox in NASA9 else SOURCE,
        })

fixture = {
    "about": (
        "E°(ox/red), V vs SHE at temperature, of the iron, copper and chromium oxide couples from a compilation independent "
        "of the records (NASA polynomials for the solids and hydrogen, IAPWS-95 for water). The absolute values "
        "carry the 25 °C difference between the two compilations (up to 25 mV, CuO/Cu2O); the test checks them "
        "within the tolerance and the change from 25 °C within 5 mV."
    ),
    "checks": checks,
}
with open("tests/reference/fixtures/high-temperature/oxide-couples.json", "w") as f:
    json.dump(fixture, f, indent=1, ensure_ascii=False)
    f.write("\n")
