#!/usr/bin/python3
"""Reference values for assay's retrieval data readers and metrics, computed with NumPy,
SciPy and scikit-learn.

Run with Debian's interpreter (/usr/bin/python3; packages python3-numpy, python3-scipy,
python3-sklearn). Writes
  src/test/resources/retrieval/*.npy, *.csv, *.json, *.jsonl   (small input fixtures)
  src/test/resources/reference/retrieval.json                   (inputs and expected values)
The Java tests (org.assay.data.retrieval, org.assay.metrics.retrieval) read them offline.

Definitions used here (the same as RetrievalMetrics; stated independently of the Java code):

Ranks. Scores are ranked in descending order; rank 1 is the best.
  OPTIMISTIC  - every tie group is ordered with its relevant candidates first (a real order,
                built below with numpy.lexsort); a relevant candidate's rank is its position.
  PESSIMISTIC - the same with the relevant candidates last in each tie group (the default).
  AVERAGE     - scipy.stats.rankdata(-scores, method='average'): each member of a tie group
                gets the mean of the group's positions.
Sentinel. The smallest value of the whole matrix is a sentinel when some query's list (in the
  direction being ranked) holds it at least twice. In a query whose list holds it m >= 2 times, the scored depth is
  candidates - m and a relevant candidate scored with the sentinel has rank +infinity ("not
  retrieved within the depth", written as null in the JSON). The data's depth is the minimum
  scored depth over queries. A metric with k > depth is "not computable" (null expected).
Metrics, per query with R relevant candidates of sorted ranks r_1 <= ... <= r_R, averaged over
queries (mean_rank/median_rank: mean/median over queries of r_1):
  recall_at_k          1 if r_1 <= k else 0
  relevant_recall_at_k #{r_i <= k} / R
  r_precision          #{r_i <= R} / R   (not computable when some query has R > scored depth)
  mrr                  1 / r_1           (not computable when some r_1 is infinite)
  mrr with k           1 / r_1 if r_1 <= k else 0
  mean_rank            r_1               (not computable when some r_1 is infinite)
  median_rank          numpy.median of r_1 over queries: the mean of the two middle values
                       for an even count
  ndcg_at_k            sum_{r_i <= k} 1/log2(r_i + 1) / sum_{j=1}^{min(R,k)} 1/log2(j + 1)
  map_at_k             (1 / min(R, k)) * sum_{r_i <= k} i / r_i
  rsum                 100 * (R@1 + R@5 + R@10 of rows-as-queries + the same of columns)
Weights: an integer weight w on query q means q repeated w times; the weighted expected values
are computed by repeating the per-query values (numpy.repeat) before averaging.
scikit-learn checks: on tie-free scores, ndcg_score(y_true, y_score, k=k) and the mean of
average_precision_score per query equal ndcg_at_k and map_at_k (k = candidates) under every tie
policy; on tied scores, ndcg_score (which averages gains within tie groups) lies per query
between the PESSIMISTIC and OPTIMISTIC ndcg_at_k.
"""
import json
import os
import sys

import numpy as np
import scipy
import sklearn
from scipy.stats import rankdata
from sklearn.metrics import average_precision_score, ndcg_score

HERE = os.path.dirname(os.path.abspath(__file__))
FIXTURES = os.path.join(HERE, "..", "resources", "retrieval")
OUT = os.path.join(HERE, "..", "resources", "reference", "retrieval.json")
POLICIES = ("OPTIMISTIC", "PESSIMISTIC", "AVERAGE")
INF = float("inf")


def ranks_of(scores, relevant, policy, sentinel):
    """Sorted ranks of the relevant candidates of one query (+inf inside a sentinel tail)."""
    n = len(scores)
    tail = 0
    if sentinel is not None:
        m = int(np.sum(scores == sentinel))
        tail = m if m >= 2 else 0
    is_rel = np.zeros(n, dtype=bool)
    is_rel[relevant] = True
    if policy == "AVERAGE":
        r = rankdata(-scores, method="average")
        out = [float(r[j]) for j in relevant]
    else:
        # lexsort sorts by the last key first: descending score, then relevant first (optimistic)
        # or last (pessimistic), then index for a deterministic order of the rest
        rel_key = (~is_rel if policy == "OPTIMISTIC" else is_rel).astype(int)
        order = np.lexsort((np.arange(n), rel_key, -scores))
        position = np.empty(n, dtype=int)
        position[order] = np.arange(1, n + 1)
        out = [float(position[j]) for j in relevant]
    if tail:
        out = [INF if scores[j] == sentinel else x for x, j in zip(out, relevant)]
    return sorted(out), n - tail


