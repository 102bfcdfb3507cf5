#!/usr/bin/env python3
"""Install co2routes from the repository into a scratch environment outside it, beside the other
PyPI distribution named ``thermo``, and run every ``co2routes`` command from another folder.

Inside the repository the current folder comes first on ``sys.path``, so the test suite cannot
see an installed program that is broken or that collides with another distribution; this check
can. It fails (exit status 1) when a command exits non-zero, prints a traceback or gives JSON that
does not parse, when a command of ``co2routes.tui.cli.COMMANDS`` has no case here, when the other
``thermo`` library no longer imports, or when uninstalling that library breaks co2routes.

Usage: ``python3 .ci/outside_check.py`` (``.ci/run`` calls it after ``make test``). The scratch
folder is ``$CO2ROUTES_OUTSIDE_DIR`` or ``co2routes-outside`` in the system's temporary folder;
it is made anew on every run (``CO2ROUTES_OUTSIDE_REUSE=1`` keeps its venv). Downloads go through
pip's cache.
"""

from __future__ import annotations

import json
import os
import pty
import select
import shutil
import subprocess
import sys
import tempfile
import time
from pathlib import Path

REPO = Path(__file__).resolve().parents[1]
SCRATCH = Path(os.environ.get("CO2ROUTES_OUTSIDE_DIR") or Path(tempfile.gettempdir()) / "co2routes-outside")
VENV = SCRATCH / "venv"
WORK = SCRATCH / "work"
BIN = VENV / "bin"
#: ``CO2ROUTES_OUTSIDE_REUSE=1`` keeps the scratch venv of an earlier run (quicker, for trying).
REUSE = os.environ.get("CO2ROUTES_OUTSIDE_REUSE") == "1"

REACTION = "NaHCO3(s) + HCl(aq) -> NaCl(aq) + H2O(l) + CO2(g)"

#: One or more runs of every command: arguments after ``co2routes`` (``--json`` added to each).
CASES: dict[str, list[list[str]]] = {
    "compare": [[], ["scenario.toml"]],
    "demand": [["greenhouse", "--floor-area", "200 m**2", "--mean-height", "3 m"],
               ["fermentation", "--volume", "20 L", "--original-gravity", "1.050", "--final-gravity", "1.010"],
               ["carbonation", "--volume", "200 L"],
               ["cold-box", "--box-area", "1 m**2", "--box-u", "0.5 W/m**2/K", "--hold-time", "24 h",
                "--outside-temperature", "25 degC"]],
    "sensitivity": [[]],
    "uncertainty": [["--samples", "500", "--seed", "1"]],
    "batch": [["acid-carbonate"], ["fermentation", "scenario.toml"]],
    "routes": [[]],
    "saturation": [["--temperature", "20 degC"], ["--pressure", "50 bar"]],
    "store": [["--volume", "10 L", "--mass", "5 kg", "--temperature", "20 degC"]],
    "snow": [["--liquid-temperature", "20 degC"]],
    "liquefy": [["--inlet-pressure", "1 atm", "--inlet-temperature", "20 degC",
                 "--condensing-temperature", "20 degC"]],
    "moisture": [["--temperature", "20 degC"], ["--dew-point", "-40 degC"]],
    "dryer": [["--flow", "1 kg/h", "--inlet-temperature", "20 degC", "--desiccant", "silica-gel",
               "--cycle", "8 h"]],
    "reaction": [[REACTION]],
    "calcination": [["--temperature", "900 degC"]],
}
#: Checks that passed, for the closing line.
PASSED: list[str] = []

#: Commands checked apart: ``demo`` writes the scenario the others read, ``open`` runs the
#: interface in a pseudo-terminal.
SPECIAL = ("demo", "open")


def _ok(what: str) -> None:
    """Count and show one check that passed."""
    PASSED.append(what)
    print(f"outside: ok  {what}", flush=True)


def sh(*cmd: str | Path, cwd: Path | None = None, check: bool = True) -> subprocess.CompletedProcess:
    """Run a command, its output captured as text."""
    return subprocess.run([str(c) for c in cmd], cwd=cwd, text=True, capture_output=True, check=check,
                          env=_env(), stdin=subprocess.DEVNULL, timeout=900)


def _env() -> dict[str, str]:
    """The environment with nothing that would put the repository on ``sys.path``."""
    env = {k: v for k, v in os.environ.items() if k not in ("PYTHONPATH", "PYTHONHOME", "VIRTUAL_ENV")}
    env["PIP_DISABLE_PIP_VERSION_CHECK"] = "1"
    return env


def install() -> None:
    """A fresh venv with the other ``thermo`` first, then co2routes from the repository."""
    if not (REUSE and (BIN / "pip").exists()):
        shutil.rmtree(SCRATCH, ignore_errors=True)
        sh(sys.executable, "-m", "venv", VENV)
    shutil.rmtree(WORK, ignore_errors=True)
    WORK.mkdir(parents=True)
    print("outside: installing the PyPI library named thermo", flush=True)
    sh(BIN / "pip", "install", "-q", "thermo")
    print("outside: installing co2routes from the repository (not editable)", flush=True)
    build = SCRATCH / "src"
    shutil.rmtree(build, ignore_errors=True)
    shutil.copytree(REPO, build, ignore=shutil.ignore_patterns(".venv", ".git", "build", "*.egg-info",
                                                               "__pycache__", ".pytest_cache"))
    sh(BIN / "pip", "install", "-q", build)


