#!/usr/bin/env python3
"""Reference values for the measured-waveform tests, computed with NumPy and SciPy.

Builds the test signals (a Gaussian pulse, a damped sine, an asymmetric pulse, a ringing pulse, a
Gaussian pulse with white noise, one with a DC offset, one cut by the record's end), writes each one's
samples to src/test/resources/reference/waveforms/<name>.csv (one column, 'amplitude', full double
precision) and the figures of each to waveform-numpy-scipy.csv beside them, computed independently of
the service with:
  numpy.fft.rfft            amplitude spectrum of the mean-removed record, zero-padded
  scipy.signal.windows.tukey the window of a record whose echo is cut (alpha 0.2)
  scipy.signal.hilbert      envelope |analytic signal| (N = power of two >= 2n)
  scipy.signal.resample     band-limited reconstruction, 1024 points per record sample, of the record
                            zero-padded to a power of two >= 2n; the worst sampling phase by brute force
                            over every fine-grid phase (the target interval is a whole number of fine
                            points), refined by a parabola through the lowest three phases
Definitions shared with the service: edges and durations by linear interpolation between the bins or
samples straddling the level; -X dB = 10^(-X/20); energy fractions of the one-sided power spectrum.
Run from the repository root:  python3 src/test/python/waveform_reference.py
"""
import math
import pathlib

import numpy as np
from scipy import signal

OUT = pathlib.Path("src/test/resources/reference/waveforms")
FS = 100.0          # record rate, MHz
TARGET = 25.0       # target rate, MHz (a whole number of fine points: 100 * 1024 / 25 = 4096)
FINE = 1024


def gauss(t, fc, bw):
    return signal.gausspulse(t, fc=fc, bw=bw, bwr=-6)


def signals():
    rng = np.random.default_rng(20261204)
    n = 400
    t = (np.arange(n) - 200.25) / FS
    yield "gaussian-5mhz-60", 0.8 * gauss(t, 5.0, 0.6)
    yield "gaussian-5mhz-60-dc-offset", 0.8 * gauss(t, 5.0, 0.6) + 0.3
    yield "gaussian-5mhz-60-noise", 0.8 * gauss(t, 5.0, 0.6) + rng.normal(0.0, 0.008, n)
    ts = (np.arange(n) - 120) / FS
    yield "damped-sine-4mhz", np.where(ts >= 0, np.exp(-ts / 0.35) * np.sin(2 * np.pi * 4.0 * ts), 0.0)
    ta = (np.arange(n) - 150) / FS
    env = np.where(ta >= 0, (ta / 0.08) ** 2 * np.exp(-ta / 0.08), 0.0)
    yield "asymmetric-5mhz", env * np.cos(2 * np.pi * 5.0 * ta)
    tr = (np.arange(n) - 150.5) / FS
    ring = np.where(tr >= 0.1, np.exp(-(tr - 0.1) / 0.5) * np.sin(2 * np.pi * 7.5 * (tr - 0.1)), 0.0)
    yield "ringing-5mhz", gauss(tr, 5.0, 0.7) + 0.45 * np.sin(np.pi / 2 * np.clip((tr - 0.1) / 0.1, 0, 1)) * ring
    tc = (np.arange(256) - 230.0) / FS
    yield "gaussian-cut-by-record", gauss(tc, 5.0, 0.5)


def pow2(n):
    p = 1
    while p < n:
        p <<= 1
    return p


def edges(mag, peak, thr, df):
    lo = hi = None
    for k in range(peak + 1, len(mag)):
        if mag[k] < thr:
            hi = (k - 1 + (mag[k - 1] - thr) / (mag[k - 1] - mag[k])) * df
            break
    for k in range(peak - 1, -1, -1):
        if mag[k] < thr:
            lo = (k + 1 - (mag[k + 1] - thr) / (mag[k + 1] - mag[k])) * df
            break
    return lo, hi


