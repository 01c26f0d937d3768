#!/usr/bin/env python3
"""Reference values from Debian's python3-fluids (Caleb Bell, "fluids") for the thermal engine tests.

Run with the Debian interpreter:  /usr/bin/python3 tests/reference/generate_fluids_lib.py
Writes tests/reference/fixtures/fluids-lib.json.
"""
import json
import os
import platform

import fluids
from fluids.friction import Colebrook
from fluids.piping import nearest_pipe, t_from_gauge

INCH = 0.0254

res = [2.5e3, 4e3, 1e4, 3e4, 1e5, 3e5, 1e6, 1e7, 1e8]
rel_roughnesses = [0.0, 1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 5e-2]
colebrook = [
    {"re": re, "relRoughness": eD, "fd": Colebrook(re, eD)}
    for re in res
    for eD in rel_roughnesses
]

bwg = [{"gauge": g, "wall_m": t_from_gauge(g, SI=True, schedule="BWG")} for g in range(10, 23)]

pipes = []
for nps in [2, 3, 4, 5, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24]:
    n, di, do, t = nearest_pipe(NPS=nps, schedule="STD")
    pipes.append({"nps": n, "schedule": "STD", "outerDiameter_m": do, "innerDiameter_m": di, "wall_m": t})

out = {
    "source": "python3-fluids (Debian package), Caleb Bell, fluids: Fluid dynamics component of Chemical Engineering Design Library (ChEDL)",
    "library": "fluids",
    "version": fluids.__version__,
    "python": platform.python_version(),
    "colebrook": colebrook,
    "bwg": bwg,
    "pipesStd": pipes,
}

here = os.path.dirname(os.path.abspath(__file__))
with open(os.path.join(here, "fixtures", "fluids-lib.json"), "w") as fh:
    json.dump(out, fh, indent=1)
    fh.write("\n")
