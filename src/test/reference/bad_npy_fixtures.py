"""Writes the bad .npy fixtures under src/test/resources/bad/npy/ (issue 9 catalogue).

Not a reference-value script: the fixtures are committed byte for byte and tests read them offline;
this records how they were made. Run with Debian's /usr/bin/python3 (python3-numpy).
The matrix is invented: 4 queries x 4 candidates, candidate j relevant to query j (--group-size 1).
"""
import os
import numpy as np

OUT = os.path.join(os.path.dirname(__file__), "..", "resources", "bad", "npy")
SCORES = np.array([[0.9, 0.1, 0.3, 0.2],
                   [0.6, 0.5, 0.1, 0.4],
                   [0.2, 0.7, 0.8, 0.1],
                   [0.3, 0.9, 0.4, 0.2]], dtype="<f4")


def save(name, array, **kw):
    with open(os.path.join(OUT, name), "wb") as f:
        np.lib.format.write_array(f, array, allow_pickle=True, **kw)


def raw(name, data):
    with open(os.path.join(OUT, name), "wb") as f:
        f.write(data)


def good_bytes():
    import io
    b = io.BytesIO()
    np.lib.format.write_array(b, SCORES, version=(1, 0))
    return b.getvalue()


os.makedirs(OUT, exist_ok=True)
save("big-endian.npy", SCORES.astype(">f4"), version=(1, 0))
save("version-2.npy", SCORES, version=(2, 0))
save("complex.npy", SCORES.astype("<c8"), version=(1, 0))
save("object.npy", np.array([[0.9, "x"], [0.1, None]], dtype=object), version=(1, 0))
save("vector.npy", SCORES[0].copy(), version=(1, 0))
save("cube.npy", SCORES.reshape(2, 2, 4).copy(), version=(1, 0))
save("fortran-order.npy", np.asfortranarray(SCORES), version=(1, 0))
nan = SCORES.copy()
nan[2, 1] = np.nan
save("nan.npy", nan, version=(1, 0))
good = good_bytes()
raw("truncated-body.npy", good[:-10])
raw("bad-magic.npy", b"\x93NUMPX" + good[6:])
raw("empty.npy", b"")
# the two-byte little-endian header length at offset 8 lies: longer than the file, then too short
longer = bytearray(good)
longer[8:10] = (60000).to_bytes(2, "little")
raw("header-length-too-long.npy", bytes(longer))
shorter = bytearray(good)
shorter[8:10] = (20).to_bytes(2, "little")
raw("header-length-too-short.npy", bytes(shorter))
