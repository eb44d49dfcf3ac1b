#!/usr/bin/python3
"""Golden table of TEOS-10 seawater properties over the whole ocean under an ice shell, for the
DescentOps.Physics Seawater tests: Absolute Salinity 0-42 g/kg (fresh water included), sea pressure
0-10000 dbar (100 MPa), in-situ temperature from the air-free freezing point to 40 degC.

Run with Debian's interpreter, where the package python3-gsw installs:

    /usr/bin/python3 tools/golden/make_teos10_tables.py shared/reference

Columns: Absolute Salinity, sea pressure, in-situ ITS-90 temperature; then Conservative Temperature
(gsw.CT_from_t), potential temperature (gsw.pt0_from_t), density and sound speed from the full Gibbs
function (gsw.rho_t_exact, gsw.sound_speed_t_exact), density and sound speed from the 75-term polynomial
at that Conservative Temperature (gsw.rho, gsw.sound_speed), and the air-free freezing temperature in situ
and as Conservative Temperature (gsw.t_freezing, gsw.CT_freezing with saturation fraction 0).
The first temperature of every (S_A, p) pair is the freezing point itself.
"""
import sys

import gsw

from golden_csv import provenance, target_folder, write

GENERATOR = "tools/golden/make_teos10_tables.py"
SALINITIES = (0.0, 0.5, 5.0, 10.0, 20.0, 30.0, 34.0, 35.16504, 38.0, 42.0)
PRESSURES_DBAR = (0.0, 10.0, 500.0, 1000.0, 2000.0, 2420.0, 3000.0, 4000.0, 5000.0, 6000.0, 7000.0, 8000.0, 9000.0, 10000.0)
TEMPERATURES_C = (-10.0, -8.0, -6.0, -4.0, -2.0, -1.0, 0.0, 1.0, 2.0, 4.0, 10.0, 20.0, 30.0, 40.0)
ABOVE_FREEZING_K = (0.01, 0.5)


def rows():
    out = []
    for sa in SALINITIES:
        for p in PRESSURES_DBAR:
            tf = float(gsw.t_freezing(sa, p, 0.0))
            ctf = float(gsw.CT_freezing(sa, p, 0.0))
            temperatures = [tf] + [tf + d for d in ABOVE_FREEZING_K] + [t for t in TEMPERATURES_C if t > tf + 0.5]
            for t in temperatures:
                ct = float(gsw.CT_from_t(sa, t, p))
                out.append((sa, p, t, ct, float(gsw.pt0_from_t(sa, t, p)),
                            float(gsw.rho_t_exact(sa, t, p)), float(gsw.sound_speed_t_exact(sa, t, p)),
                            float(gsw.rho(sa, ct, p)), float(gsw.sound_speed(sa, ct, p)), tf, ctf))
    return out


def main():
    write(target_folder(sys.argv) / "teos10-seawater-full-range.csv",
          ["# TEOS-10 seawater, S_A 0-42 g/kg, 0-10000 dbar, freezing point to 40 degC (t is ITS-90, p is sea pressure)",
           "# exact: gsw.CT_from_t, gsw.pt0_from_t, gsw.rho_t_exact, gsw.sound_speed_t_exact; 75-term: gsw.rho, gsw.sound_speed at CT;",
           "# freezing: gsw.t_freezing and gsw.CT_freezing, air-free (saturation fraction 0)",
           *provenance(GENERATOR, f"gsw {gsw.__version__} (Debian package python3-gsw)")],
          ["absolute_salinity_g_per_kg", "sea_pressure_dbar", "temperature_degC", "conservative_temperature_degC",
           "potential_temperature_degC", "density_exact_kg_per_m3", "sound_speed_exact_m_per_s",
           "density_75term_kg_per_m3", "sound_speed_75term_m_per_s", "freezing_temperature_degC",
           "freezing_conservative_temperature_degC"],
          rows())


if __name__ == "__main__":
    main()
