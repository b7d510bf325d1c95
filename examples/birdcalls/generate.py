#!/usr/bin/env python3
"""Generates the invented demo scenario for `assay demo` (standard library only).

An invented paper, "ChirpNet: species identification from dawn-chorus clips", reports
accuracy, macro F1, top-3 accuracy and a one-vs-rest ROC AUC on its 4,000-clip test set.
A replicator re-ran the released model on a seeded random subsample of 400 clips. The
simulated model is slightly weaker on the rare species than the paper says, so the macro F1
claim should come out discrepant while accuracy does not. Everything here is made up.

Writes test-ids.txt (the full test set's clip ids), subsample.txt and predictions.csv next to
this script (claims.yaml and audit.yaml are written by hand). Re-running gives the same bytes.

The subsample is drawn the way `assay sample test-ids.txt --n 400 --seed 4497` draws it, so that
command rewrites subsample.txt byte for byte and `assay audit` can redraw it: a partial
Fisher-Yates shuffle driven by SplitMix64 (Steele, Lea & Flood 2014, OOPSLA), the generator behind
Java's SplittableRandom, with its rejection rule for bounded integers, written out below from the
published algorithm.
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
SAMPLE_SEED = 4497
MASK64 = (1 << 64) - 1


class SplitMix64:
    """SplitMix64 with the golden-ratio gamma, as java.util.SplittableRandom(seed)."""
    GAMMA = 0x9E3779B97F4A7C15

    def __init__(self, seed):
        self.seed = seed & MASK64

    def next_seed(self):
        self.seed = (self.seed + self.GAMMA) & MASK64
        return self.seed

    def next_int(self):
        z = self.next_seed()
        z = ((z ^ (z >> 33)) * 0x62A9D9ED799705F5) & MASK64
        z = (((z ^ (z >> 28)) * 0xCB24D0A5C88C35B3) & MASK64) >> 32
        return z - (1 << 32) if z >= (1 << 31) else z          # a signed 32-bit int

    def next_below(self, bound):
        """A uniform integer in [0, bound), rejecting over-represented candidates."""
        r = self.next_int()
        m = bound - 1
        if bound & m == 0:
            return r & m
        u = (r & 0xFFFFFFFF) >> 1
        while True:
            r = u % bound
            if u + m - r < (1 << 31):                           # no signed 32-bit overflow: accept
                return r
            u = (self.next_int() & 0xFFFFFFFF) >> 1


def simple_random_sample(population, n, seed):
    """Sorted positions of n of population items: the first n of a seeded partial Fisher-Yates shuffle."""
    rng = SplitMix64(seed)
    a = list(range(population))
    for i in range(n):
        j = i + rng.next_below(population - i)
        a[i], a[j] = a[j], a[i]
    return sorted(a[:n])


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
    with open(os.path.join(HERE, "test-ids.txt"), "w") as f:
        for cid in ids:
            f.write(cid + "\n")
    chosen = simple_random_sample(TEST_SIZE, SUBSAMPLE, SAMPLE_SEED)
    with open(os.path.join(HERE, "subsample.txt"), "w") as f:
        digest = hashlib.sha256("\n".join(ids).encode()).hexdigest()
        f.write("# assay subsample manifest\n")
        f.write("# method: simple random sample without replacement\n")
        f.write(f"# seed: {SAMPLE_SEED}\n# n: {SUBSAMPLE}\n# N: {TEST_SIZE}\n# id list: test-ids.txt\n")
        f.write(f"# id list sha256: {digest} (the ids in file order joined by newlines, UTF-8)\n")
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
