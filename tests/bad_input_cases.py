"""The catalogue of hostile input: every case is a command line, the files it reads, the exit
status it must end with and the field its one-line message must name.

Each case is ``(id, argv, files, exit, field)``: ``argv`` may hold ``{d}`` for the case's own
folder; ``files`` maps a file name in that folder to its text (or bytes); ``field`` is a text
the stderr line must contain after ``error:`` (``None`` for a case that must succeed). Kept as
data so that a new case is one line (README, "Bad input").
"""

from __future__ import annotations

HUGE = "9**9**9"
DIGITS_400 = "1" * 400

#: A command line that works, per command, with the option each varies in the generated cases.
BASES: dict[str, tuple[list[str], list[str]]] = {
    "saturation": (["saturation", "--temperature", "20 degC"], ["--temperature"]),
    "store": (["store", "--volume", "47 L", "--mass", "9 kg", "--temperature", "20 degC"],
              ["--volume", "--mass", "--temperature"]),
    "snow": (["snow", "--liquid-temperature", "20 degC", "--liquid-mass", "10 kg"],
             ["--liquid-temperature", "--liquid-mass"]),
    "moisture": (["moisture", "--temperature", "20 degC", "--pressure", "1 atm"], ["--temperature", "--pressure"]),
    "dryer": (["dryer", "--flow", "1 kg/day", "--inlet-temperature", "20 degC", "--desiccant", "silica-gel",
               "--cycle", "7 day"], ["--flow", "--inlet-temperature", "--cycle"]),
    "calcination": (["calcination", "--temperature", "900 degC"], ["--temperature"]),
    "liquefy": (["liquefy", "--inlet-pressure", "1 atm", "--inlet-temperature", "20 degC",
                 "--condensing-temperature", "0 degC"], ["--inlet-pressure"]),
    "batch": (["batch", "fermentation", "--co2", "2 kg"], ["--co2"]),
}

#: Values no quantity field may accept, and why.
BAD_VALUES = {
    "power-tower": f"{HUGE} K",
    "power-400": "10**400 kg",
    "400-digits": f"{DIGITS_400} kg",
    "long-text": "7" * 100_000,
    "nan": "nan K",
    "inf": "inf kg",
    "exp-overflow": "1e400 bar",
    "offset-arithmetic": "2 degC * 3",
    "empty": "",
    "bare-number": "42",
}


def _set(argv: list[str], option: str, value: str) -> list[str]:
    out = list(argv)
    if option in out:
        out[out.index(option) + 1] = value
    else:
        out += [option, value]
    return out


def generated() -> list[tuple]:
    """Every base command with each of its quantity options set to each bad value."""
    cases = []
    for command, (argv, options) in BASES.items():
        for option in options:
            for why, value in BAD_VALUES.items():
                cases.append((f"{command}{option}={why}", _set(argv, option, value), {}, 2, option))
    return cases


GOOD = "demand = \"1 kg\"\n"

