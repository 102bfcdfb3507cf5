"""Reference data read straight from the `chemicals` package's data files, for cross-checks.

`chemicals` (Caleb Bell, ChEDL) ships the CRC Handbook table "Thermodynamic properties of aqueous
ions" and the Laliberte (2009) electrolyte parameters as data files but (in 1.5) no function that
reads them; these helpers read them and evaluate Laliberte's published density model.
"""

from __future__ import annotations

import csv
import math
import os

import chemicals

_BASE = os.path.join(os.path.dirname(chemicals.__file__), "Electrolytes")


def crc_ion(formula: str) -> dict[str, float | None]:
    """CRC aqueous-ion row: Hf [J/mol], S [J/(mol K)], Cp [J/(mol K)] (None where blank)."""
    path = os.path.join(_BASE, "CRC Thermodynamic Properties of Aqueous Ions.tsv")
    with open(path, newline="", encoding="utf-8") as f:
        for row in csv.DictReader(f, delimiter="\t"):
            if row["Formula"] == formula:
                def num(key):
                    return float(row[key]) if row[key].strip() else None
                return {"Hf": num("Hf(aq)"), "S": num("S(aq)"), "Cp": num("Cp(aq)")}
    raise KeyError(formula)


def laliberte_density(name: str, w: float, t_c: float = 20.0) -> float:
    """Solution density [kg/m3] by Laliberte and Cooper (2004) / Laliberte (2009).

    rho = 1 / (w_w / rho_w + w / rho_app),
    rho_app = (c0 w + c1) exp(1e-6 (t + c4)^2) / (w + c2 + c3 t), t in degC,
    rho_w from the water equation the model was fitted with (Kell 1975 form).
    """
    path = os.path.join(_BASE, "Laliberte2009.tsv")
    with open(path, newline="", encoding="utf-8") as f:
        reader = csv.reader(f, delimiter="\t")
        next(reader)
        for row in reader:
            if row[0] == name:
                c0, c1, c2, c3, c4 = (float(row[i]) for i in range(4, 9))
                break
        else:
            raise KeyError(name)
    t = t_c
    rho_w = (((((-2.8054253e-10 * t + 1.0556302e-7) * t - 4.6170461e-5) * t - 0.0079870401) * t
              + 16.945176) * t + 999.83952) / (1 + 0.01687985 * t)
    rho_app = (c0 * w + c1) * math.exp(1e-6 * (t + c4) ** 2) / (w + c2 + c3 * t)
    return 1.0 / ((1.0 - w) / rho_w + w / rho_app)
