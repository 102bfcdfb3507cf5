"""``co2routes liquefy``: compress CO2 gas in stages and condense it into a cooled cylinder."""

from __future__ import annotations

import argparse

NAME = "liquefy"
HELP = ("staged compression of CO2 gas to liquid: condensing pressure, work, discharge "
        "temperatures, heat to reject, batch time, and what cooling the cylinder saves")

#: thermo's field names -> the option that sets them, so an error names what the user typed.
_OPTION_OF = {
    "stages": "--stages",
    "efficiency": "--efficiency",
    "condensing temperature": "--condensing-temperature",
    "inlet pressure": "--inlet-pressure",
    "inlet temperature": "--inlet-temperature",
    "intercool temperature": "--intercool-temperature",
    "displacement": "--displacement",
    "volumetric efficiency": "--volumetric-efficiency",
    "mass": "--mass",
    "CO2 fraction": "--co2-fraction",
}


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``liquefy``."""
    parser.add_argument("--inlet-pressure", metavar="P", required=True,
                        help="absolute pressure of the gas drawn in, e.g. '1 atm'")
    parser.add_argument("--inlet-temperature", metavar="T", required=True,
                        help="temperature of the gas drawn in, e.g. '20 degC'")
    parser.add_argument("--condensing-temperature", metavar="T", required=True,
                        help="temperature of the receiving cylinder / condenser, e.g. '0 degC' for "
                             "an ice bath (must be below 31.0 degC)")
    parser.add_argument("--stages", metavar="N",
                        help="number of compression stages (default: fewest that keep each "
                             "stage's ratio at or below 6 and its discharge at or below 150 degC)")
    parser.add_argument("--efficiency", metavar="E", default="70 %",
                        help="isentropic efficiency of each stage, e.g. '70 %%' (default)")
    parser.add_argument("--intercool-temperature", metavar="T",
                        help="gas temperature after each intercooler (default: the inlet temperature)")
    parser.add_argument("--displacement", metavar="V/TIME",
                        help="first-stage swept volume rate, e.g. '50 L/min'")
    parser.add_argument("--volumetric-efficiency", metavar="E",
                        help="share of the swept volume filled with gas, e.g. '80 %%' (default 80 %% "
                             "when --displacement is given)")
    parser.add_argument("--mass", metavar="M", help="batch of CO2 to liquefy, e.g. '10 kg'")
    parser.add_argument("--co2-fraction", metavar="X", default="100 %",
                        help="CO2 share of the dry gas, the rest air, e.g. '98 %%' (default pure): "
                             "a gas with air condenses whole only at its bubble pressure")


def _stages(text: str | None) -> int | None:
    from co2routes.sources.limits import MAX_STAGES
    from co2routes.tui.commands.uncertainty import whole

    return None if text is None else whole(text, "--stages", 1, MAX_STAGES)


def _kj(value: float) -> float:
    return value / 1e3


def _with_refrigeration(condensing_k: float, site_k: float, work_j_per_kg: float) -> dict:
    """Refrigeration work and compressor + refrigeration work of one trade-off row [kJ/kg]
    (:func:`co2routes.thermo.refrigeration.refrigeration_work_j_per_kg`, default chiller)."""
    from co2routes.thermo.refrigeration import refrigeration_work_j_per_kg

    chill = refrigeration_work_j_per_kg(condensing_k, site_k)
    return {"refrigeration_work_kj_per_kg": _kj(chill), "total_work_kj_per_kg": _kj(work_j_per_kg + chill)}


def _bubble_pressure(share: float, t_cond: float, typed: str) -> float | None:
    """The condenser's pressure for a gas with air (``None``: pure, its saturation pressure);
    a gas with no bubble point is refused: it cannot be condensed whole."""
    from co2routes.sources.delivery import PURE_ENOUGH
    from co2routes.thermo.condensing import bubble_point
    from co2routes.thermo.errors import InputError

    from co2routes.thermo.co2 import CRITICAL_TEMPERATURE_K, TRIPLE_TEMPERATURE_K

    if share >= PURE_ENOUGH or not TRIPLE_TEMPERATURE_K < t_cond < CRITICAL_TEMPERATURE_K:
        return None  # pure, or a condensing temperature liquefy itself refuses with its reason
    bp = bubble_point(share, t_cond)
    if bp.pressure_pa is None:
        raise InputError("--co2-fraction", f"is too lean to condense whole at {t_cond - 273.15:.1f} degC at "
                         "any pressure (no bubble point: the air keeps it above the mixture's critical "
                         "line); separate the CO2 first or condense colder", got=typed)
    return bp.pressure_pa


def run(args: argparse.Namespace) -> dict:
    """The liquefaction plan as the JSON answer."""
    from co2routes.thermo import cautions, compression, liquefaction
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.units import parse, parse_positive

    p_in = parse_positive(args.inlet_pressure, "--inlet-pressure", "pressure")
    t_in = parse_positive(args.inlet_temperature, "--inlet-temperature", "temperature")
    t_cond = parse_positive(args.condensing_temperature, "--condensing-temperature", "temperature")
    stages = _stages(args.stages)
    eta = parse(args.efficiency, "--efficiency", "fraction")
    t_ic = None if args.intercool_temperature is None else parse_positive(
        args.intercool_temperature, "--intercool-temperature", "temperature")
    disp = None if args.displacement is None else parse_positive(
        args.displacement, "--displacement", "volume_flow")
    eta_v = None if args.volumetric_efficiency is None else parse(
        args.volumetric_efficiency, "--volumetric-efficiency", "fraction")
    mass = None if args.mass is None else parse_positive(args.mass, "--mass", "mass")
    share = parse(args.co2_fraction, "--co2-fraction", "fraction")
    if not 0.0 < share <= 1.0:
        raise InputError("--co2-fraction", "must be a share above 0 and up to 100 %, e.g. '98 %'",
                         got=args.co2_fraction)
    try:
        p_bubble = _bubble_pressure(share, t_cond, args.co2_fraction)
        result = liquefaction.liquefy(p_in, t_in, t_cond, stages=stages, efficiency=eta,
                                      intercool_temperature_k=t_ic, displacement_m3_s=disp,
                                      volumetric_efficiency=eta_v, mass_kg=mass, plan=False,
                                      condensing_pressure_pa=p_bubble)
        tradeoff = liquefaction.cooling_tradeoff(
            p_in, t_in, temperatures_k=compression.TRADEOFF_TEMPERATURES_K + (t_cond,),
            stages=stages, efficiency=eta, intercool_temperature_k=t_ic)
    except InputError as err:
        if err.field.startswith("--"):
            raise
        raise InputError(_OPTION_OF.get(err.field, err.field), err.allowed, err.got) from None
    warnings = list(result.warnings)
    if p_bubble is not None:
        warnings.append(f"With {1.0 - share:.1%} air the gas condenses whole only at its bubble pressure, "
                        f"{p_bubble / 1e5:.1f} bar at {t_cond - 273.15:.1f} degC (Peng-Robinson, CO2 + N2); "
                        "the stages are worked out on CO2's own properties, and the cooling trade-off "
                        "below is for pure CO2. Vent the air from the cylinder's top before use.")
    if mass is not None and disp is None:
        warnings.append("The batch time needs --displacement (the compressor's swept volume rate).")
    if disp is not None and mass is None:
        warnings.append("The batch time needs --mass; the throughput per hour is shown instead.")
    return {
        "inlet_pressure_pa": result.inlet_pressure_pa,
        "inlet_temperature_k": result.inlet_temperature_k,
        "condensing_temperature_k": result.condensing_temperature_k,
        "co2_fraction": share,
        "condensing_pressure_pa": result.condensing_pressure_pa,
        "stages": len(result.stages),
        "isentropic_efficiency": result.isentropic_efficiency,
        "isentropic_work_kj_per_kg": _kj(result.isentropic_work_j_per_kg),
        "work_kj_per_kg": _kj(result.work_j_per_kg),
        "shaft_energy_kwh_per_kg": result.work_kwh_per_kg,
        "discharge_temperature_k": result.discharge_temperature_k,
        "intercooler_heat_kj_per_kg": _kj(result.intercooler_heat_j_per_kg),
        "condenser_heat_kj_per_kg": _kj(result.condenser_heat_j_per_kg),
        "heat_rejected_kj_per_kg": _kj(result.heat_rejected_j_per_kg),
        "throughput_per_hour_kg": None if result.mass_flow_kg_s is None else result.mass_flow_kg_s * 3600.0,
        "batch_mass_kg": mass,
        "time_h": None if result.batch_time_s is None else result.batch_time_s / 3600.0,
        "per_stage": [
            {
                "stage": s.index,
                "suction_pressure_pa": s.suction_pressure_pa,
                "suction_temperature_k": s.suction_temperature_k,
                "discharge_pressure_pa": s.discharge_pressure_pa,
                "pressure_ratio": s.pressure_ratio,
                "isentropic_work_kj_per_kg": _kj(s.isentropic_work_j_per_kg),
                "work_kj_per_kg": _kj(s.work_j_per_kg),
                "discharge_temperature_k": s.discharge_temperature_k,
                "cooler": s.cooler,
                "cooled_temperature_k": s.cooled_temperature_k,
                "heat_rejected_kj_per_kg": _kj(s.heat_rejected_j_per_kg),
                "energy_balance_residual_kj_per_kg": _kj(s.energy_balance_residual_j_per_kg),
            }
            for s in result.stages
        ],
        "cooling_tradeoff": [
            {
                "condensing_temperature_k": r.condensing_temperature_k,
                "condensing_pressure_pa": r.condensing_pressure_pa,
                "stages": r.stages,
                "pressure_ratio": r.pressure_ratio,
                "work_kj_per_kg": _kj(r.work_j_per_kg),
                "discharge_temperature_k": r.discharge_temperature_k,
                "condenser_heat_kj_per_kg": _kj(r.condenser_heat_j_per_kg),
                # a chiller takes the heat below the site's (inlet) temperature: its work and the sum
                **_with_refrigeration(r.condensing_temperature_k, t_in, r.work_j_per_kg),
            }
            for r in tradeoff
        ],
        "warnings": warnings,
        "cautions": [cautions.PRESSURE, cautions.COMPRESSOR_HEAT, cautions.CYLINDER_HEAT,
                     cautions.COLD_LIQUID, cautions.ASPHYXIATION],
    }
