"""``co2routes liquefy``'s trade-off table with the refrigeration a cold condenser needs.

Sources: CoolProp states of CO2 (Span & Wagner 1996) and R134a worked by hand in
tests/sources/test_plant.py; here the table's own sums (by hand) and the second law: below the
site's temperature some work must go to the chiller, above it none.
"""

from __future__ import annotations

import json

import pytest

from co2routes.thermo.refrigeration import co2_refrigeration_duty, vapour_compression
from co2routes.tui.cli import main


def test_tradeoff_shows_compressor_refrigeration_and_their_sum(capsys):
    code = main(["liquefy", "--inlet-pressure", "1 atm", "--inlet-temperature", "20 degC",
                 "--condensing-temperature", "0 degC", "--json"])
    assert code == 0
    rows = {round(r["condensing_temperature_k"], 2): r for r in json.loads(capsys.readouterr().out)["cooling_tradeoff"]}
    for t, row in rows.items():
        # the sum by hand, 1e-12
        assert row["total_work_kj_per_kg"] == pytest.approx(row["work_kj_per_kg"] + row["refrigeration_work_kj_per_kg"],
                                                            rel=1e-12)
        if t >= 293.15:
            assert row["refrigeration_work_kj_per_kg"] == 0.0          # the ambient condenser does it
        else:
            # duty over the chiller's COP (default R134a cycle), 1e-9; never below the Carnot work
            cycle = vapour_compression(t, 293.15)
            duty = co2_refrigeration_duty(t, 293.15)
            assert row["refrigeration_work_kj_per_kg"] == pytest.approx(duty / cycle.cop / 1e3, rel=1e-9)
            assert row["refrigeration_work_kj_per_kg"] > duty / cycle.carnot_cop / 1e3
    # with the chiller counted, condensing at -20 degC no longer takes less work than at 0 degC
    assert rows[253.15]["total_work_kj_per_kg"] > rows[273.15]["total_work_kj_per_kg"]
