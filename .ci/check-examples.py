#!/usr/bin/env python3
"""Runs every curl example api-examples/<name>.sh against a running service and checks that its
answer equals the committed api-examples/<name>.answer.json (objects whatever their order,
numbers by value). Usage: check-examples.py BASE_URL. Prints one line per example and a closing
'N passed, N failed' line; exit status 1 when any failed."""
import json
import os
import pathlib
import subprocess
import sys

SKIP = {"regenerate-openapi.sh", "bulk-recalculate.sh"}


def first_difference(expected, actual, pointer=""):
    if isinstance(expected, bool) or isinstance(actual, bool):
        return None if expected is actual else pointer
    if isinstance(expected, (int, float)) and isinstance(actual, (int, float)):
        return None if expected == actual else pointer
    if isinstance(expected, dict) and isinstance(actual, dict):
        for key in list(expected) + [k for k in actual if k not in expected]:
            if key not in expected or key not in actual:
                return pointer + "/" + key
            d = first_difference(expected[key], actual[key], pointer + "/" + key)
            if d is not None:
                return d
        return None
    if isinstance(expected, list) and isinstance(actual, list):
        for i, (e, a) in enumerate(zip(expected, actual)):
            d = first_difference(e, a, f"{pointer}/{i}")
            if d is not None:
                return d
        return None if len(expected) == len(actual) else f"{pointer}/{min(len(expected), len(actual))}"
    return None if expected == actual else pointer


def main():
    base_url = sys.argv[1]
    examples = pathlib.Path(__file__).resolve().parent.parent / "api-examples"
    passed = failed = 0
    for script in sorted(examples.glob("*.sh")):
        if script.name in SKIP:
            continue
        answer_file = script.with_suffix(".answer.json")
        name = script.stem
        if not answer_file.exists():
            print(f"FAIL {name}: no {answer_file.name}")
            failed += 1
            continue
        run = subprocess.run(["bash", str(script)], capture_output=True, text=True, timeout=120,
                             env=dict(os.environ, BASE_URL=base_url))
        if run.returncode != 0:
            print(f"FAIL {name}: exit {run.returncode}: {run.stderr.strip()[:300]} {run.stdout.strip()[:300]}")
            failed += 1
            continue
        try:
            served = json.loads(run.stdout)
        except ValueError as e:
            print(f"FAIL {name}: the answer is not JSON ({e})")
            failed += 1
            continue
        d = first_difference(json.loads(answer_file.read_text(encoding="utf-8")), served)
        if d is None:
            print(f"ok   {name}")
            passed += 1
        else:
            print(f"FAIL {name}: the answer differs from {answer_file.name} at {d or 'the root'}; "
                  "regenerate: mvn -B test -Dtest=ExamplesTest -Dexamples.regenerate=true")
            failed += 1
    print(f"examples: {passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