def check_other_thermo() -> list[str]:
    """The other library imports, computes, and owns its ``thermo.units``."""
    code = ("import pathlib, thermo, thermo.units, co2routes.thermo as ours; from thermo import Chemical; "
            "assert pathlib.Path(thermo.__file__).parent != pathlib.Path(ours.__file__).parent; "
            "assert abs(Chemical('water', T=298.15).MW - 18.015) < 0.01; print(thermo.__file__)")
    done = sh(BIN / "python", "-c", code, cwd=WORK, check=False)
    if done.returncode != 0:
        return [f"the other thermo library breaks: {done.stderr.strip()[-400:]}"]
    _ok(f"the other thermo library imports and computes ({done.stdout.strip()})")
    return []


def run_command(name: str, args: list[str]) -> str | None:
    """Run ``co2routes NAME ARGS --json`` in the scratch folder; the failure in words or None."""
    done = sh(BIN / "co2routes", name, *args, "--json", cwd=WORK, check=False)
    shown = f"co2routes {name} {' '.join(args)}".strip()
    if done.returncode != 0 or "Traceback" in done.stderr:
        return f"{shown}: exit {done.returncode}: {(done.stderr or done.stdout).strip()[-400:]}"
    try:
        json.loads(done.stdout)
    except ValueError:
        return f"{shown}: output is not JSON: {done.stdout[:200]!r}"
    _ok(shown)
    return None


def run_interface(args: list[str], wait_s: float = 60.0) -> str | None:
    """Open the interface in a pseudo-terminal, wait for the ranking, quit with ctrl+q."""
    shown = f"co2routes {' '.join(args)}".strip()
    pid, fd = pty.fork()
    if pid == 0:  # the child: the real program on a real terminal
        os.chdir(WORK)
        os.environ.update({"TERM": "xterm-256color", "COLUMNS": "120", "LINES": "40"})
        os.environ.pop("PYTHONPATH", None)
        os.execv(str(BIN / "co2routes"), [str(BIN / "co2routes"), *args])
    screen = _read_until(fd, b"best first", wait_s)
    screen += _read_until(fd, None, 3.0)  # the ranking computes in a worker: let it finish
    os.write(fd, b"\x11")  # ctrl+q
    screen += _read_until(fd, None, 20.0)
    status = _wait(pid, 20.0)
    os.close(fd)
    text = screen.decode("utf-8", "replace")
    if status != 0 or "Traceback" in text:
        return f"{shown}: interface exit {status}: {text[-400:]!r}"
    _ok(f"{shown} (interface opened and quit)")
    return None


def _read_until(fd: int, marker: bytes | None, wait_s: float) -> bytes:
    """What the terminal shows until ``marker`` appears, the program ends, or ``wait_s`` passes."""
    seen = b""
    end = time.monotonic() + wait_s
    while time.monotonic() < end:
        ready, _, _ = select.select([fd], [], [], 0.2)
        if not ready:
            continue
        try:
            chunk = os.read(fd, 65536)
        except OSError:
            break
        if not chunk:
            break
        seen += chunk
        if marker is not None and marker in seen:
            break
    return seen


def _wait(pid: int, wait_s: float) -> int:
    """The child's exit status; killed (and reported as such) if it does not end in time."""
    end = time.monotonic() + wait_s
    while time.monotonic() < end:
        done, status = os.waitpid(pid, os.WNOHANG)
        if done:
            return os.waitstatus_to_exitcode(status)
        time.sleep(0.1)
    os.kill(pid, 9)
    os.waitpid(pid, 0)
    return -9


def listed_commands() -> list[str]:
    """The installed program's own list of commands."""
    code = "from co2routes.tui.cli import COMMANDS; print(' '.join(COMMANDS))"
    return sh(BIN / "python", "-c", code, cwd=WORK).stdout.split()


def run_all() -> list[str]:
    """Every command of the installed program, from the scratch folder."""
    failures = []
    missing = [c for c in listed_commands() if c not in CASES and c not in SPECIAL]
    failures += [f"co2routes {c}: no case in .ci/outside_check.py" for c in missing]
    demo = sh(BIN / "co2routes", "demo", "scenario.toml", cwd=WORK, check=False)
    if demo.returncode != 0 or not (WORK / "scenario.toml").is_file():
        failures.append(f"co2routes demo scenario.toml: exit {demo.returncode}: {demo.stderr.strip()}")
    else:
        _ok("co2routes demo scenario.toml")
    for name, runs in CASES.items():
        for args in runs:
            failure = run_command(name, args)
            if failure:
                failures.append(failure)
    for args in (["open", "scenario.toml"], []):
        failure = run_interface(args)
        if failure:
            failures.append(failure)
    return failures


def main() -> int:
    """Install, run everything, uninstall the other library and run again; report."""
    started = time.monotonic()
    install()
    failures = check_other_thermo() + run_all()
    print("outside: uninstalling the other thermo: co2routes must keep its files", flush=True)
    sh(BIN / "pip", "uninstall", "-q", "-y", "thermo")
    failures += [f"after uninstalling thermo: {f}" for f in (run_command("routes", []),
                                                              run_command("compare", [])) if f]
    for failure in failures:
        print(f"outside: FAILED {failure}", file=sys.stderr)
    print(f"outside: {time.monotonic() - started:.0f} s", flush=True)
    print(f"outside: {len(PASSED)} passed, {len(failures)} failed", flush=True)
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main())
