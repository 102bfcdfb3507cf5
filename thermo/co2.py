"""Carbon dioxide states: fixed points, saturation, phase, and what a closed vessel holds.

Properties come from the Span & Wagner (1996) reference equation of state through CoolProp.
Span, R.; Wagner, W. (1996) "A New Equation of State for Carbon Dioxide Covering the Fluid Region
from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa", J. Phys. Chem. Ref. Data
25, 1509-1596.
"""

from __future__ import annotations

#: Triple-point temperature [K] (Span & Wagner 1996, Sec. 3.1).
TRIPLE_TEMPERATURE_K = 216.592
#: Triple-point pressure [Pa] (Span & Wagner 1996, Sec. 3.1: 0.51795 MPa).
TRIPLE_PRESSURE_PA = 0.51795e6
#: Critical temperature [K] (Span & Wagner 1996, Sec. 3.1).
CRITICAL_TEMPERATURE_K = 304.1282
#: Critical pressure [Pa] (Span & Wagner 1996, Sec. 3.1: 7.3773 MPa).
CRITICAL_PRESSURE_PA = 7.3773e6
#: Molar mass [kg/mol] (NIST Chemistry WebBook, carbon dioxide: 44.0095 g/mol).
MOLAR_MASS = 0.0440095
#: Normal sublimation temperature at 101325 Pa [K] (Span & Wagner 1996: 194.686 K; their
#: sublimation-pressure equation 3.12 gives 101325 Pa at 194.685 K).
NORMAL_SUBLIMATION_K = 194.686
#: One standard atmosphere [Pa].
ATMOSPHERE_PA = 101325.0