def detect_sentinel(queries_by_candidates):
    """The matrix minimum, when some query (a row of this orientation) holds it twice or more."""
    v = queries_by_candidates.min()
    repeated = any(np.sum(row == v) >= 2 for row in queries_by_candidates)
    return float(v) if repeated else None


def per_query(metric, k, ranks):
    ranks = np.asarray(ranks, dtype=float)
    R = len(ranks)
    first = ranks[0]
    if metric == "recall_at_k":
        return 1.0 if first <= k else 0.0
    if metric == "relevant_recall_at_k":
        return np.sum(ranks <= k) / R
    if metric == "r_precision":
        return np.sum(ranks <= R) / R
    if metric == "mrr":
        return 0.0 if (k is not None and first > k) or np.isinf(first) else 1.0 / first
    if metric in ("mean_rank", "median_rank"):
        return first
    if metric == "ndcg_at_k":
        dcg = np.sum(1.0 / np.log2(ranks[ranks <= k] + 1))
        ideal = np.sum(1.0 / np.log2(np.arange(1, min(R, k) + 1) + 1))
        return dcg / ideal
    if metric == "map_at_k":
        i = np.arange(1, R + 1)
        inside = ranks <= k
        return np.sum(i[inside] / ranks[inside]) / min(R, k)
    raise ValueError(metric)


def computable(metric, k, all_ranks, depths):
    depth = min(depths)
    if k is not None:
        return k <= depth
    if metric == "r_precision":
        return all(len(r) <= d for r, d in zip(all_ranks, depths))
    if metric in ("mrr", "mean_rank", "median_rank"):
        return all(not np.isinf(r[0]) for r in all_ranks)
    return True


def metric_values(all_ranks, depths, ks, weights):
    """Expected value (or None) of every metric, unweighted and weighted by repetition."""
    out, weighted = {}, {}
    specs = [("r_precision", None), ("mrr", None), ("mean_rank", None), ("median_rank", None)]
    for k in ks:
        specs += [("recall_at_k", k), ("relevant_recall_at_k", k), ("ndcg_at_k", k), ("map_at_k", k), ("mrr", k)]
    for metric, k in specs:
        key = metric if k is None else f"{metric}:k={k}"
        if not computable(metric, k, all_ranks, depths):
            out[key] = None
            weighted[key] = None
            continue
        values = np.array([per_query(metric, k, r) for r in all_ranks])
        repeated = np.repeat(values, weights)
        agg = np.median if metric == "median_rank" else np.mean
        out[key] = float(agg(values))
        weighted[key] = float(agg(repeated))
    return out, weighted


def direction(matrix, relevant, policy, sentinel):
    all_ranks, depths = [], []
    for q in range(matrix.shape[0]):
        r, d = ranks_of(matrix[q], relevant[q], policy, sentinel)
        all_ranks.append(r)
        depths.append(d)
    return all_ranks, depths


def json_ranks(all_ranks):
    return [[None if np.isinf(x) else x for x in r] for r in all_ranks]


def transpose_relevance(relevant, candidates):
    out = [[] for _ in range(candidates)]
    for q, rel in enumerate(relevant):
        for c in rel:
            out[c].append(q)
    return out


def recall_sum(all_ranks):
    firsts = np.array([r[0] for r in all_ranks])
    return sum(float(np.mean(firsts <= k)) for k in (1, 5, 10))


def build_case(name, matrix, relevant, ks, rng, fixture, sentinel_mode="detect"):
    matrix_path = os.path.join(FIXTURES, fixture)
    np.save(matrix_path, matrix)
    dirs = {}
    rsum = {}
    for side, m, rel in (("rows", matrix, relevant), ("columns", matrix.T, transpose_relevance(relevant, matrix.shape[1]))):
        sentinel = detect_sentinel(m) if sentinel_mode == "detect" else None
        weights = rng.integers(0, 4, m.shape[0])
        weights[0] = max(weights[0], 1)
        per_policy = {}
        for policy in POLICIES:
            all_ranks, depths = direction(m, rel, policy, sentinel)
            values, weighted = metric_values(all_ranks, depths, ks, weights)
            per_policy[policy] = {
                "ranks": json_ranks(all_ranks),
                "scored_depth": depths,
                "depth": min(depths),
                "expected": values,
                "expected_weighted": weighted,
            }
            rsum.setdefault(policy, {})[side] = (all_ranks, depths)
        dirs[side] = {"relevant": rel, "sentinel": sentinel, "weights": weights.tolist(), "policies": per_policy}
    rsum_expected = {}
    for policy in POLICIES:
        (ra, da), (rb, db) = rsum[policy]["rows"], rsum[policy]["columns"]
        rsum_expected[policy] = 100 * (recall_sum(ra) + recall_sum(rb)) if min(da) >= 10 and min(db) >= 10 else None
    return {
        "name": name,
        "matrix_file": fixture,
        "dtype": str(matrix.dtype.str),
        "shape": list(matrix.shape),
        "directions": dirs,
        "rsum": rsum_expected,
    }


