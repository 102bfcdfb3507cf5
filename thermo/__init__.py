"""Physical core of co2routes: units, species and reactions, CO2 and water states, beds.

Everything here takes and returns SI floats (K, Pa, kg, J, m3, s) and small frozen dataclasses.
Nothing here reads user files, draws screens or imports ``sources`` or ``tui``.
"""
