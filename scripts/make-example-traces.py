#!/usr/bin/env python3
"""Computes the example trace files of docs/examples/ (simulated demo data).

The demo board is the workshop's 137 MHz preselector: three shunt LC resonators,
each tuned by a trimmer, coupled by small series ("top") capacitors, with series
capacitors coupling the end resonators to the 50 ohm source and load. The
network is cascaded with ABCD matrices and converted to S-parameters.

Writes, from 127.5 to 147.5 MHz in 401 points:
  docs/examples/psf-24-0001.s2p  a well-tuned board (Touchstone 1, # MHz S DB R 50)
  docs/examples/psf-24-0001.csv  the same data in BenchRunner's CSV layout
  docs/examples/psf-24-0002.s2p  the same circuit with the middle trimmer off
and prints the figures of both boards (centre, -3 dB bandwidth, insertion loss).

Standard library only. Run from anywhere: python3 scripts/make-example-traces.py
"""

import cmath
import math
import os

Z0 = 50.0                 # ohm, source and load
F0 = 137.5e6              # Hz, design centre
DESIGN_BW = 3.1e6         # Hz, design bandwidth of the prototype (gives about 3.0 MHz at -3 dB)
G = (1.0, 2.0, 1.0)       # 3-pole maximally flat low-pass prototype, g1..g3 (g0 = g4 = 1)
L_COIL = 47e-9            # H, each resonator coil
Q_COIL = 300.0            # unloaded Q of each resonator (coil loss as a shunt resistance)
C_FIXED = 22e-12          # F, fixed capacitor beside each trimmer
START_HZ, STEP_HZ, POINTS = 127_500_000, 50_000, 401

# Unloaded Q and insertion loss are tied: Cohn's estimate (from memory) for the
# centre loss is 4.343 * sum(g) / (FBW * Qu) dB. With FBW = 3.1/137.5 and
# sum(g) = 4, Qu = 300 gives about 2.6 dB; Qu = 120 would give about 6.4 dB.


def series(z):
    return ((1, z), (0, 1))


def shunt(y):
    return ((1, 0), (y, 1))


def cascade(a, b):
    return ((a[0][0] * b[0][0] + a[0][1] * b[1][0], a[0][0] * b[0][1] + a[0][1] * b[1][1]),
            (a[1][0] * b[0][0] + a[1][1] * b[1][0], a[1][0] * b[0][1] + a[1][1] * b[1][1]))


def s_parameters(m):
    """S11, S21, S12, S22 of an ABCD matrix between Z0 terminations (Pozar, Table 4.2)."""
    (a, b), (c, d) = m
    den = a + b / Z0 + c * Z0 + d
    s11 = (a + b / Z0 - c * Z0 - d) / den
    s21 = 2 / den
    s12 = 2 * (a * d - b * c) / den
    s22 = (-a + b / Z0 - c * Z0 + d) / den
    return s11, s21, s12, s22


def design():
    """Coupling capacitors and tuned trimmer settings of the nominal board.

    Coupling coefficients k = FBW / sqrt(g_i g_i+1) and external Q = g0 g1 / FBW
    (Matthaei, Young and Jones, coupled-resonator filters; from memory). Each
    trimmer is set so that its node, with the neighbouring nodes grounded,
    resonates at F0 (the usual one-resonator-at-a-time alignment).
    """
    w0 = 2 * math.pi * F0
    fbw = DESIGN_BW / F0
    c_res = 1 / (w0 * w0 * L_COIL)
    k = [fbw / math.sqrt(G[i] * G[i + 1]) for i in range(len(G) - 1)]
    qe = G[0] / fbw
    # The series end capacitor Ce into Z0 loads the node with G' = w^2 Ce^2 Z0 / (1 + (w Ce Z0)^2),
    # and external Q = w0 C / G'. Solve for Ce, then round to the E12 series as on the board.
    g_load = w0 * c_res / qe
    c_end = e12(math.sqrt(g_load / (Z0 - g_load * Z0 * Z0)) / w0)
    c_top = [e12(ki * c_res) for ki in k]
    c_end_shunt = c_end / (1 + (w0 * c_end * Z0) ** 2)  # Ce and Z0 seen from the node, as a capacitance
    nodes = []
    for i in range(len(G)):
        total = c_res
        if i > 0:
            total -= c_top[i - 1]
        if i < len(G) - 1:
            total -= c_top[i]
        if i in (0, len(G) - 1):
            total -= c_end_shunt
        nodes.append(total)
    trimmers = [c - C_FIXED for c in nodes]
    return c_end, c_top, trimmers


def e12(value):
    """The nearest E12 value (1.0, 1.2, 1.5, ... 8.2 per decade)."""
    series_values = (1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2, 10.0)
    decade = 10 ** math.floor(math.log10(value))
    return min((v * decade for v in series_values), key=lambda v: abs(math.log(v / value)))


def board(c_end, c_top, trimmers, f):
    w = 2 * math.pi * f
    r_loss = Q_COIL * 2 * math.pi * F0 * L_COIL
    m = series(1 / (1j * w * c_end))
    for i, trimmer in enumerate(trimmers):
        y = 1j * w * (C_FIXED + trimmer) + 1 / (1j * w * L_COIL) + 1 / r_loss
        m = cascade(m, shunt(y))
        if i < len(c_top):
            m = cascade(m, series(1 / (1j * w * c_top[i])))
    m = cascade(m, series(1 / (1j * w * c_end)))
    return s_parameters(m)