def analyse(x):
    n = len(x)
    y = x - x.mean()
    env = np.abs(signal.hilbert(y, N=pow2(2 * n))[:n])
    ip = int(np.argmax(env))
    cut = env[0] >= 0.1 * env[ip] or env[-1] >= 0.1 * env[ip]
    ys = y * signal.windows.tukey(n, 0.2) if cut else y
    nfft = max(1024, 8 * pow2(n))
    spec = np.fft.rfft(ys, nfft)
    mag = np.abs(spec)
    w = np.full(len(mag), 2.0)
    w[0] = w[-1] = 1.0
    power = w * mag ** 2
    df = FS / nfft
    kp = int(np.argmax(mag))
    fl, fu = edges(mag, kp, mag[kp] * 10 ** (-6 / 20), df)
    fl20, fu20 = edges(mag, kp, mag[kp] * 10 ** (-20 / 20), df)
    freqs = np.arange(len(mag)) * df
    near = power[freqs > 0.8 * FS / 2].sum() / power.sum()
    above = power[freqs > TARGET / 2].sum() / power.sum()
    a6, b6 = edges(env, ip, env[ip] * 10 ** (-6 / 20), 1 / FS)
    a20, b20 = edges(env, ip, env[ip] * 10 ** (-20 / 20), 1 / FS)
    d6 = b6 - a6 if a6 is not None and b6 is not None else None
    d20 = b20 - a20 if a20 is not None and b20 is not None else None
    # Band-limited reconstruction and the worst sampling phase (ABSOLUTE and POSITIVE_PEAK).
    padded = np.zeros(pow2(2 * n))
    padded[:n] = y
    fine = signal.resample(padded, len(padded) * FINE)[: FINE * (n - 1) + 1]
    step = int(round(FS * FINE / TARGET))
    losses = []
    for read in (np.abs(fine), fine):
        peak_index = int(np.argmax(read))
        a, b, c = read[peak_index - 1: peak_index + 2]
        peak = b - 0.25 * (a - c) * (0.5 * (a - c) / (a - 2 * b + c))
        usable = (len(read) // step) * step
        grid = read[:usable].reshape(-1, step)  # row j: phases p of sample j
        r = grid.max(axis=0)
        p = int(np.argmin(r))
        r0, r1, r2 = r[(p - 1) % step], r[p], r[(p + 1) % step]
        curvature = r0 - 2 * r1 + r2
        refined = r1 - 0.125 * (r0 - r2) ** 2 / curvature if curvature > 0 else r1
        losses.append(-20 * math.log10(min(refined, r1) / peak))
    return dict(peak_frequency_mhz=kp * df, lower_frequency_mhz=fl, upper_frequency_mhz=fu,
                lower_frequency_20db_mhz=fl20, upper_frequency_20db_mhz=fu20, pulse_duration_6db_us=d6,
                pulse_duration_20db_us=d20, energy_near_record_nyquist_fraction=near,
                energy_above_nyquist_fraction=above, loss_absolute_db=losses[0], loss_positive_peak_db=losses[1],
                window="TUKEY_20" if cut else "NONE")


def main():
    OUT.mkdir(parents=True, exist_ok=True)
    columns = None
    rows = []
    for name, x in signals():
        (OUT / f"{name}.csv").write_text("amplitude\n" + "".join(f"{v!r}\n" for v in map(float, x)))
        figures = analyse(np.asarray(x, dtype=float))
        columns = list(figures)
        rows.append([name] + ["" if figures[c] is None else (figures[c] if isinstance(figures[c], str)
                                                              else repr(float(figures[c]))) for c in columns])
    header = ("# Figures of the test waveforms (their samples in this folder) computed with NumPy "
              f"{np.__version__} and SciPy {__import__('scipy').__version__} by src/test/python/waveform_reference.py;\n"
              f"# record rate {FS} MHz, target rate {TARGET} MHz, DROP, no decimation. Empty: no such value.\n")
    lines = [",".join(["name"] + columns)] + [",".join(map(str, r)) for r in rows]
    (OUT / "waveform-numpy-scipy.csv").write_text(header + "\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
