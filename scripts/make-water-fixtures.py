#!/usr/bin/env python3
"""Reference values for the water formulations, written once to tests/fixtures/iapws-water.json.

Run only to regenerate the fixture (needs the iapws Python package, e.g. Debian's python3-iapws 1.5.x);
the tests read the committed JSON and never need Python.
  - saturation pressure: IAPWS-IF97 region 4 (iapws.iapws97._PSat_T)
  - saturated-liquid density: IAPWS-95 solved on the saturation curve (iapws.IAPWS95, x = 0); at and below
    100 °C the liquid at 0.101325 MPa (iapws.IAPWS95, P = 0.101325)
  - pKw: IAPWS R11-07 (Bandura & Lvov 2006) at that density (iapws._iapws._Kw)
  - relative permittivity: IAPWS R8-97 (Fernandez et al. 1997) at that density (iapws._iapws._Dielectric)
"""
import json
import iapws
from iapws.iapws95 import IAPWS95
from iapws.iapws97 import _PSat_T
from iapws._iapws import _Kw, _Dielectric

rows = []
for celsius in [0, 5, 10, 15, 20, 25, 30, 40, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 275, 300]:
    T = celsius + 273.15
    psat = _PSat_T(T)  # MPa
    if celsius < 100:  # 100 °C at 0.101325 MPa is already vapour (normal boiling point 99.97 °C)
        state = IAPWS95(T=T, P=0.101325)
        pressure = 0.101325
    else:
        state = IAPWS95(T=T, x=0)
        pressure = psat
    rho = state.rho  # kg/m3
    rows.append({
        "celsius": celsius,
        "pressureMPa": pressure,
        "saturationPressureMPa": psat,
        "densityKgM3": rho,
        "saturatedLiquidDensityKgM3": IAPWS95(T=T, x=0).rho if T >= 273.16 else None,  # below the triple point: none
        "pKw": _Kw(rho, T),
        "dielectric": _Dielectric(rho, T),
    })

fixture = {
    "source": "computed with the iapws Python package " + iapws.__version__ + " (scripts/make-water-fixtures.py)",
    "formulations": {
        "saturationPressureMPa": "IAPWS-IF97 region 4 saturation equation (Wagner et al. 2000)",
        "densityKgM3": "IAPWS-95 (Wagner & Pruss 2002): liquid at 0.101325 MPa below 100 °C, saturated liquid from 100 °C",
        "saturatedLiquidDensityKgM3": "IAPWS-95 saturated liquid",
        "pKw": "IAPWS R11-07 (Bandura & Lvov 2006) at the density of this row",
        "dielectric": "IAPWS R8-97 (Fernandez et al. 1997) at the density of this row",
    },
    "rows": rows,
}
with open("tests/fixtures/iapws-water.json", "w") as f:
    json.dump(fixture, f, indent=1)
    f.write("\n")
