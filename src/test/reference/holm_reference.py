#!/usr/bin/python3
"""Reference values for org.assay.stats.Multiplicity.holm and .benjaminiHochberg.

Run with /usr/bin/python3 (Debian python3-statsmodels). Writes
src/test/resources/reference/holm_reference.json: each case holds the raw p-values (inputs),
statsmodels.stats.multitest.multipletests(p, method="holm")[1] (adjusted p-values, Holm 1979)
as "adjusted", and multipletests(p, method="fdr_bh")[1] (Benjamini & Hochberg 1995) as
"adjusted_bh".
"""
import json
import os
import sys

import numpy as np
import statsmodels
from statsmodels.stats.multitest import multipletests

print("python", sys.version.split()[0], "numpy", np.__version__, "statsmodels", statsmodels.__version__)

rng = np.random.default_rng(19790101)
cases = [
    [0.01, 0.04, 0.03, 0.005],
    [0.5],
    [0.0, 1.0, 0.2, 0.2, 0.04],          # ties and the ends of [0, 1]
    [0.02, 0.02, 0.02],
    [0.30, 0.001, 0.45, 0.012, 0.049, 0.051, 0.9],
    [float(x) for x in rng.uniform(0, 0.2, size=25)],
    [float(x) for x in np.round(rng.beta(0.3, 2.0, size=40), 3)],   # rounded: many ties
]
out_cases = []
for p in cases:
    adjusted = multipletests(p, method="holm")[1]
    adjusted_bh = multipletests(p, method="fdr_bh")[1]
    out_cases.append({"p": p, "adjusted": [float(x) for x in adjusted],
                      "adjusted_bh": [float(x) for x in adjusted_bh]})

out = {
    "generated_by": "src/test/reference/holm_reference.py with python %s, numpy %s, statsmodels %s"
                    % (sys.version.split()[0], np.__version__, statsmodels.__version__),
    "cases": out_cases,
}
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "resources", "reference",
                    "holm_reference.json")
with open(path, "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
print("wrote", os.path.normpath(path))
