#!/usr/bin/python3
"""Writes the invented, seeded data of one side-by-side workload (src/bench/compare.sh).

Usage: /usr/bin/python3 generate.py KIND N OUT [--seed S]
  classification N OUT.csv   id,label,prediction,score for N examples (binary labels)
  generation N OUT.jsonl     N items {"id", "hypothesis", "references": [one]} of invented words
  retrieval Q OUT.npy        a Q x 5Q float32 score matrix; candidate j is relevant to query j // 5

Needs only Debian's python3-numpy. The same arguments always give the same bytes.
"""
import argparse
import json

import numpy as np


def classification(n, out, rng):
    """Labels with P(1) = 0.4; the score is N(label, 1) on a logistic scale, so ROC AUC is about 0.76
    and thresholding it at 0.5 gives an accuracy of about 0.69."""
    label = (rng.random(n) < 0.4).astype(np.int64)
    score = 1.0 / (1.0 + np.exp(-(rng.standard_normal(n) + label - 0.5)))
    score = np.round(score, 6)           # six printed decimals: both readers see the same numbers
    prediction = (score > 0.5).astype(np.int64)
    with open(out, "w", encoding="utf-8") as f:
        f.write("id,label,prediction,score\n")
        step = 100_000
        for start in range(0, n, step):
            stop = min(n, start + step)
            f.writelines(f"{i},{label[i]},{prediction[i]},{score[i]:.6f}\n" for i in range(start, stop))


def invented_words(count, rng):
    """Pronounceable invented words: two or three consonant-vowel syllables, distinct."""
    consonants = list("bdfgklmnprstvz")
    vowels = list("aeiou")
    words = set()
    while len(words) < count:
        k = rng.integers(2, 4)
        words.add("".join(consonants[rng.integers(len(consonants))] + vowels[rng.integers(len(vowels))]
                          for _ in range(k)))
    return sorted(words)


def generation(n, out, rng):
    """A reference of 8-30 Zipf-distributed words; the hypothesis keeps each word with probability 0.7,
    replaces it otherwise, and now and then drops or adds one, so corpus BLEU is about 0.3."""
    vocab = invented_words(3000, rng)
    weights = 1.0 / np.arange(1, len(vocab) + 1)
    weights /= weights.sum()
    with open(out, "w", encoding="utf-8") as f:
        for i in range(n):
            length = int(rng.integers(8, 31))   # 8+ words: no hypothesis shorter than the 4-gram order
            ref = rng.choice(len(vocab), size=length, p=weights)
            u = rng.random(length)
            others = rng.choice(len(vocab), size=2 * length, p=weights)   # replacements and additions
            added = rng.random(length) < 0.05
            hyp = []
            for j, w in enumerate(ref):
                if u[j] < 0.05:
                    continue                      # dropped
                hyp.append(w if u[j] < 0.75 else others[j])
                if added[j]:
                    hyp.append(others[length + j])
            item = {"id": f"s{i}", "hypothesis": " ".join(vocab[w] for w in hyp),
                    "references": [" ".join(vocab[w] for w in ref)]}
            f.write(json.dumps(item) + "\n")


def retrieval(queries, out, rng):
    """Standard normal scores; the five relevant candidates of each query get +3, so the first relevant
    candidate is ranked first for about half of the queries."""
    group = 5
    matrix = np.lib.format.open_memmap(out, mode="w+", dtype="<f4", shape=(queries, group * queries))
    step = 250
    for start in range(0, queries, step):
        stop = min(queries, start + step)
        block = rng.standard_normal((stop - start, group * queries), dtype=np.float32)
        for q in range(start, stop):
            block[q - start, group * q:group * (q + 1)] += 3.0
        matrix[start:stop] = block
    matrix.flush()
    del matrix


def main():
    p = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    p.add_argument("kind", choices=["classification", "generation", "retrieval"])
    p.add_argument("n", type=int)
    p.add_argument("out")
    p.add_argument("--seed", type=int, default=7)
    a = p.parse_args()
    rng = np.random.default_rng(a.seed)
    {"classification": classification, "generation": generation, "retrieval": retrieval}[a.kind](a.n, a.out, rng)


if __name__ == "__main__":
    main()
