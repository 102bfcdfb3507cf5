"""Physical constants, each defined once here and named with its source.

Every module that needs one imports it from here; see ``docs/references.md`` for the sources.
"""

from __future__ import annotations

#: Molar gas constant [J/(mol K)], exact in the SI since 2019: CODATA 2018 (Tiesinga, Mohr, Newell
#: & Taylor 2021, Rev. Mod. Phys. 93, 025010).
R = 8.314462618

#: Molar mass of water [kg/mol]: 18.015268 g/mol, the value of the IAPWS-95 formulation (Wagner &
#: Pruss 2002, J. Phys. Chem. Ref. Data 31, 387), which the water properties here come from; the
#: IUPAC 2021 standard atomic weights give 18.015 g/mol.
WATER_MOLAR_MASS = 0.018015268
