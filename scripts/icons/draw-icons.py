"""Draws Treadcast's app icon (public/icon.svg, icon-192.png, icon-512.png, apple-touch-icon.png,
favicon.ico) with no image library: a tyre seen side-on, tread lugs round its rim, on the app's
own furrow violet, with the turning centre as a dot. Re-run after changing the design:
python3 scripts/icons/draw-icons.py"""
import math, struct, zlib, pathlib

OUT = pathlib.Path(__file__).resolve().parents[2] / "public"
BG = (0x3A, 0x34, 0x94)      # furrow-700
TYRE = (0xF6, 0xF7, 0xF9)    # ink-50
HUB = (0xE8, 0xB8, 0x5C)     # caution-300, the turning centre
LUGS = 16

def inside(x, y):
    """Colour at a point of the unit square (0..1), or None for transparent."""
    # Rounded square background, corner radius 0.22.
    r = 0.22
    cx, cy = min(max(x, r), 1 - r), min(max(y, r), 1 - r)
    if (x - cx) ** 2 + (y - cy) ** 2 > r * r:
        return None
    dx, dy = x - 0.5, y - 0.5
    d = math.hypot(dx, dy)
    a = math.atan2(dy, dx)
    if d < 0.085:
        return HUB
    # Tyre: an annulus 0.18..0.34 with lugs reaching out to 0.385 on alternate slanted sectors.
    if 0.18 <= d <= 0.34:
        return TYRE
    if 0.34 < d <= 0.385:
        phase = (a + (d - 0.34) * 1.5) * LUGS / (2 * math.pi)
        if (phase % 1.0) < 0.5:
            return TYRE
    return BG

def render(size, ss=4):
    rows = []
    for j in range(size):
        row = bytearray([0])
        for i in range(size):
            acc = [0, 0, 0, 0]
            for sj in range(ss):
                for si in range(ss):
                    c = inside((i + (si + 0.5) / ss) / size, (j + (sj + 0.5) / ss) / size)
                    if c:
                        acc[0] += c[0]; acc[1] += c[1]; acc[2] += c[2]; acc[3] += 255
            n = ss * ss
            alpha = acc[3] // n
            if alpha:
                k = acc[3] / 255
                row += bytes([round(acc[0] / k), round(acc[1] / k), round(acc[2] / k), alpha])
            else:
                row += bytes(4)
        rows.append(bytes(row))
    return png(size, b"".join(rows))

def png(size, raw):
    def chunk(kind, data):
        return struct.pack(">I", len(data)) + kind + data + struct.pack(">I", zlib.crc32(kind + data))
    ihdr = struct.pack(">IIBBBBB", size, size, 8, 6, 0, 0, 0)
    return b"\x89PNG\r\n\x1a\n" + chunk(b"IHDR", ihdr) + chunk(b"IDAT", zlib.compress(raw, 9)) + chunk(b"IEND", b"")

def ico(images):
    """An ICO file holding PNG images (allowed since Windows Vista)."""
    head = struct.pack("<HHH", 0, 1, len(images))
    offset = 6 + 16 * len(images)
    entries, blobs = b"", b""
    for size, data in images:
        entries += struct.pack("<BBBBHHII", size % 256, size % 256, 0, 0, 1, 32, len(data), offset + len(blobs))
        blobs += data
    return head + entries + blobs

def svg():
    lugs = []
    for k in range(LUGS):
        a0 = 2 * math.pi * k / LUGS
        pts = []
        for d, off in ((0.34, 0.0), (0.385, -0.0675), (0.385, math.pi / LUGS - 0.0675), (0.34, math.pi / LUGS)):
            a = a0 + off
            pts.append(f"{50 + 100 * d * math.cos(a):.2f},{50 + 100 * d * math.sin(a):.2f}")
        lugs.append(f'<polygon points="{" ".join(pts)}"/>')
    hexc = lambda c: "#%02x%02x%02x" % c
    return f"""<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 100">
  <title>Treadcast</title>
  <rect width="100" height="100" rx="22" fill="{hexc(BG)}"/>
  <circle cx="50" cy="50" r="26" fill="none" stroke="{hexc(TYRE)}" stroke-width="16"/>
  <g fill="{hexc(TYRE)}">{"".join(lugs)}</g>
  <circle cx="50" cy="50" r="8.5" fill="{hexc(HUB)}"/>
</svg>
"""

if __name__ == "__main__":
    OUT.mkdir(exist_ok=True)
    (OUT / "icon.svg").write_text(svg())
    for name, size in (("icon-192.png", 192), ("icon-512.png", 512), ("apple-touch-icon.png", 180)):
        (OUT / name).write_bytes(render(size, 2 if size > 200 else 3))
    (OUT / "favicon.ico").write_bytes(ico([(s, render(s)) for s in (16, 32, 48)]))
