#!/usr/bin/python3
"""Reference properties of water and dry air for the fluid-library tests.

Writes tests/reference/fixtures/properties.json from Debian's python3-iapws:
  * water: IAPWS-95 (Wagner & Pruss 2002) with the IAPWS 2008 viscosity and IAPWS 2011
    thermal-conductivity releases, liquid states 1..150 degC at 1, 3, 10 and 20 bar(a)
    (states at or above saturation are skipped);
  * saturation line of water (IAPWS-95): pressure and enthalpy of vaporisation, 1..150 degC;
  * dry air: iapws.humidAir.Air, the Lemmon, Jacobsen, Penoncello & Friend (2000) equation of
    state with the Lemmon & Jacobsen (2004) viscosity and conductivity, -40..400 degC at
    1, 5, 10, 25 and 50 bar(a) (the library's declared range; -20..300 degC, 1..25 bar is the
    range the product promises).
Run:  /usr/bin/python3 tests/reference/generate_properties.py   (from the repo root)
"""
import json
import os
import subprocess

import iapws
from iapws import IAPWS95
from iapws.humidAir import Air


def debian_version(pkg):
    try:
        return subprocess.run(["dpkg-query", "-W", "-f=${Version}", pkg],
                              capture_output=True, text=True, check=True).stdout
    except (OSError, subprocess.CalledProcessError):
        return None


def water_states():
    rows = []
    for p_bar in (1.0, 3.0, 10.0, 20.0):
        t_sat = IAPWS95(P=p_bar / 10, x=0).T - 273.15
        for t in list(range(1, 151, 7)) + [150]:
            if t >= t_sat - 0.5:
                continue
            s = IAPWS95(T=t + 273.15, P=p_bar / 10)
            rows.append({"temp_C": t, "pressure_Pa": p_bar * 1e5, "density": s.rho,
                         "specificHeat": s.cp * 1e3, "viscosity": s.mu, "conductivity": s.k})
    return rows


def saturation_line():
    rows = []
    for t in (1, 10, 20, 30, 40, 50, 60, 80, 100, 120, 150):
        liq = IAPWS95(T=t + 273.15, x=0)
        vap = IAPWS95(T=t + 273.15, x=1)
        rows.append({"temp_C": t, "pressure_Pa": liq.P * 1e6,
                     "latentHeat": (vap.h - liq.h) * 1e3})
    return rows


def air_states():
    rows = []
    for p_bar in (1.0, 5.0, 10.0, 25.0, 50.0):
        for t in (-40, -20, 0, 20, 40, 60, 80, 100, 150, 200, 250, 300, 350, 400):
            s = Air(T=t + 273.15, P=p_bar / 10)
            rows.append({"temp_C": t, "pressure_Pa": p_bar * 1e5, "density": s.rho,
                         "specificHeat": s.cp * 1e3, "viscosity": s.mu, "conductivity": s.k})
    return rows


def main():
    out = {
        "generator": "tests/reference/generate_properties.py",
        "library": "iapws (python3-iapws)",
        "libraryVersion": iapws.__version__,
        "debianPackageVersion": debian_version("python3-iapws"),
        "units": {"temp_C": "degC", "pressure_Pa": "Pa (absolute)", "density": "kg/m3",
                  "specificHeat": "J/(kg K)", "viscosity": "Pa s",
                  "conductivity": "W/(m K)", "latentHeat": "J/kg"},
        "water": {"model": "IAPWS-95 + IAPWS 2008 viscosity + IAPWS 2011 conductivity",
                  "states": water_states()},
        "waterSaturation": {"model": "IAPWS-95 saturation", "states": saturation_line()},
        "air": {"model": "Lemmon et al. 2000 EOS + Lemmon & Jacobsen 2004 transport",
                "states": air_states()},
    }
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "fixtures", "properties.json")
    with open(path, "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")
    print(f"wrote {path}: {len(out['water']['states'])} water, {len(out['air']['states'])} air states")


if __name__ == "__main__":
    main()
