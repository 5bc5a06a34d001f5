"""W1's check value computed by the NumPy reference's model code (w1_reference.py) from the
engine's OWN sampled inputs, read from the engine's member table (`engine members`, one row
per member with every sampled input). With the same inputs no sampling noise is left: the
two checks agree to rounding exactly when both compute the same model with the same
conventions (propagator, annual means, baseline, percentiles, exceedance).

Usage: python3 w1_same_inputs.py MEMBERS.csv
Prints one JSON line: impl, members, check. Uses the engine's conventions (the doubling
forcing the member feels, annual-mean temperatures). Needs numpy.
"""
import json
import sys

import numpy as np

import w1_reference as reference

# Agent columns of the member table, in W1's agent order (numpy drops the dashes of names).
AGENT_COLUMNS = ["co2", "ch4", "n2o", "otherwmghg", "ozone", "aerosolradiation", "aerosolcloud", "landuse"]


def main(argv):
    if len(argv) != 2:
        sys.exit("usage: python3 w1_same_inputs.py MEMBERS.csv")
    table = np.genfromtxt(argv[1], delimiter=",", names=True)
    missing = [c for c in AGENT_COLUMNS + ["ecs", "f2x"] if c not in table.dtype.names]
    if missing:
        sys.exit(f"w1_same_inputs: the member table has no column {', '.join(missing)}")
    scales = np.vstack([table[c] for c in AGENT_COLUMNS])
    step = reference.exact_propagators(
        feedback=scales[0] * table["f2x"] / table["ecs"],
        upper_capacity=table["upperHeatCapacity"],
        deep_capacity=table["deepHeatCapacity"],
        exchange=table["heatExchange"],
        efficacy=table["deepEfficacy"],
    )
    temperature = reference.simulate(step, reference.base_forcing().T @ scales, True)
    first, last = (year - reference.FIRST_YEAR for year in reference.BASELINE)
    anomaly = temperature - temperature[first:last + 1].mean(axis=0)
    percentiles = np.percentile(anomaly, reference.PERCENTILES, axis=1)
    share_above = (anomaly > reference.THRESHOLD_K).mean(axis=1)
    check = float(percentiles.sum() + share_above.sum())
    print(json.dumps({"impl": "numpy-same-inputs", "members": len(table), "check": round(check, 4)}))


if __name__ == "__main__":
    main(sys.argv)
