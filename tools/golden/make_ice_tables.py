#!/usr/bin/python3
"""Writes golden tables of ice Ih properties, the melting and sublimation curves and the
seawater freezing point, computed by independent outside libraries, for the physics tests.

Run with Debian's interpreter (the packages python3-iapws and python3-gsw install there):

    /usr/bin/python3 tools/golden/make_ice_tables.py shared/reference

Each CSV starts with '#' comment lines naming the generator, library and version and this command.
"""
import sys
import warnings

import gsw
import iapws
from iapws._iapws import _Ice, _Melting_Pressure, _Sublimation_Pressure

from golden_csv import provenance, target_folder, write

GENERATOR = "tools/golden/make_ice_tables.py"
TRIPLE_T_K = 273.16
IH_III_T_K = 251.165


def header(what, library, version):
    return [f"# {what}", *provenance(GENERATOR, f"{library} {version} (Debian package)")]


def ice_rows():
    # Temperatures 70-273 K, pressures 0.1-200 MPa; states where ice Ih is not stable
    # (above the melting curve) are left out because the library flags them as metastable.
    temperatures = [70 + 5 * i for i in range(40)] + [271.0, 272.0, 273.0, 273.15]
    pressures_mpa = [0.101325, 1, 5, 10, 25, 50, 75, 100, 150, 200]
    rows = []
    for t in temperatures:
        for p in pressures_mpa:
            with warnings.catch_warnings():
                warnings.simplefilter("error")
                try:
                    st = _Ice(t, p)
                except (Warning, NotImplementedError):
                    continue
            rows.append((t, p * 1e6, st["rho"], st["cp"] * 1e3, st["h"] * 1e3, st["s"] * 1e3, st["alfav"]))
    return rows


def melting_rows():
    n = 88
    rows = []
    for i in range(n + 1):
        t = IH_III_T_K + (TRIPLE_T_K - IH_III_T_K) * i / n
        rows.append((t, _Melting_Pressure(t) * 1e6))
    return rows


def sublimation_rows():
    temps = [70 + i for i in range(204)] + [TRIPLE_T_K]
    return [(t, _Sublimation_Pressure(t) * 1e6) for t in temps]


def freezing_rows():
    # Practical salinity is turned into Absolute Salinity with the standard-seawater ratio only.
    rows = []
    for sp in (4, 5, 10, 20, 30, 35, 40):
        for p_dbar in (0, 100, 250, 500):
            sa = sp * 35.16504 / 35.0
            tf = gsw.t_freezing(sa, p_dbar, 0.0)
            rows.append((sp, p_dbar, tf))
    return rows


def main():
    out = target_folder(sys.argv)
    write(out / "ice-ih-properties.csv",
          header("Ice Ih from the IAPWS R10-06 Gibbs function; rows only where the library accepts the state as stable ice Ih",
                 "iapws", iapws.__version__),
          ["temperature_K", "pressure_Pa", "density_kg_per_m3", "cp_J_per_kgK", "enthalpy_J_per_kg", "entropy_J_per_kgK", "expansion_per_K"],
          ice_rows())
    write(out / "ice-melting-curve.csv",
          header("Ice Ih melting pressure, IAPWS R14-08, 251.165-273.16 K", "iapws", iapws.__version__),
          ["temperature_K", "melting_pressure_Pa"], melting_rows())
    write(out / "ice-sublimation-curve.csv",
          header("Ice Ih sublimation pressure, IAPWS R14-08, 70-273.16 K", "iapws", iapws.__version__),
          ["temperature_K", "sublimation_pressure_Pa"], sublimation_rows())
    write(out / "seawater-freezing-point.csv",
          header("Freezing temperature of air-free seawater, TEOS-10 (gsw.t_freezing), SA = SP*35.16504/35", "gsw", gsw.__version__),
          ["practical_salinity", "sea_pressure_dbar", "freezing_temperature_degC"], freezing_rows())


if __name__ == "__main__":
    main()
