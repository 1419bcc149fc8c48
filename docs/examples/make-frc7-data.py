#!/usr/bin/env python3
"""Writes frc-7-vapour-pressure.csv: INVENTED vapour-pressure data for FRC-7.

FRC-7 is a fictional heat-transfer fluid of the fictional company Fenwick Ridge
Chemicals. Nothing here was measured. The "measurements" are a made-up smooth
correlation plus seeded Gaussian noise, so that the fitting commands have data
whose true curve and scatter are known.

Made-up correlation (a Wagner 2.5-5 form):

    ln(P/Pc) = (Tc/T) * (A*tau + B*tau**1.5 + C*tau**2.5 + D*tau**5),  tau = 1 - T/Tc

with the invented constants below. Noise: each ln P gets an independent normal
deviate of standard deviation 0.003 (a 0.3 % relative standard uncertainty of P),
from Python's random module seeded with SEED, and the u(P) column states that
0.3 % of the tabulated pressure.

Run from anywhere: python3 docs/examples/make-frc7-data.py
"""

import math
import pathlib
import random

TC = 540.0       # K, invented
PC = 3.10e6      # Pa, invented
A = -7.62        # invented coefficients, chosen so that the acentric factor
B = 1.60         # of the curve, -log10(P(0.7 Tc)/Pc) - 1, is about 0.35
C = -3.00
D = -3.40

SEED = 20240607
RELATIVE_U = 0.003   # relative standard uncertainty of P, also the noise in ln P
T_FIRST, T_LAST, COUNT = 300.0, 480.0, 14   # K


def wagner_pressure(t_kelvin):
    """Pressure in Pa of the invented correlation at t_kelvin."""
    tau = 1.0 - t_kelvin / TC
    reduced = (TC / t_kelvin) * (A * tau + B * tau ** 1.5 + C * tau ** 2.5 + D * tau ** 5)
    return PC * math.exp(reduced)


def normal_boiling_point():
    """Temperature in K where the invented correlation gives 101325 Pa (bisection)."""
    low, high = 250.0, TC - 1.0
    for _ in range(200):
        middle = 0.5 * (low + high)
        if wagner_pressure(middle) < 101325.0:
            low = middle
        else:
            high = middle
    return 0.5 * (low + high)


def acentric_factor():
    return -math.log10(wagner_pressure(0.7 * TC) / PC) - 1.0


def main():
    rng = random.Random(SEED)
    out = pathlib.Path(__file__).with_name("frc-7-vapour-pressure.csv")
    lines = [
        "# INVENTED DATA - not measurements of any real substance.",
        "# FRC-7, a fictional heat-transfer fluid of the fictional Fenwick Ridge Chemicals.",
        "# Made by docs/examples/make-frc7-data.py from an invented Wagner 2.5-5 correlation",
        f"# (Tc = {TC:g} K, Pc = {PC / 1e6:g} MPa, A = {A}, B = {B}, C = {C}, D = {D})",
        f"# with seeded Gaussian noise of {RELATIVE_U:.1%} in ln P (seed {SEED}).",
        f"# Curve: acentric factor {acentric_factor():.4f}, normal boiling point {normal_boiling_point():.2f} K.",
        "# Format: docs/data-files.md. The 'run' column is a note and is ignored by the reader.",
        "T [degC],P [kPa],u(P) [kPa],run",
    ]
    step = (T_LAST - T_FIRST) / (COUNT - 1)
    for i in range(COUNT):
        celsius = round(T_FIRST + i * step - 273.15, 2)
        kelvin = celsius + 273.15
        pressure = wagner_pressure(kelvin) * math.exp(rng.gauss(0.0, RELATIVE_U))
        kpa = pressure / 1e3
        run = "ebulliometer" if kelvin < 400.0 else "static cell"
        lines.append(f"{celsius:.2f},{kpa:#.5g},{RELATIVE_U * kpa:#.2g},{run}")
    out.write_text("\n".join(lines) + "\n", encoding="utf-8")
    print(f"wrote {out} ({COUNT} points); acentric factor {acentric_factor():.4f}, "
          f"Tb {normal_boiling_point():.2f} K")


if __name__ == "__main__":
    main()
