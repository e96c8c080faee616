#!/usr/bin/env python3
"""Draws Quire's icon (an original design, drawn by this script): a ring, the cross-section of a pipe, with a
bell curve of a probability distribution rising inside it and a short stroke at the lower right that makes the
ring a Q. Writes PNG files of the given sizes with numpy and zlib only.

usage: make-icon.py OUT_DIR [SIZE...]   (default sizes: 16 32 48 64 128 256)
"""
import sys, zlib, struct, os
import numpy as np

BG = np.array([0x1d, 0x4e, 0x6e]) / 255.0      # deep blue-teal
RING = np.array([0xf4, 0xf7, 0xf9]) / 255.0    # near white
CURVE = np.array([0xf2, 0xa9, 0x3b]) / 255.0   # amber


def coverage(d, aa):
    """Signed distance (negative inside) to pixel coverage, with an edge of width aa."""
    return np.clip(0.5 - d / aa, 0.0, 1.0)


def segment_distance(x, y, x0, y0, x1, y1):
    dx, dy = x1 - x0, y1 - y0
    t = np.clip(((x - x0) * dx + (y - y0) * dy) / (dx * dx + dy * dy), 0, 1)
    return np.hypot(x - (x0 + t * dx), y - (y0 + t * dy))


def draw(size):
    ss = 4
    n = size * ss
    c = (np.arange(n) + 0.5) / n
    x, y = np.meshgrid(c, c)
    aa = 1.0 / n * 1.5
    img = np.zeros((n, n, 3))
    alpha = np.zeros((n, n))
    # rounded square
    r = 0.2
    qx = np.abs(x - 0.5) - (0.5 - 0.03 - r)
    qy = np.abs(y - 0.5) - (0.5 - 0.03 - r)
    d_bg = np.hypot(np.maximum(qx, 0), np.maximum(qy, 0)) + np.minimum(np.maximum(qx, qy), 0) - r
    a = coverage(d_bg, aa)
    img += a[..., None] * BG
    alpha = a
    # ring
    cx, cy, rr, w = 0.47, 0.47, 0.29, 0.075 if size >= 32 else 0.10
    d_ring = np.abs(np.hypot(x - cx, y - cy) - rr) - w / 2
    a = coverage(d_ring, aa) * alpha
    img = img * (1 - a[..., None]) + a[..., None] * RING
    # bell curve inside the ring, clipped to the ring's inner disc
    sigma = 0.085
    base = cy + 0.15
    height = 0.27
    yc = base - height * np.exp(-0.5 * ((x - cx) / sigma) ** 2)
    inner = np.hypot(x - cx, y - cy) - (rr - w / 2)
    lw = 0.045 if size >= 32 else 0.07
    d_curve = np.maximum(np.abs(y - yc) - lw / 2, inner)
    a = coverage(d_curve, aa) * alpha
    img = img * (1 - a[..., None]) + a[..., None] * CURVE
    # the tail of the Q
    d_tail = segment_distance(x, y, cx + 0.17, cy + 0.17, cx + 0.33, cy + 0.33) - (w * 0.55)
    a = coverage(d_tail, aa) * alpha
    img = img * (1 - a[..., None]) + a[..., None] * CURVE
    # downsample
    img = img.reshape(size, ss, size, ss, 3).mean(axis=(1, 3))
    alpha = alpha.reshape(size, ss, size, ss).mean(axis=(1, 3))
    rgb = np.where(alpha[..., None] > 0, img / np.maximum(alpha[..., None], 1e-9), 0)
    rgba = np.concatenate([rgb, alpha[..., None]], axis=2)
    return (np.clip(rgba, 0, 1) * 255 + 0.5).astype(np.uint8)


def png(path, rgba):
    h, w, _ = rgba.shape
    raw = b"".join(b"\x00" + rgba[i].tobytes() for i in range(h))

    def chunk(kind, data):
        return struct.pack(">I", len(data)) + kind + data + struct.pack(">I", zlib.crc32(kind + data) & 0xffffffff)

    with open(path, "wb") as f:
        f.write(b"\x89PNG\r\n\x1a\n" + chunk(b"IHDR", struct.pack(">IIBBBBB", w, h, 8, 6, 0, 0, 0))
                + chunk(b"IDAT", zlib.compress(raw, 9)) + chunk(b"IEND", b""))


if __name__ == "__main__":
    out = sys.argv[1]
    sizes = [int(s) for s in sys.argv[2:]] or [16, 32, 48, 64, 128, 256]
    os.makedirs(out, exist_ok=True)
    for s in sizes:
        png(os.path.join(out, "quire-%d.png" % s), draw(s))
