#!/usr/bin/env python3
"""Writes a batch CSV body of N rows of our own example requests to stdout.

    batch-csv.py quantization-assessments 1000000 > /tmp/q.csv

Values vary from row to row (a seeded generator) so that no row repeats the one before.
"""
import random
import sys

GENERATORS = {}


def generator(name, header):
    def register(f):
        GENERATORS[name] = (header, f)
        return f
    return register


@generator("quantization-assessments",
           "bit_depth,signal_height_percent_fsh,amplitude_tolerance_db,reference_height_percent_fsh,"
           "evaluation_level_db,averaging")
def quantization(r):
    return (f"{r.randint(8, 16)},{r.uniform(10, 100):.2f},{r.choice((0.5, 1, 2))},"
            f"{r.choice((50, 80, 100))},{r.choice((-6, -12, -14, -20))},{r.choice((1, 2, 4, 8))}")


@generator("sampling-assessments",
           "sampling_frequency_mhz,frequency_mhz,bandwidth_percent")
def sampling(r):
    # with bandwidth: the pulse-model search; no tolerance: the inverse search is not asked for
    return f"{r.choice((50, 62.5, 100, 125, 200))},{r.choice((2.25, 5, 7.5, 10))},{r.uniform(30, 90):.1f}"


@generator("technique-sheet-validations",
           "sheet_id,technique,profile_id,probe.frequency_mhz,probe.bandwidth_percent,probe.element_diameter_mm,"
           "material.velocity_m_per_s,material.thickness_mm,digitization.sampling_frequency_mhz,"
           "digitization.bit_depth,acquisition.pulse_repetition_frequency_hz,acquisition.scan_increment_mm,"
           "acquisition.gate_length_us,evaluation.reference_height_percent_fsh,evaluation.evaluation_level_db,"
           "evaluation.amplitude_tolerance_db")
def sheet(r):
    # a pulse-echo sheet with every section the common-practice profile reads
    return (f"S-{r.randrange(10**9)},PULSE_ECHO,common-practice,{r.choice((2.25, 5, 7.5))},{r.uniform(40, 80):.0f},"
            f"{r.choice((6, 10, 12.7))},5920,{r.uniform(6, 60):.1f},{r.choice((50, 100, 125))},"
            f"{r.choice((8, 12, 14))},{r.choice((500, 1000, 2000))},1,{r.choice((20, 30, 40))},80,-6,2")


def main():
    name, rows = sys.argv[1], int(sys.argv[2])
    header, row = GENERATORS[name]
    r = random.Random(20261201)
    out = sys.stdout
    out.write(header + "\n")
    out.writelines(row(r) + "\n" for _ in range(rows))


if __name__ == "__main__":
    main()