SCENARIO_CASES = [
    # id, argv, files, exit, field
    ("demand-huge", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "1e308 kg"\n'}, 2, "s.toml, line 1: demand"),
    ("demand-tiny", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "1e-300 kg"\n'}, 2, "s.toml, line 1: demand"),
    ("demand-10**400", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "10**400 kg"\n'}, 2, "s.toml, line 1: demand"),
    ("demand-400-digits", ["compare", "{d}/s.toml"], {"s.toml": f'demand = "{DIGITS_400} kg"\n'}, 2, "demand"),
    ("demand-power-tower", ["compare", "{d}/s.toml"], {"s.toml": f'demand = "{HUGE} kg"\n'}, 2, "demand"),
    ("demand-nan", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "nan kg"\n'}, 2, "demand"),
    ("demand-rate-huge", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "1e6 kg/s"\n'}, 2, "demand"),
    ("demand-missing", ["compare", "{d}/s.toml"], {"s.toml": 'name = "x"\n'}, 2, "s.toml: demand"),
    ("demand-zero", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "0 kg"\n'}, 2, "demand"),
    ("demand-negative", ["compare", "{d}/s.toml"], {"s.toml": 'demand = "-1 kg"\n'}, 2, "demand"),
    ("demand-long", ["compare", "{d}/s.toml"], {"s.toml": f'demand = "{"1" * 100_000}"\n'}, 2, "demand"),
    ("site-hot", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[site]\ntemperature = "1e6 degC"\n'}, 2,
     "s.toml, line 3: site.temperature"),
    ("site-warm-oven", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[site]\ntemperature = "300 degC"\n'}, 2,
     "s.toml, line 3: site.temperature"),
    ("site-pressure-huge", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[site]\npressure = "1e9 bar"\n'}, 2,
     "s.toml, line 3: site.pressure"),
    ("site-pressure-vacuum", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[site]\npressure = "1 Pa"\n'}, 2,
     "site.pressure"),
    ("site-air-co2", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[site]\nair_co2 = "50 %"\n'}, 2, "site.air_co2"),
    ("site-offset-arithmetic", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[site]\ntemperature = "2 degC * 3"\n'},
     2, "site.temperature"),
    ("weights-inf", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "[weights]\ncost = inf\n"}, 2,
     "s.toml, line 3: weights.cost"),
    ("weights-nan", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "[weights]\ncost = nan\n"}, 2, "weights.cost"),
    ("weights-1e308", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "[weights]\ncost = 1e308\nenergy = 1e308\n"}, 2,
     "weights.cost"),
    ("weights-negative", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "[weights]\ncost = -1\n"}, 2, "weights.cost"),
    ("weights-text", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[weights]\ncost = "high"\n'}, 2, "weights.cost"),
    ("weights-unknown", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "[weights]\nbeauty = 1\n"}, 2, "weights.beauty"),
    ("price-nan", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[prices]\nsucrose = "nan / kg"\n'}, 2,
     "s.toml, line 3: prices.sucrose"),
    ("price-inf", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[prices]\nsucrose = "inf / kg"\n'}, 2,
     "prices.sucrose"),
    ("price-1e400", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[prices]\nsucrose = "1e400 / kg"\n'}, 2,
     "prices.sucrose"),
    ("price-negative", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[prices]\nsucrose = "-1 / kg"\n'}, 2,
     "prices.sucrose"),
    ("price-unit-power-tower", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[prices]\nsucrose = "1 / kg**9**9**9"\n'},
     2, "prices.sucrose"),
    ("price-per-kelvin", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[prices]\nsucrose = "1 / K"\n'}, 2,
     "prices.sucrose"),
    ("price-too-many", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + "[prices]\n" + "".join(f'k{i} = "1 / kg"\n' for i in range(5000))}, 2, "prices"),
    ("options-unknown-route", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[options.nosuchroute]\nx = "1"\n'}, 2,
     "s.toml, line 2: [options.nosuchroute]"),
    ("options-out-of-range", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + '[options.fermentation]\nefficiency = "900 %"\n'}, 2,
     "s.toml, line 3: options.fermentation.efficiency"),
    ("options-unknown-key", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[options.fermentation]\ncolour = "red"\n'},
     2, "s.toml, line 3: options.fermentation.colour"),
    ("options-power-tower", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + f'[options.fermentation]\nefficiency = "{HUGE} %"\n'}, 2, "options.fermentation.efficiency"),
    ("options-too-many-keys", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + "[options.fermentation]\n" + "".join(f'k{i} = "1"\n' for i in range(600))}, 2,
     "options.fermentation"),
    ("delivery-efficiency-text", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[delivery]\nefficiency = "x"\n'}, 2,
     "s.toml, line 3: delivery.efficiency"),
    ("delivery-stages-many", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "[delivery]\nstages = 100000\n"}, 2,
     "s.toml, line 3: delivery.stages"),
    ("delivery-power-tower", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + f'[delivery]\ncondensing_temperature = "{HUGE} K"\n'}, 2, "delivery.condensing_temperature"),
    ("delivery-unknown-key", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[delivery]\nspeed = "1 m/s"\n'}, 2,
     "s.toml, line 3: delivery.speed"),
    ("dryer-both-targets", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + '[dryer]\ntarget_ppmv = "20 ppmv"\ntarget_dew_point = "-40 degC"\n'}, 2, "dryer.target_ppmv"),
    ("dryer-cycle-nan", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[dryer]\ncycle = "nan h"\n'}, 2, "dryer.cycle"),
    ("unknown-top-key", ["compare", "{d}/s.toml"], {"s.toml": GOOD + 'colour = "red"\n'}, 2, "s.toml, line 2: colour"),
    ("section-not-table", ["compare", "{d}/s.toml"], {"s.toml": GOOD + 'site = "here"\n'}, 2, "site"),
    ("end-product-unknown", ["compare", "{d}/s.toml"], {"s.toml": GOOD + 'end_product = "plasma"\n'}, 2,
     "end_product"),
    ("currency-mismatch", ["compare", "{d}/s.toml"], {"s.toml": GOOD + 'currency = "XYZ"\n'}, 2, "currency"),
    ("deep-nesting", ["compare", "{d}/s.toml"], {"s.toml": "a = " + "[" * 3000 + "]" * 3000 + "\n"}, 2, "s.toml"),
    ("deep-inline-tables", ["compare", "{d}/s.toml"], {"s.toml": "a = " + "{b = " * 50 + "1" + "}" * 50 + "\n"}, 2,
     "s.toml"),
    ("not-toml", ["compare", "{d}/s.toml"], {"s.toml": "this is not toml ===\n"}, 2, "s.toml"),
    ("binary-file", ["compare", "{d}/s.toml"], {"s.toml": b"\xff\xfe\x00\x01binary"}, 2, "s.toml"),
    ("empty-file", ["compare", "{d}/s.toml"], {"s.toml": ""}, 2, "demand"),
    ("huge-file", ["compare", "{d}/s.toml"], {"s.toml": GOOD + "#" * 1_100_000 + "\n"}, 2, "s.toml"),
    ("device-file", ["compare", "/dev/zero"], {}, 2, "/dev/zero: is not a regular file"),
    ("missing-file", ["compare", "{d}/nothere.toml"], {}, 2, "nothere.toml"),
    ("empty-name", ["compare", ""], {}, 2, "no file name"),
    ("folder", ["compare", "{d}"], {}, 2, "is a folder"),
    ("tilde-user", ["compare", "~nosuchuser-co2/x.toml"], {}, 2, "~nosuchuser-co2/x.toml"),
    ("long-name", ["compare", "{d}/" + "n" * 300 + ".toml"], {}, 2, "nnnn"),
    ("uncertain-unknown-input", ["uncertainty", "{d}/s.toml", "--samples", "50", "--route", "purchase"],
     {"s.toml": GOOD + '[uncertain]\n"colour" = {dist = "uniform", low = "1", high = "2"}\n'}, 2,
     "s.toml, line 3: uncertain.colour"),
    ("uncertain-bad-dist", ["uncertainty", "{d}/s.toml", "--samples", "50", "--route", "purchase"],
     {"s.toml": GOOD + '[uncertain]\n"demand" = {dist = "wild", low = "1 kg", high = "2 kg"}\n'}, 2,
     "s.toml, line 3: uncertain.demand.dist"),
    ("uncertain-power-tower", ["uncertainty", "{d}/s.toml", "--samples", "50", "--route", "purchase"],
     {"s.toml": GOOD + f'[uncertain]\n"demand" = {{dist = "uniform", low = "1 kg", high = "{HUGE} kg"}}\n'}, 2,
     "uncertain.demand.high"),
    ("uncertain-not-table", ["uncertainty", "{d}/s.toml", "--samples", "50"], {"s.toml": GOOD + 'uncertain = 3\n'},
     2, "uncertain"),
    ("uncertain-too-many", ["uncertainty", "{d}/s.toml", "--samples", "50"],
     {"s.toml": GOOD + "[uncertain]\n" + "".join(f'"x{i}" = {{dist = "normal"}}\n' for i in range(600))}, 2,
     "uncertain"),
    ("delivery-above-critical", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + 'end_product = "liquid"\n[delivery]\ncondensing_temperature = "100 degC"\n'}, 2,
     "s.toml, line 4: delivery.condensing_temperature"),
    ("delivery-below-triple-batch", ["batch", "fermentation", "{d}/s.toml"],
     {"s.toml": GOOD + 'end_product = "liquid"\n[delivery]\ncondensing_temperature = "-70 degC"\n'}, 2,
     "s.toml, line 4: delivery.condensing_temperature"),
    ("delivery-above-critical-sensitivity", ["sensitivity", "{d}/s.toml", "--route", "fermentation"],
     {"s.toml": GOOD + 'end_product = "liquid"\n[delivery]\ncondensing_temperature = "100 degC"\n'}, 2,
     "s.toml, line 4: delivery.condensing_temperature"),
    ("delivery-efficiency-1-percent", ["compare", "{d}/s.toml"],
     {"s.toml": GOOD + 'end_product = "liquid"\n[delivery]\nefficiency = "1 %"\n'}, 2,
     "s.toml, line 4: delivery.efficiency"),
    ("dryer-unknown-desiccant", ["compare", "{d}/s.toml"], {"s.toml": GOOD + '[dryer]\ndesiccant = "sand"\n'}, 2,
     "s.toml, line 3: dryer.desiccant"),
    ("batch-co2-tiny", ["batch", "fermentation", "--co2", "1e-9 kg"], {}, 2, "--co2"),
    ("sensitivity-bad-file", ["sensitivity", "{d}/s.toml"], {"s.toml": 'demand = "10**400 kg"\n'}, 2, "demand"),
    ("batch-bad-file", ["batch", "fermentation", "{d}/s.toml"], {"s.toml": 'demand = "nan kg"\n'}, 2, "demand"),
]

