"""Thread safety: no shared mutable Cantera or CoolProp state across threads (issue 11 item 4).

The reference in each check is the same computation run in one thread (exact equality, no
tolerance): a race shows as a different number.
"""

from __future__ import annotations

from concurrent.futures import ThreadPoolExecutor

from co2routes.sources.pipeline import compare
from co2routes.sources.scenario import demo
from co2routes.thermo import flue


def _burn_all(case):
    fuel, excess = case
    b = flue.burn(fuel, excess)
    return b.heat_released_j_per_mol, tuple(sorted(b.exhaust_mol.items()))


def test_burn_in_threads_equals_single_thread():
    cases = [(f, e) for f in ("methane", "propane") for e in (0.05, 0.1, 0.2, 0.5, 1.0)] * 8
    single = [_burn_all(c) for c in cases]
    with ThreadPoolExecutor(max_workers=4) as pool:
        threaded = list(pool.map(_burn_all, cases))
    assert threaded == single


def _rows(comparison):
    return [(r.result.route_id, r.cost_per_kg, r.result.heat_kj) for r in comparison.rows]


def test_compare_in_four_threads_equals_single_thread():
    single = _rows(compare(demo()))
    with ThreadPoolExecutor(max_workers=4) as pool:
        results = list(pool.map(lambda _: _rows(compare(demo())), range(4)))
    for rows in results:
        assert rows == single