def case_groups(rng):
    """Images x captions, 5 captions per image, scores on a coarse grid (ties) and a -100 tail."""
    images, group = 14, 5
    captions = images * group
    s = np.round(rng.normal(0, 1, (images, captions)), 1)
    for i in range(images):
        s[i, i * group:(i + 1) * group] += np.round(rng.uniform(0.5, 2.0), 1)
    # each image scores only its top-t captions (t >= 40), the rest get the sentinel -100;
    # some relevant captions fall into the tail
    for i in range(images):
        t = int(rng.integers(40, captions + 1))
        keep = np.argsort(-s[i], kind="stable")[:t]
        row = np.full(captions, -100.0)
        row[keep] = s[i, keep]
        s[i] = row
    s[3, 3 * group + 4] = -100.0   # a relevant caption of image 3 unscored
    relevant = [list(range(i * group, (i + 1) * group)) for i in range(images)]
    return s.astype(np.float32), relevant


def case_general(rng):
    """Queries with 1..4 relevant candidates each, scores on a grid of 0.25 (many ties)."""
    q, c = 31, 40
    s = np.round(rng.normal(0, 1, (q, c)) * 4) / 4
    relevant = []
    for i in range(q):
        r = sorted(rng.choice(c, size=int(rng.integers(1, 5)), replace=False).tolist())
        s[i, r] += rng.choice([0.0, 0.5, 1.0])
        relevant.append(r)
    # make sure every candidate is relevant to some query so the transpose has no empty query
    for j in range(c):
        if not any(j in r for r in relevant):
            i = int(rng.integers(0, q))
            relevant[i] = sorted(relevant[i] + [j])
    return s.astype(">f8"), relevant


def case_untied(rng):
    """Continuous scores without ties, for the scikit-learn comparison."""
    q, c = 24, 30
    s = rng.normal(0, 1, (q, c))
    relevant = []
    for i in range(q):
        r = sorted(rng.choice(c, size=int(rng.integers(1, 6)), replace=False).tolist())
        s[i, r] += 0.8
        relevant.append(r)
    for j in range(c):
        if not any(j in r for r in relevant):
            i = int(rng.integers(0, q))
            relevant[i] = sorted(relevant[i] + [j])
    assert all(len(np.unique(row)) == c for row in s)
    return s, relevant


def sklearn_block(matrix, relevant, ks):
    y_true = np.zeros(matrix.shape, dtype=int)
    for i, r in enumerate(relevant):
        y_true[i, r] = 1
    out = {f"ndcg_at_k:k={k}": float(ndcg_score(y_true, matrix, k=k)) for k in ks}
    out["map_full"] = float(np.mean([average_precision_score(y_true[i], matrix[i]) for i in range(len(relevant))]))
    per_query_ndcg = {str(k): [float(ndcg_score(y_true[i:i + 1], matrix[i:i + 1], k=k)) for i in range(len(relevant))]
                      for k in ks}
    return {"expected": out, "per_query_ndcg": per_query_ndcg}


def write_format_fixtures():
    """Small .npy files for the reader tests, each with a known content."""
    base = np.array([[0.5, -1.25, 3.0], [2.0, 0.125, -100.0]], dtype=np.float64)
    files = {}

    def save(name, arr, version=None):
        path = os.path.join(FIXTURES, name)
        if version is None:
            np.save(path, arr)
        else:
            with open(path, "wb") as f:
                np.lib.format.write_array(f, arr, version=version)
        files[name] = {"dtype": arr.dtype.str, "shape": list(arr.shape)}

    save("small_f4_le.npy", base.astype("<f4"))
    save("small_f8_le.npy", base.astype("<f8"))
    save("small_f4_be.npy", base.astype(">f4"))
    save("small_f8_be.npy", base.astype(">f8"))
    save("small_v2.npy", base.astype("<f8"), version=(2, 0))
    save("small_v3.npy", base.astype("<f4"), version=(3, 0))
    save("bad_int64.npy", base.astype(np.int64))
    save("bad_float16.npy", base.astype(np.float16))
    save("bad_fortran.npy", np.asfortranarray(base))
    save("bad_1d.npy", base.ravel())
    save("bad_3d.npy", base.reshape(1, 2, 3))
    save("bad_truncated.npy", base)
    with open(os.path.join(FIXTURES, "bad_truncated.npy"), "r+b") as f:
        size = f.seek(0, 2)
        f.truncate(size - 12)   # one and a half float64 values short
    files["bad_truncated.npy"]["truncated_bytes"] = 12
    with open(os.path.join(FIXTURES, "bad_trailing.npy"), "wb") as f:
        np.save(f, base)
        f.write(b"\0" * 8)
    # a matrix with NaN
    nan = base.copy()
    nan[1, 1] = np.nan
    save("bad_nan.npy", nan)
    # the same values as CSV, with a header of candidate ids and -inf as NumPy's savetxt writes it
    csv = base.copy()
    csv[1, 2] = -np.inf
    np.savetxt(os.path.join(FIXTURES, "small_header.csv"), csv, delimiter=",", header="c0,c1,c2", comments="", fmt="%r")
    np.savetxt(os.path.join(FIXTURES, "small_plain.csv"), base, delimiter=",", fmt="%r")
    return {"values": base.tolist(), "files": files}


