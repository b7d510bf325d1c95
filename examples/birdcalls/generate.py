#!/usr/bin/env python3
"""Generates the invented demo scenario for `assay demo` (standard library only).

An invented paper, "ChirpNet: species identification from dawn-chorus clips", reports
accuracy, macro F1, top-3 accuracy and a one-vs-rest ROC AUC on its 4,000-clip test set.
A replicator re-ran the released model on a seeded random subsample of 400 clips. The
simulated model is slightly weaker on the rare species than the paper says, so the macro F1
claim should come out discrepant while accuracy does not. Everything here is made up.

Writes predictions.csv and subsample.txt next to this script (claims.yaml and audit.yaml are
written by hand). Re-running gives the same bytes.
"""
import hashlib
import math
import os
import random

HERE = os.path.dirname(os.path.abspath(__file__))
SPECIES = ["robin", "wren", "thrush", "warbler", "finch"]
FREQUENCY = [0.34, 0.26, 0.20, 0.12, 0.08]
# how strongly the model separates each species: the rare ones are hard
STRENGTH = {"robin": 3.4, "wren": 3.3, "thrush": 3.0, "warbler": 1.4, "finch": 1.1}
TEST_SIZE = 4000
SUBSAMPLE = 400
SEED = 4417


def softmax(xs):
    m = max(xs)
    e = [math.exp(x - m) for x in xs]
    s = sum(e)
    return [v / s for v in e]


def main():
    rng = random.Random(SEED)
    clips = []
    for i in range(TEST_SIZE):
        truth = rng.choices(SPECIES, weights=FREQUENCY)[0]
        logits = [rng.gauss(0.0, 1.0) for _ in SPECIES]
        logits[SPECIES.index(truth)] += STRENGTH[truth]
        probs = softmax(logits)
        clips.append((f"dc4k-{i + 1:05d}", truth, probs))

    ids = [c[0] for c in clips]
    chosen = sorted(random.Random(SEED + 1).sample(range(TEST_SIZE), SUBSAMPLE))
    with open(os.path.join(HERE, "subsample.txt"), "w") as f:
        digest = hashlib.sha256("\n".join(ids).encode()).hexdigest()
        f.write(f"# simple random sample of {SUBSAMPLE} of {TEST_SIZE} clips, seed {SEED + 1}\n")
        f.write(f"# sha256 of the full id list: {digest}\n")
        for j in chosen:
            f.write(ids[j] + "\n")
    with open(os.path.join(HERE, "predictions.csv"), "w") as f:
        f.write("clip_id,species,predicted," + ",".join("p_" + s for s in SPECIES) + "\n")
        for j in chosen:
            cid, truth, probs = clips[j]
            pred = SPECIES[max(range(len(SPECIES)), key=lambda k: probs[k])]
            f.write(f"{cid},{truth},{pred}," + ",".join(f"{p:.6f}" for p in probs) + "\n")

    # full-test-set values of the simulated model, for whoever tunes the scenario
    correct = sum(1 for _, t, p in clips if SPECIES[max(range(5), key=lambda k: p[k])] == t)
    print(f"full test set accuracy {correct / TEST_SIZE:.4f}")


if __name__ == "__main__":
    main()
