"""angleErrorMax in fp32 by numpy's own binary32 arithmetic, as an outside reference.

Reads JSON {"theta": [...], "span": T} on stdin and prints max |fl32(fl32(p) * fl32(theta_i)) - p theta_i|
over p in [0, T): the position and the frequency are cast to float32 (round to nearest, ties to
even), multiplied in float32 (IEEE 754 binary32, one rounding), and compared with p theta_i in
float64. Chunked, so memory stays small for spans past 2^25.
"""
import json
import sys

import numpy as np

request = json.load(sys.stdin)
span = int(request["span"])
worst = 0.0
CHUNK = 1 << 22
for theta in request["theta"]:
    t32 = np.float32(theta)
    for start in range(0, span, CHUNK):
        p = np.arange(start, min(span, start + CHUNK), dtype=np.float64)
        angle = (p.astype(np.float32) * t32).astype(np.float64)
        worst = max(worst, float(np.max(np.abs(angle - p * theta))))
print(json.dumps({"angleErrorMax": worst, "numpy": np.__version__}))
