#!/usr/bin/python3
"""Golden table of seawater density, sound speed and freezing temperature from TEOS-10 (GSW), over the
states the vehicles meet under an ice shell, for the Ocean model tests.

Run with Debian's interpreter, where the package python3-gsw installs:

    /usr/bin/python3 tools/golden/make_seawater_tables.py shared/reference

Inputs are practical salinity S_P (the DescentOps models take PSS-78 salinity), in-situ ITS-90
temperature and sea pressure. Absolute Salinity is taken as S_A = S_P * 35.16504/35, the
reference-composition ratio, with no regional anomaly. States colder than the TEOS-10 freezing
point of air-free water are left out: they are not ocean states.
"""
import sys

import gsw

from golden_csv import provenance, target_folder, write

GENERATOR = "tools/golden/make_seawater_tables.py"
SALINITIES = (0.0, 5.0, 10.0, 20.0, 30.0, 34.0, 35.0, 36.0, 40.0)
TEMPERATURES_C = (-2.0, -1.5, -1.0, 0.0, 1.0, 2.0, 4.0, 6.0, 8.0, 10.0)
PRESSURES_DBAR = (0.0, 500.0, 1000.0, 2000.0, 3000.0, 4000.0)


def rows():
    out = []
    for sp in SALINITIES:
        sa = sp * 35.16504 / 35.0
        for p in PRESSURES_DBAR:
            tf = float(gsw.t_freezing(sa, p, 0.0))
            for t in TEMPERATURES_C:
                if t < tf:
                    continue
                out.append((sp, sa, t, p,
                            float(gsw.rho_t_exact(sa, t, p)),
                            float(gsw.sound_speed_t_exact(sa, t, p)),
                            tf))
    return out


def main():
    write(target_folder(sys.argv) / "seawater-density-sound-speed.csv",
          ["# TEOS-10 in-situ density (gsw.rho_t_exact), sound speed (gsw.sound_speed_t_exact) and air-free freezing",
           "# temperature (gsw.t_freezing) at S_A = S_P*35.16504/35; t is ITS-90; states below freezing omitted",
           *provenance(GENERATOR, f"gsw {gsw.__version__} (Debian package python3-gsw)")],
          ["practical_salinity", "absolute_salinity_g_per_kg", "temperature_its90_degC", "sea_pressure_dbar",
           "density_kg_per_m3", "sound_speed_m_per_s", "freezing_temperature_degC"],
          rows())


if __name__ == "__main__":
    main()