OPTION_CASES = [
    ("samples-billion", ["uncertainty", "--samples", "1000000000"], {}, 2, "--samples"),
    ("samples-zero", ["uncertainty", "--samples", "0"], {}, 2, "--samples"),
    ("samples-400-digits", ["uncertainty", "--samples", DIGITS_400], {}, 2, "--samples"),
    ("samples-text", ["uncertainty", "--samples", "many"], {}, 2, "--samples"),
    ("seed-negative", ["uncertainty", "--seed", "-1", "--samples", "10"], {}, 2, "--seed"),
    ("seed-huge", ["uncertainty", "--seed", DIGITS_400, "--samples", "10"], {}, 2, "--seed"),
    ("liquefy-efficiency-1-percent", BASES["liquefy"][0] + ["--efficiency", "1 %"], {}, 2, "--efficiency"),
    ("stages-100000", BASES["liquefy"][0] + ["--stages", "100000"], {}, 2, "--stages"),
    ("stages-zero", BASES["liquefy"][0] + ["--stages", "0"], {}, 2, "--stages"),
    ("stages-text", BASES["liquefy"][0] + ["--stages", "two"], {}, 2, "--stages"),
    ("top-zero", ["sensitivity", "--top", "0"], {}, 2, "--top"),
    ("top-huge", ["sensitivity", "--top", DIGITS_400], {}, 2, "--top"),
    ("store-volume-1e308", ["store", "--volume", "1e308 m**3", "--mass", "1 kg", "--temperature", "20 degC"], {}, 2,
     "--volume"),
    ("moisture-1e9-bar", ["moisture", "--temperature", "20 degC", "--pressure", "1e9 bar"], {}, 2, "--pressure"),
    ("batch-co2-1e308", ["batch", "fermentation", "--co2", "1e308 kg"], {}, 2, "--co2"),
    ("batch-unknown-route", ["batch", "nosuchroute"], {}, 2, "route"),
    ("batch-option-power", ["batch", "fermentation", "--option", f"efficiency={HUGE} %"], {}, 2, "efficiency"),
    ("batch-option-unknown", ["batch", "fermentation", "--option", "colour=red"], {}, 2, "fermentation"),
    ("compare-weight-inf", ["compare", "--weight", "cost=inf"], {}, 2, "--weight"),
    ("compare-weight-nan", ["compare", "--weight", "cost=nan"], {}, 2, "--weight"),
    ("compare-weight-huge", ["compare", "--weight", "cost=1e308"], {}, 2, "--weight"),
    ("reaction-unknown-species", ["reaction", "Xx(s) -> CO2(g)"], {}, 2, "EQUATION"),
    ("reaction-unbalanced", ["reaction", "H2O(l) -> H2(g)"], {}, 2, "EQUATION"),
    ("reaction-long", ["reaction", "H2O(l) + " * 200 + "H2O(l) -> H2O(g)"], {}, 2, "EQUATION"),
    ("reaction-temperature-tower", ["reaction", "H2O(l) -> H2O(g)", "--temperature", HUGE + " K"], {}, 2,
     "--temperature"),
    ("demo-long-name", ["demo", "{d}/" + "n" * 300 + ".toml"], {}, 2, "nnnn"),
    ("demo-tilde-user", ["demo", "~nosuchuser-co2/x.toml"], {}, 2, "~nosuchuser-co2/x.toml"),
    ("demo-exists", ["demo", "{d}/s.toml"], {"s.toml": GOOD}, 2, "s.toml"),
    ("demo-unknown", ["demo", "--which", "moon"], {}, 2, "--which"),
    ("store-relief-word", ["store", "--volume", "1 L", "--mass", "0.6 kg", "--temperature", "20 degC",
                           "--relief-pressure", "10 bar"], {}, 0, None),
    ("compare-name-escapes", ["compare", "{d}/s.toml"],
     {"s.toml": 'name = "x\\u001b[2J\\u001b]0;owned\\u0007y"\n' + GOOD}, 0, None),
    ("compare-ok", ["compare", "{d}/s.toml"], {"s.toml": GOOD}, 0, None),
    ("compare-json-ok", ["compare", "{d}/s.toml", "--json"], {"s.toml": GOOD}, 0, None),
]


def all_cases() -> list[tuple]:
    """Every case of the catalogue."""
    return SCENARIO_CASES + OPTION_CASES + generated()
