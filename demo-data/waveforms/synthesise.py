#!/usr/bin/env python3
"""Writes the demo waveforms of Brindlewick Pressure Fabricators (the invented shop of the demo
library): recorded-style pulses of the shop's probes, SYNTHESISED here, not measured. Each is a
Gaussian-modulated carrier shaped like a real probe's echo (a housing ring, a fast rise and slow
decay, a little noise), recorded at a rate well above its band. For each probe it writes
<name>.json, a POST /api/waveform-analyses request judging the rate of one of the shop's technique
sheets, and <name>.csv, the same record as time_ns,amplitude. Standard library only (seeded noise),
so the files are reproducible:  python3 demo-data/waveforms/synthesise.py
"""
import json
import math
import pathlib
import random

HERE = pathlib.Path(__file__).resolve().parent


def gaussian(t, fc, bw):
    a = (math.pi * fc * bw) ** 2 / (4 * math.log(10 ** (6 / 20)))
    return math.exp(-a * t * t) * math.cos(2 * math.pi * fc * t)


def ring(t, start, fc, decay, rise):
    if t < start:
        return 0.0
    u = t - start
    return min(1.0, u / rise) * math.exp(-u / decay) * math.sin(2 * math.pi * fc * u)


def asymmetric(t, fc, rise):
    if t < 0:
        return 0.0
    return (t / rise) ** 2 * math.exp(2 - 2 * t / rise) * math.cos(2 * math.pi * fc * t)


PROBES = [
    # name, record rate MHz, samples, peak index, pulse(t), target request fields, what it stands for
    ("bpf-paut-5mhz-65", 100.0, 400, 150.3,
     lambda t: gaussian(t, 5.0, 0.65) + 0.25 * ring(t, 0.12, 6.9, 0.45, 0.08),
     {"sampling_frequency_mhz": 100, "decimation_factor": 6, "amplitude_tolerance_db": 2},
     "5 MHz 32-element linear array, one element's echo; sheet BPF-W-PAUT-02 (100 MHz, decimation 6)"),
    ("bpf-paut-4mhz-70", 100.0, 400, 150.6,
     lambda t: gaussian(t, 4.0, 0.7) + 0.4 * ring(t, 0.15, 4.4, 0.7, 0.1),
     {"sampling_frequency_mhz": 25, "amplitude_tolerance_db": 1},
     "4 MHz 16-element array with a ringing backing; sheet BPF-W-PAUT-04 (25 MHz, 1 dB)"),
    ("bpf-contact-2mhz-50", 50.0, 300, 100.0,
     lambda t: asymmetric(t, 2.0, 0.3),
     {"sampling_frequency_mhz": 50, "amplitude_tolerance_db": 2},
     "2 MHz 24 mm contact probe for forged flanges, fast rise and slow decay; sheet BPF-F-PE-01 (50 MHz)"),
    ("bpf-tfm-10mhz-60", 250.0, 500, 180.4,
     lambda t: gaussian(t, 10.0, 0.6) + 0.2 * ring(t, 0.06, 13.0, 0.25, 0.04),
     {"sampling_frequency_mhz": 100, "amplitude_tolerance_db": 2},
     "10 MHz 64-element array for TFM; sheet BPF-W-TFM-01 (100 MHz)"),
]


def main():
    rng = random.Random(20261204)
    lines = ["| file | probe (synthesised) |", "| --- | --- |"]
    for name, rate, n, peak, pulse, target, label in PROBES:
        samples = [round(0.8 * pulse((i - peak) / rate) + rng.gauss(0.0, 0.002), 5) for i in range(n)]
        request = {"samples": samples, "record_sampling_frequency_mhz": rate, **target}
        (HERE / f"{name}.json").write_text(json.dumps(request) + "\n")
        step_ns = 1000.0 / rate
        (HERE / f"{name}.csv").write_text("time_ns,amplitude\n"
                                          + "".join(f"{i * step_ns:.1f},{v}\n" for i, v in enumerate(samples)))
        lines.append(f"| `{name}` | {label} |")
    print("\n".join(lines))


if __name__ == "__main__":
    main()
