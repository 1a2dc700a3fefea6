#!/usr/bin/env python3
"""Prints the README table of a JMH JSON result: benchmark, median, mean, target, met?"""
import json
import sys

# README "Performance", in ns per call.
US = 1_000.0
TARGETS = [
    ("ClosedFormBenchmarks.", 2 * US, "closed form < 2 us"),
    ("SetupCalculatorBenchmarks.", 2 * US, "closed form < 2 us"),
    ("PulseSearchBenchmarks.samplingPulseModelWithTolerance", 5_000 * US, "search + inverse < 5 ms"),
    ("PulseSearchBenchmarks.samplingPulseModel", 50 * US, "pulse-model search < 50 us"),
    ("PulseSearchBenchmarks.requiredPulseRate", 5_000 * US, "inverse < 5 ms"),
    ("SheetBenchmarks.", 200 * US, "sheet < 200 us"),
]
TO_NS = {"ns/op": 1.0, "us/op": 1e3, "ms/op": 1e6, "s/op": 1e9}


def fmt(ns):
    if ns < 10 * US:
        return f"{ns:,.0f} ns"
    if ns < 10_000 * US:
        return f"{ns / US:,.1f} us"
    return f"{ns / 1e6:,.1f} ms"


def main(path):
    rows = json.load(open(path))
    print("| benchmark | median | mean | target | met? |")
    print("| --- | --- | --- | --- | --- |")
    for r in rows:
        name = r["benchmark"].split("utdigit.bench.")[-1]
        params = r.get("params") or {}
        label = name + "".join(f" [{k}={v}]" for k, v in params.items())
        metric = r["primaryMetric"]
        scale = TO_NS[metric["scoreUnit"]]
        median = metric["scorePercentiles"]["50.0"] * scale
        mean = metric["score"] * scale
        target = next(((t, text) for prefix, t, text in TARGETS if name.startswith(prefix)), None)
        if target:
            met = "yes" if median < target[0] else "**no**"
            print(f"| {label} | {fmt(median)} | {fmt(mean)} | {target[1]} | {met} |")
        else:
            print(f"| {label} | {fmt(median)} | {fmt(mean)} | (none) | |")


if __name__ == "__main__":
    main(sys.argv[1] if len(sys.argv) > 1 else "target/jmh-result.json")