def main():
    os.makedirs(FIXTURES, exist_ok=True)
    rng = np.random.default_rng(20261207)
    formats = write_format_fixtures()

    cases = []
    s, rel = case_groups(rng)
    cases.append(build_case("groups_sentinel", s, rel, (1, 5, 10, 40, 41, 70), rng, "groups_sentinel.npy"))
    s, rel = case_general(rng)
    cases.append(build_case("general_ties", s, rel, (1, 3, 5, 10, 31, 40), rng, "general_ties.npy"))
    s, rel = case_untied(rng)
    ks = (1, 3, 5, 10, 24, 30)
    case = build_case("untied", s, rel, ks, rng, "untied.npy")
    case["sklearn_rows"] = sklearn_block(s, rel, ks)
    cases.append(case)
    # scikit-learn on the tied case: bracketed by the pessimistic and optimistic values
    tied = cases[1]
    m = np.load(os.path.join(FIXTURES, "general_ties.npy"))
    cases[1]["sklearn_rows"] = sklearn_block(m.astype(float), tied["directions"]["rows"]["relevant"], (1, 3, 5, 10))

    # the general case's relevance as JSON by index and as CSV by id, for the reader tests
    rel = tied["directions"]["rows"]["relevant"]
    with open(os.path.join(FIXTURES, "general_ties_relevance.json"), "w") as f:
        json.dump({str(i): r for i, r in enumerate(rel)}, f)
    with open(os.path.join(FIXTURES, "general_ties_relevance.csv"), "w") as f:
        f.write("query,candidate\n")
        for i, r in enumerate(rel):
            for c in r:
                f.write(f"q{i},c{c}\n")

    # ranked lists: the untied case's rows truncated to 8 candidates each (relevant ones beyond 8
    # are "not retrieved within the listed depth")
    u = cases[2]
    lists_path = os.path.join(FIXTURES, "untied_top8.jsonl")
    rel_u = u["directions"]["rows"]["relevant"]
    ranked_expected = []
    with open(lists_path, "w") as f:
        for i in range(s.shape[0]):
            order = np.argsort(-s[i])[:8]
            f.write(json.dumps({"query": f"q{i}", "ranked": [f"c{j}" for j in order]}) + "\n")
            pos = {int(j): p + 1 for p, j in enumerate(order)}
            ranked_expected.append(sorted(float(pos.get(c, INF)) for c in rel_u[i]))
    with open(os.path.join(FIXTURES, "untied_relevance.json"), "w") as f:
        json.dump({f"q{i}": [f"c{c}" for c in r] for i, r in enumerate(rel_u)}, f)
    weights = np.ones(len(ranked_expected), dtype=int)
    values, _ = metric_values(ranked_expected, [8] * len(ranked_expected), (1, 5, 8, 9), weights)
    ranked = {"lists": "untied_top8.jsonl", "relevance": "untied_relevance.json",
              "ranks": json_ranks(ranked_expected), "depth": 8, "expected": values}

    doc = {
        "generated_by": f"numpy {np.__version__}, scipy {scipy.__version__}, sklearn {sklearn.__version__}, "
                        f"python {sys.version.split()[0]}",
        "script": "src/test/reference/retrieval_reference.py",
        "formats": formats,
        "cases": cases,
        "ranked_lists": ranked,
    }
    with open(OUT, "w") as f:
        json.dump(doc, f, indent=1, allow_nan=False)
        f.write("\n")
    print(doc["generated_by"])
    print("wrote", os.path.relpath(OUT), "and fixtures in", os.path.relpath(FIXTURES))


if __name__ == "__main__":
    main()
