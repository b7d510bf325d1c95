#!/usr/bin/env python3
"""Generates the invented retrieval scenario for `assay demo` (standard library only).

An invented paper, "QuayCLIP: matching harbour-camera photos and their captions", reports
Recall@1/5/10 in both directions and their sum (RSUM) on a 2,000-photo test set with three
captions per photo (6,000 captions). A replicator re-ran the released model for a seeded random
subsample of 150 photos: their 150 photo queries were scored against all 6,000 captions, and
their 450 caption queries against all 2,000 photos. Like many pipelines, the released code keeps
only the top 24 candidates per query and fills every other score with the sentinel -100, so a
claim at K = 50 cannot be checked from these files. The simulated model is a little weaker at
caption-to-photo R@1 than the paper says. Everything here is made up.

Writes scores-photo-to-caption.npy (150 x 6000, float32), scores-caption-to-photo.npy (450 x 2000),
relevance-photo-to-caption.json, relevance-caption-to-photo.json and subsample.txt next to this
script (claims.yaml and audit.yaml are written by hand). Re-running gives the same bytes.
"""
import array
import json
import os
import random
import struct
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
PHOTOS = 2000
CAPTIONS_PER_PHOTO = 3
SUBSAMPLE = 150
DEPTH = 24
SENTINEL = -100.0
SEED = 2024

# Rank of the first relevant candidate: probability of rank 1, of ranks 2-5, of ranks 6-10, of 11-24;
# the rest falls beyond the scored depth.
PHOTO_TO_CAPTION = [0.53, 0.28, 0.08, 0.07]
CAPTION_TO_PHOTO = [0.40, 0.30, 0.10, 0.10]


def first_rank(rng, shape):
    u = rng.random()
    bands = [(1, 1), (2, 5), (6, 10), (11, DEPTH)]
    for p, (lo, hi) in zip(shape, bands):
        if u < p:
            return rng.randint(lo, hi)
        u -= p
    return rng.randint(DEPTH + 1, 10 * DEPTH)


def rows(rng, queries, candidates, relevant_of, shape):
    """One score row per query: 24 real, strictly decreasing scores, the sentinel elsewhere."""
    out = []
    for q in queries:
        relevant = relevant_of(q)
        ranks = sorted(set([first_rank(rng, shape)] + [rng.randint(2, 4 * DEPTH) for _ in relevant[1:]]))
        while len(ranks) < len(relevant):  # distinct ranks for every relevant candidate
            ranks.append(ranks[-1] + 1)
        placed = dict(zip(ranks, relevant))
        others = [c for c in rng.sample(range(candidates), DEPTH + len(relevant)) if c not in relevant]
        row = array.array("f", [SENTINEL] * candidates)
        for position in range(1, DEPTH + 1):
            c = placed[position] if position in placed else others.pop()
            row[c] = 0.95 - 0.02 * position
        out.append(row)
    return out


def write_npy(path, matrix, columns):
    header = "{'descr': '<f4', 'fortran_order': False, 'shape': (%d, %d), }" % (len(matrix), columns)
    header += " " * (63 - (len(header) + 10) % 64) + "\n"  # pad so data starts on a 64-byte boundary
    with open(path, "wb") as f:
        f.write(b"\x93NUMPY\x01\x00" + struct.pack("<H", len(header)) + header.encode("latin1"))
        for row in matrix:
            if sys.byteorder != "little":
                row = array.array("f", row)
                row.byteswap()
            f.write(row.tobytes())


def main():
    rng = random.Random(SEED)
    photos = sorted(rng.sample(range(PHOTOS), SUBSAMPLE))
    captions = [p * CAPTIONS_PER_PHOTO + k for p in photos for k in range(CAPTIONS_PER_PHOTO)]
    p2c = rows(rng, photos, PHOTOS * CAPTIONS_PER_PHOTO,
               lambda p: [p * CAPTIONS_PER_PHOTO + k for k in range(CAPTIONS_PER_PHOTO)], PHOTO_TO_CAPTION)
    c2p = rows(rng, captions, PHOTOS, lambda c: [c // CAPTIONS_PER_PHOTO], CAPTION_TO_PHOTO)
    write_npy(os.path.join(HERE, "scores-photo-to-caption.npy"), p2c, PHOTOS * CAPTIONS_PER_PHOTO)
    write_npy(os.path.join(HERE, "scores-caption-to-photo.npy"), c2p, PHOTOS)
    # relevance by row index of the matrix -> column indices
    with open(os.path.join(HERE, "relevance-photo-to-caption.json"), "w") as f:
        json.dump({str(i): [p * CAPTIONS_PER_PHOTO + k for k in range(CAPTIONS_PER_PHOTO)]
                   for i, p in enumerate(photos)}, f, indent=0)
        f.write("\n")
    with open(os.path.join(HERE, "relevance-caption-to-photo.json"), "w") as f:
        json.dump({str(i): [c // CAPTIONS_PER_PHOTO] for i, c in enumerate(captions)}, f, indent=0)
        f.write("\n")
    with open(os.path.join(HERE, "subsample.txt"), "w") as f:
        f.write("# photo ids of the seeded random subsample (seed %d, %d of %d photos)\n" % (SEED, SUBSAMPLE, PHOTOS))
        for p in photos:
            f.write("photo-%04d\n" % p)


if __name__ == "__main__":
    main()