def db(x):
    return 20 * math.log10(abs(x))


def figures(freqs, s21):
    levels = [db(x) for x in s21]
    peak = max(levels)
    ip = levels.index(peak)
    edge = peak - 3

    def crossing(i, j):
        return freqs[i] + (freqs[j] - freqs[i]) * (edge - levels[i]) / (levels[j] - levels[i])

    lo = ip
    while lo > 0 and levels[lo] > edge:
        lo -= 1
    hi = ip
    while hi < len(levels) - 1 and levels[hi] > edge:
        hi += 1
    f_lo, f_hi = crossing(lo, lo + 1), crossing(hi - 1, hi)

    def at(hz):
        return levels[freqs.index(hz)]

    return {
        "centre_mhz": (f_lo + f_hi) / 2e6,
        "bw3_mhz": (f_hi - f_lo) / 1e6,
        "peak_db": peak,
        "peak_mhz": freqs[ip] / 1e6,
        "s21_130_db": at(130_000_000),
        "s21_137_5_db": at(137_500_000),
        "s21_145_db": at(145_000_000),
    }


def write_s2p(path, serial, note, freqs, data):
    with open(path, "w", encoding="ascii", newline="\n") as out:
        out.write(f"! {serial}: 137 MHz preselector board, three trimmer-tuned resonators\n")
        out.write("! Simulated demo data, not a measurement: computed by scripts/make-example-traces.py\n")
        out.write(f"! {note}\n")
        out.write("# MHz S DB R 50\n")
        out.write("! f/MHz S11:dB,deg S21:dB,deg S12:dB,deg S22:dB,deg\n")
        for f, (s11, s21, s12, s22) in zip(freqs, data):
            fields = [f"{f / 1e6:.3f}"]
            for x in (s11, s21, s12, s22):  # version 1 order: N11 N21 N12 N22
                fields.append(f"{db(x):.6f}")
                fields.append(f"{math.degrees(cmath.phase(x)):.6f}")
            out.write(" ".join(fields) + "\n")


def write_csv(path, serial, freqs, data):
    with open(path, "w", encoding="ascii", newline="\n") as out:
        out.write("# benchrunner-trace 1\n")
        out.write("# reference_ohms = 50\n")
        out.write(f"# {serial}: simulated demo data, not a measurement (scripts/make-example-traces.py)\n")
        out.write("frequency_hz,s11_re,s11_im,s21_re,s21_im,s12_re,s12_im,s22_re,s22_im\n")
        for f, row in zip(freqs, data):
            fields = [str(f)]
            for x in row:
                fields += [repr(x.real), repr(x.imag)]
            out.write(",".join(fields) + "\n")


def main():
    root = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    examples = os.path.join(root, "docs", "examples")
    os.makedirs(examples, exist_ok=True)

    c_end, c_top, trimmers = design()
    freqs = [START_HZ + STEP_HZ * i for i in range(POINTS)]

    # PSF-24-0001: tuned on the bench, each trimmer a few femtofarads from the ideal setting.
    good = [t + d for t, d in zip(trimmers, (0.02e-12, -0.03e-12, 0.01e-12))]
    # PSF-24-0002: the middle trimmer left 0.77 pF low (about 2.8 % of its node capacitance).
    detuned = [trimmers[0], trimmers[1] - 0.77e-12, trimmers[2]]

    boards = [
        ("PSF-24-0001", "psf-24-0001", good, "Tuned board."),
        ("PSF-24-0002", "psf-24-0002", detuned, "Middle trimmer mis-set (0.77 pF low): detuned, distorted passband."),
    ]

    print(f"end capacitors {c_end * 1e12:.2f} pF, top capacitors {c_top[0] * 1e12:.2f} pF, "
          f"coils {L_COIL * 1e9:.0f} nH (Q {Q_COIL:.0f}), fixed {C_FIXED * 1e12:.0f} pF + trimmers "
          + ", ".join(f"{t * 1e12:.2f}" for t in trimmers) + " pF")
    for serial, stem, setting, note in boards:
        data = [board(c_end, c_top, setting, f) for f in freqs]
        write_s2p(os.path.join(examples, stem + ".s2p"), serial, note, freqs, data)
        if stem == "psf-24-0001":
            write_csv(os.path.join(examples, stem + ".csv"), serial, freqs, data)
        fig = figures(freqs, [row[1] for row in data])
        print(f"{serial}: centre {fig['centre_mhz']:.3f} MHz, -3 dB bandwidth {fig['bw3_mhz']:.3f} MHz, "
              f"peak |S21| {fig['peak_db']:.2f} dB at {fig['peak_mhz']:.2f} MHz, "
              f"|S21| {fig['s21_130_db']:.2f} dB at 130 MHz, {fig['s21_137_5_db']:.2f} dB at 137.5 MHz, "
              f"{fig['s21_145_db']:.2f} dB at 145 MHz")


if __name__ == "__main__":
    main()
