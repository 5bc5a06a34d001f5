"""Benchmark workload W1 (README.md beside this file) as an analyst would write it in NumPy:
vectorised over members, a loop over years, every year's temperatures kept in one
members x years array, then numpy.percentile per year.

Usage: python3 w1_reference.py [MEMBERS=100000] [--temperature end-of-year|annual-mean]
                               [--feedback f2x|co2-scaled] [--seed S]
The defaults are W1's definition; the two options follow the engine's conventions where they
differ from it (README.md: "Where the engine's conventions differ").
Prints one JSON line: impl, members, years, total_s, sample_s, simulate_s, summarize_s,
member_years_per_s, check. --seed (default 20261205) seeds the random generator: the check
varies with it by sampling noise only. Needs numpy.
"""
import argparse
import json
import sys
import time

import numpy as np

FIRST_YEAR, LAST_YEAR = 1750, 2100
YEARS = LAST_YEAR - FIRST_YEAR + 1
BASELINE = (1850, 1900)
AGENT_AMPLITUDE = np.array([2.2, 0.6, 0.25, 0.4, 0.45, -0.35, -1.0, -0.2])
AGENT_SCALE_SD = np.array([0.1, 0.2, 0.15, 0.3, 0.5, 0.5, 0.7, 0.5])
PERCENTILES = [5, 17, 50, 83, 95]
THRESHOLD_K = 1.5


def base_forcing():
    """Each agent's forcing series before member scaling: amp[k] * (t/350)^(2.5 + 0.3k), shape (agents, years)."""
    fraction = np.arange(YEARS) / (YEARS - 1)
    exponents = 2.5 + 0.3 * np.arange(len(AGENT_AMPLITUDE))
    return AGENT_AMPLITUDE[:, None] * fraction[None, :] ** exponents[:, None]


def sample_members(rng, n, co2_scaled_feedback):
    """Agent scale factors (agents, n) and the two-layer parameters of each member.

    W1: lambda = F2x / ECS. The engine (0.3.0 on) takes the doubling forcing the member feels,
    its CO2 scale times F2x, so that holding doubled CO2 gives back the member's ECS.
    """
    scales = 1.0 + AGENT_SCALE_SD[:, None] * rng.standard_normal((len(AGENT_SCALE_SD), n))
    ecs = 3.0 * np.exp(0.3039 * rng.standard_normal(n))
    f2x = 3.93 + 0.24 * rng.standard_normal(n)
    doubling = scales[0] * f2x if co2_scaled_feedback else f2x
    params = {
        "feedback": doubling / ecs,
        "upper_capacity": np.maximum(3.0, rng.normal(8.0, 1.0, n)),
        "deep_capacity": np.maximum(20.0, rng.normal(100.0, 20.0, n)),
        "exchange": np.maximum(0.2, rng.normal(0.7, 0.1, n)),
        "efficacy": np.maximum(0.5, rng.normal(1.2, 0.2, n)),
    }
    return scales, params


def exact_propagators(feedback, upper_capacity, deep_capacity, exchange, efficacy):
    """The exact one-year step of C dT/dt = F - lambda T - eff gamma (T - Td), Cd dTd/dt = gamma (T - Td)
    for forcing held constant over the year, per member.

    With x = (T, Td), dx/dt = A x + b F, b = (1/C, 0): x(1) = E x(0) + M b F, where E = e^A and
    M = A^-1 (E - I) is the integral of e^(As) over the year. For a 2 x 2 matrix with eigenvalues
    mu +- d: e^A = e^mu [cosh(d) I + sinh(d)/d (A - mu I)]. The year's mean state is
    M x(0) + A^-1 (M - I) b F. Returns arrays for the end-of-year step and the upper-layer mean.
    """
    a11 = -(feedback + efficacy * exchange) / upper_capacity
    a12 = efficacy * exchange / upper_capacity
    a21 = exchange / deep_capacity
    a22 = -exchange / deep_capacity
    mu = 0.5 * (a11 + a22)
    det = a11 * a22 - a12 * a21
    d = np.sqrt(mu * mu - det)
    grow, ch, sh_over_d = np.exp(mu), np.cosh(d), np.sinh(d) / d
    e11, e12 = grow * (ch + sh_over_d * (a11 - mu)), grow * sh_over_d * a12
    e21, e22 = grow * sh_over_d * a21, grow * (ch + sh_over_d * (a22 - mu))
    m11 = (a22 * (e11 - 1) - a12 * e21) / det
    m12 = (a22 * e12 - a12 * (e22 - 1)) / det
    m21 = (-a21 * (e11 - 1) + a11 * e21) / det
    g1 = (a22 * (m11 - 1) - a12 * m21) / (upper_capacity * det)
    return {"e11": e11, "e12": e12, "e21": e21, "e22": e22, "f1": m11 / upper_capacity,
            "f2": m21 / upper_capacity, "m11": m11, "m12": m12, "g1": g1}


def simulate(step, forcing, annual_mean):
    """Temperature of every member in every year, shape (years, n): end-of-year state or the year's mean."""
    n = forcing.shape[1]
    upper, deep = np.zeros(n), np.zeros(n)
    temperature = np.empty((YEARS, n))
    for t in range(YEARS):
        f = forcing[t]
        if annual_mean:
            temperature[t] = step["m11"] * upper + step["m12"] * deep + step["g1"] * f
        upper, deep = (step["e11"] * upper + step["e12"] * deep + step["f1"] * f,
                       step["e21"] * upper + step["e22"] * deep + step["f2"] * f)
        if not annual_mean:
            temperature[t] = upper
    return temperature


def parse_args(argv):
    parser = argparse.ArgumentParser(description="Benchmark workload W1 in NumPy")
    parser.add_argument("members", nargs="?", type=int, default=100_000)
    parser.add_argument("--temperature", choices=["end-of-year", "annual-mean"], default="end-of-year")
    parser.add_argument("--feedback", choices=["f2x", "co2-scaled"], default="f2x")
    parser.add_argument("--seed", type=int, default=20261205)
    args = parser.parse_args(argv[1:])
    if args.members < 2:
        parser.error("MEMBERS must be at least 2")
    if args.seed < 0:
        parser.error("--seed must be a whole number of at least 0")
    return args


def main(argv):
    args = parse_args(argv)
    n = args.members
    base = base_forcing()

    start = time.perf_counter()
    scales, params = sample_members(np.random.default_rng(args.seed), n, args.feedback == "co2-scaled")
    step = exact_propagators(**params)
    sampled = time.perf_counter()

    forcing = base.T @ scales  # (years, n): each member's total forcing per year
    temperature = simulate(step, forcing, args.temperature == "annual-mean")
    simulated = time.perf_counter()

    first, last = (year - FIRST_YEAR for year in BASELINE)
    anomaly = temperature - temperature[first:last + 1].mean(axis=0)
    percentiles = np.percentile(anomaly, PERCENTILES, axis=1)  # linear interpolation: R type 7
    share_above = (anomaly > THRESHOLD_K).mean(axis=1)
    done = time.perf_counter()

    print(json.dumps({
        "impl": "numpy", "members": n, "years": YEARS, "total_s": round(done - start, 4),
        "sample_s": round(sampled - start, 4), "simulate_s": round(simulated - sampled, 4),
        "summarize_s": round(done - simulated, 4), "member_years_per_s": n * YEARS / (done - start),
        "check": round(float(percentiles.sum() + share_above.sum()), 4),
    }))


if __name__ == "__main__":
    main(sys.argv)
