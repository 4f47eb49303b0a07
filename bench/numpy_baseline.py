"""Numpy baseline for the positional scans (issue 4 benchmark).

Computes the same metrics as the TypeScript engine for one rotary config, vectorised over
chunks of positions: separationFloor, separationFloorOffset, discriminationSpan and, for fp32,
bf16 and fp16, collidingPositions, angleErrorMax, overflowPosition, blurredPairs. Prints one JSON
object. Usage: python3 numpy_baseline.py T RUNS < frequencies.json, where the JSON array holds the
frequencies θ'_i exactly as the engine computed them (so both sides scan identical inputs).
Prints {"skipped": "..."} when numpy is missing.
"""
import json
import math
import sys
import time

try:
    import numpy as np
except ImportError:  # the benchmark reports the skip
    print(json.dumps({"skipped": "numpy is not installed"}))
    sys.exit(0)

CHUNK = 8192
BF16_MAX = (2 - 2.0 ** -7) * 2.0 ** 127


def round_bf16(x):
    """Round binary64 once to bfloat16 (8 significant bits, binary32 exponent range), ties to even."""
    m, e = np.frexp(x)  # x = m * 2^e, 0.5 <= |m| < 1
    e = np.maximum(e, -125)  # below 2^-126 the spacing stays at the subnormal step
    y = np.ldexp(np.rint(np.ldexp(x, 8 - e)), e - 8)
    return np.where(np.abs(y) > BF16_MAX, np.copysign(np.inf, x), y)


def round_to(x, fmt):
    if fmt == "fp32":
        return x.astype(np.float32).astype(np.float64)
    if fmt == "fp16":
        return x.astype(np.float16).astype(np.float64)
    return round_bf16(x)


def scan(T, theta):
    P = theta.size
    best_floor, best_k, negative = math.inf, None, None
    for k0 in range(1, T, CHUNK):
        k = np.arange(k0, min(T, k0 + CHUNK), dtype=np.float64)
        sums = np.cos(np.outer(k, theta)).sum(axis=1)
        floors = np.sqrt(2 * (1 - sums / P))
        j = int(np.argmin(floors))
        if floors[j] < best_floor:
            best_floor, best_k = float(floors[j]), int(k[j])
        if negative is None:
            neg = np.nonzero(sums < 0)[0]
            if neg.size:
                negative = int(k[neg[0]])
    out = {"separationFloor": best_floor, "separationFloorOffset": best_k, "discriminationSpan": negative}
    with np.errstate(over="ignore", invalid="ignore"):
        for fmt in ("fp32", "bf16", "fp16"):
            t = round_to(theta, fmt)
            colliding, err, overflow = 0, 0.0, None
            blurred = np.zeros(P, dtype=bool)
            prev_pos, prev_angle = None, None
            for p0 in range(0, T, CHUNK):
                p = np.arange(p0, min(T, p0 + CHUNK), dtype=np.float64)
                fp = round_to(p, fmt)
                angle = round_to(fp[:, None] * t[None, :], fmt)
                bad = ~np.isfinite(fp) | ~np.isfinite(angle).all(axis=1)
                if overflow is None and bad.any():
                    overflow = int(p[np.argmax(bad)])
                err = max(err, float(np.nanmax(np.abs(angle - p[:, None] * theta[None, :]))))
                full_pos = fp if prev_pos is None else np.concatenate(([prev_pos], fp))
                same = (full_pos[1:] == full_pos[:-1]) | ~np.isfinite(full_pos[1:])
                colliding += int(same.sum())
                full_angle = angle if prev_angle is None else np.vstack((prev_angle, angle))
                blurred |= (full_angle[1:] == full_angle[:-1]).any(axis=0)
                prev_pos, prev_angle = fp[-1], angle[-1:]
            out[fmt] = {
                "collidingPositions": colliding,
                "angleErrorMax": None if overflow is not None else err,
                "overflowPosition": overflow,
                "blurredPairs": int(blurred.sum()),
            }
    return out


def main():
    T, runs = int(sys.argv[1]), int(sys.argv[2])
    theta = np.array(json.load(sys.stdin), dtype=np.float64)
    times, result = [], None
    for _ in range(runs):
        start = time.perf_counter()
        result = scan(T, theta)
        times.append((time.perf_counter() - start) * 1000)
    times.sort()
    print(json.dumps({"numpy": np.__version__, "ms": times, "medianMs": times[len(times) // 2], "result": result}))


if __name__ == "__main__":
    main()
