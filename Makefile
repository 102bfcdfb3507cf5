# Two commands on a fresh machine: `make run` and `make test`.
PYTHON ?= python3
VENV   := .venv
PY     := $(VENV)/bin/python

.PHONY: run test bench clean

$(VENV)/bin/python:
	$(PYTHON) -m venv $(VENV)
	$(PY) -m pip install -q --upgrade pip

$(VENV)/.installed: pyproject.toml | $(VENV)/bin/python
	$(PY) -m pip install -q -e .
	touch $@

$(VENV)/.installed-test: pyproject.toml | $(VENV)/bin/python
	$(PY) -m pip install -q -e '.[test]'
	touch $(VENV)/.installed $@

run: $(VENV)/.installed
	$(VENV)/bin/co2routes

test: $(VENV)/.installed-test
	$(VENV)/bin/pytest -n auto --dist worksteal

bench: $(VENV)/.installed-test
	$(PY) bench/run.py --write docs/benchmarks.md

clean:
	rm -rf $(VENV) build *.egg-info
