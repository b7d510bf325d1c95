#!/usr/bin/python3
"""The reference side of src/bench/compare.sh: the same computation as `assay measure`, done the way a
user of the general-purpose Python stack would, with Debian's packages (run with /usr/bin/python3).

Usage: /usr/bin/python3 reference.py WORKLOAD FILE OUT.json [--resamples B] [--method M] [--seed S]
  accuracy FILE.csv   scipy.stats.bootstrap of the mean of (label == prediction), vectorized
  roc_auc  FILE.csv   scipy.stats.bootstrap of sklearn.metrics.roc_auc_score, paired over examples
  bleu     FILE.jsonl scipy.stats.bootstrap of nltk corpus_bleu over sentences (whitespace tokens)
  recall   FILE.npy   Recall@1/5/10 (hit rate) with the Clopper-Pearson interval, memory-mapped numpy

Writes {"generated_by", "results": [{"metric", "value", "lower", "upper", "standard_error", "method"}]}.
The resampling batch sizes only bound the memory SciPy's vectorized resampling takes (its default
materialises resamples x n indices at once, tens of GB at these sizes); they do not change the result.
"""
import argparse
import json
import sys
import time

import numpy as np
import pandas
import scipy
import scipy.stats


def versions():
    out = {"python": sys.version.split()[0], "numpy": np.__version__, "scipy": scipy.__version__,
           "pandas": pandas.__version__}
    for name in ("sklearn", "nltk"):
        if name in sys.modules:
            out[name] = sys.modules[name].__version__
    return out


def interval(res, estimate, metric, method):
    return {"metric": metric, "value": float(estimate), "lower": float(res.confidence_interval.low),
            "upper": float(res.confidence_interval.high), "standard_error": float(res.standard_error),
            "method": "scipy.stats.bootstrap " + method}


def accuracy(a):
    frame = pandas.read_csv(a.file, usecols=["label", "prediction"])
    correct = (frame["label"].to_numpy() == frame["prediction"].to_numpy()).astype(np.float64)
    n = correct.size
    # at most ~200 MB of int64 indices per batch of resamples (and per batch of jackknife rows)
    batch = max(1, 25_000_000 // n)
    res = scipy.stats.bootstrap((correct,), np.mean, n_resamples=a.resamples, method=a.method, batch=batch,
                                vectorized=True, random_state=np.random.default_rng(a.seed))
    return [interval(res, correct.mean(), "accuracy", a.method)]


def roc_auc(a):
    from sklearn.metrics import roc_auc_score
    frame = pandas.read_csv(a.file, usecols=["label", "score"])
    y = frame["label"].to_numpy()
    s = frame["score"].to_numpy()
    # paired=True bootstraps the example indices; without a batch SciPy's jackknife builds all n x (n - 1)
    # of them at once (about 20 GB of RSS at n = 20,000)
    res = scipy.stats.bootstrap((y, s), roc_auc_score, paired=True, vectorized=False, n_resamples=a.resamples,
                                method=a.method, batch=1000, random_state=np.random.default_rng(a.seed))
    return [interval(res, roc_auc_score(y, s), "roc_auc", a.method)]


def bleu(a):
    from nltk.translate.bleu_score import corpus_bleu
    hyps, refs = [], []
    with open(a.file, encoding="utf-8") as f:
        for line in f:
            item = json.loads(line)
            hyps.append(item["hypothesis"].split())
            refs.append([r.split() for r in item["references"]])

    def statistic(index):
        chosen = index.astype(np.int64)
        return corpus_bleu([refs[i] for i in chosen], [hyps[i] for i in chosen])

    index = np.arange(len(hyps))
    res = scipy.stats.bootstrap((index,), statistic, vectorized=False, n_resamples=a.resamples, method=a.method,
                                random_state=np.random.default_rng(a.seed))
    return [interval(res, corpus_bleu(refs, hyps), "bleu", a.method)]


def recall(a):
    """Candidate j is relevant to query j // 5 (src/bench/generate.py). The first relevant candidate's rank
    counts every candidate scored at least as high as the best relevant one (ties pessimistic, as assay's
    default); a hit at K is that rank <= K."""
    scores = np.load(a.file, mmap_mode="r")
    queries, candidates = scores.shape
    group = candidates // queries
    ranks = np.empty(queries, dtype=np.int64)
    step = 200
    for start in range(0, queries, step):
        block = np.asarray(scores[start:start + step])
        q = np.arange(start, start + block.shape[0])
        relevant = block.reshape(block.shape[0], queries, group)[np.arange(block.shape[0]), q]
        best = relevant.max(axis=1)
        ranks[start:start + block.shape[0]] = (block >= best[:, None]).sum(axis=1)
    out = []
    for k in (1, 5, 10):
        hits = int((ranks <= k).sum())
        ci = scipy.stats.binomtest(hits, queries).proportion_ci(0.95, method="exact")
        out.append({"metric": f"recall_at_k:k={k}", "value": hits / queries, "lower": float(ci.low),
                    "upper": float(ci.high), "standard_error": float(np.sqrt(hits / queries * (1 - hits / queries) / queries)),
                    "method": "scipy.stats.binomtest exact (Clopper-Pearson)"})
    return out


def main():
    p = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    p.add_argument("workload", choices=["accuracy", "roc_auc", "bleu", "recall"])
    p.add_argument("file")
    p.add_argument("out")
    p.add_argument("--resamples", type=int, default=2000)
    p.add_argument("--method", default="BCa", choices=["BCa", "percentile", "basic"])
    p.add_argument("--seed", type=int, default=1)
    a = p.parse_args()
    started = time.perf_counter()
    results = {"accuracy": accuracy, "roc_auc": roc_auc, "bleu": bleu, "recall": recall}[a.workload](a)
    with open(a.out, "w", encoding="utf-8") as f:
        json.dump({"generated_by": versions(), "seconds_in_python": time.perf_counter() - started,
                   "resamples": a.resamples, "results": results}, f, indent=1)


if __name__ == "__main__":
    main()
