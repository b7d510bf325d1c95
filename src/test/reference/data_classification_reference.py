#!/usr/bin/python3
"""Independent reading of the classification fixtures in src/test/resources/data/.

Parses the fixtures with Python's csv module (RFC 4180 quoting) and json module, codes the labels
with scikit-learn's LabelEncoder (classes_ sorted; numeric when the labels are numbers) and takes
numpy.argmax over probability columns in class order (numpy returns the first maximum, i.e. the
lowest class code, on ties). Writes src/test/resources/data/reference-sklearn.json, which
ClassificationReaderReferenceTest compares against. Run from the repository root:
    /usr/bin/python3 src/test/reference/data_classification_reference.py
"""
import csv
import json
import pathlib
import sys

import numpy
import sklearn
from sklearn.preprocessing import LabelEncoder

DATA = pathlib.Path(__file__).resolve().parent.parent / "resources" / "data"


def read_rows(name):
    path = DATA / name
    if name.endswith(".jsonl"):
        rows = []
        for line in path.read_text(encoding="utf-8").splitlines():
            if not line.strip():
                continue
            obj = json.loads(line)
            for cls, p in obj.pop("probabilities", {}).items():
                obj["p_" + cls] = p
            rows.append({k: (v if isinstance(v, float) else str(v)) for k, v in obj.items()})
        return rows
    delimiter = "\t" if name.endswith(".tsv") else ","
    with open(path, newline="", encoding="utf-8-sig") as f:
        return list(csv.DictReader(f, delimiter=delimiter))


def numeric_if_possible(labels):
    try:
        return [int(x) for x in labels], True
    except ValueError:
        return list(labels), False


def case(name, truth_file=None):
    rows = read_rows(name)
    ids = [r["id"] for r in rows]
    if truth_file:
        truth_rows = read_rows(truth_file)
        truth_of = {r["id"]: r["label"] for r in truth_rows}
        truth = [truth_of[i] for i in ids]
        all_labels = [r["label"] for r in truth_rows]
    else:
        truth = [r["label"] for r in rows]
        all_labels = list(truth)
    p_classes = [k[2:] for k in rows[0] if k.startswith("p_")]
    encoder_input, numeric = numeric_if_possible(all_labels + p_classes)
    encoder = LabelEncoder().fit(encoder_input)
    convert = (lambda xs: [int(x) for x in xs]) if numeric else list
    out = {
        "ids": ids,
        "classes": [str(c) for c in encoder.classes_],
        "truth": encoder.transform(convert(truth)).tolist(),
    }
    if "prediction" in rows[0]:
        out["predicted"] = encoder.transform(convert([r["prediction"] for r in rows])).tolist()
    if "score" in rows[0]:
        out["scores"] = [float(r["score"]) for r in rows]
    if p_classes:
        matrix = numpy.array([[float(r["p_" + str(c)]) for c in encoder.classes_] for r in rows])
        out["probabilities"] = matrix.ravel().tolist()
        out["argmax"] = numpy.argmax(matrix, axis=1).tolist()
    return out


def main():
    versions = {"python": sys.version.split()[0], "numpy": numpy.__version__, "sklearn": sklearn.__version__}
    print("versions:", versions)
    cases = {n: case(n) for n in
             ["binary.csv", "binary.tsv", "binary.jsonl", "multiclass.csv", "multiclass.tsv", "multiclass.jsonl"]}
    cases["predictions-without-labels.csv+truth.csv"] = case("predictions-without-labels.csv", "truth.csv")
    target = DATA / "reference-sklearn.json"
    target.write_text(json.dumps({"versions": versions, "cases": cases}, indent=1) + "\n", encoding="utf-8")
    print("wrote", target)


if __name__ == "__main__":
    main()
