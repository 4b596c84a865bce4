"""Principal values for the verdict audit, computed with mpmath (Debian's python3-mpmath) alone.

Reads one JSON document on stdin: {"points": [...]}, each point
{"fn", "z": [re, im] as float.hex, "w"?: "p/q" or [re, im] float.hex, "n"?: int,
 "convention": "signed-zero" | "counter-clockwise", "cuts": [{"axis", "from", "to"}], "inner"?: {"fn", "cuts"}}
(`inner`: the function is g(1/z) with g = inner.fn).
Writes a JSON list: {"re", "im"} as float.hex, correctly rounded, or {"unchecked": reason}.

mpmath has no signed zeros, so a point with a zero part is evaluated as a one-sided limit:
- signed-zero convention (ISO/IEC 9899:2011 G.6, common practice since Kahan 1987): a ±0 part
  means the limit from that side, so the zero is replaced by ±δ;
- counter-clockwise continuity (Kahan 1987): a point on a cut takes the limit from the cut's
  side Kahan's rule names (see ccw_side); zero signs are not part of that convention.
A reciprocal function under counter-clockwise continuity takes g's side at 1/z.
The limit is read at two displacements, δ = 1e-250 and 1e-300 times (1 + |z|): a part that
shrinks by more than 1e20 between them vanishes in the limit and becomes a zero with its sign.
Only where the cuts lie comes from the project's catalogue; the sides are derived here;
the values are mpmath's own functions (DLMF 4.2, 4.23, 4.37 principal branches).
"""
import json
import sys

import mpmath
from mpmath import mp, mpc, mpf

sys.path.insert(0, __import__("os").path.join(__import__("os").path.dirname(__file__), "..", "..", "tests", "external", "python"))
from oracle_rounding import correctly_rounded  # noqa: E402

NAMES = {"pow": "power", "nthroot": "root"}
WORK_DPS = 720


def parse_float(text):
    return float.fromhex(text) if "0x" in text.lower() else float(text)


def parse_exact(text):
    if "/" in text:
        p, q = text.split("/")
        return mpf(int(p)) / int(q)
    return mpf(parse_float(text))


def value(p, z, scale=None):
    fn = p["fn"]
    inner = p.get("inner")
    if inner and p["convention"] == "counter-clockwise" and scale is not None:
        # g(1/z) (DLMF 4.23.7-9, 4.37.7-9): 1/z on g's cut takes g's counter-clockwise side there.
        w = 1 / z
        x, y = w.real, w.imag
        for cut in inner["cuts"]:
            if on_cut(cut, x, y):
                sx, sy = ccw_side(cut)
                w = mpc(x + sx * scale * (1 + abs(w)), y + sy * scale * (1 + abs(w)))
        return mpc(getattr(mpmath, inner["fn"])(w))
    if fn == "pow":
        w = p["w"]
        arg = parse_exact(w) if isinstance(w, str) else mpc(parse_exact(w[0]), parse_exact(w[1]))
        return mpc(mpmath.power(z, arg))
    if fn == "nthroot":
        return mpc(mpmath.root(z, int(p["n"])))
    return mpc(getattr(mpmath, NAMES.get(fn, fn))(z))


def on_cut(cut, x, y):
    lo, hi = float(cut["from"]), float(cut["to"])
    if cut["axis"] == "real":
        return y == 0 and lo < x < hi
    return x == 0 and lo < y < hi


def ccw_side(cut):
    """Kahan's counter-clockwise rule for a ray: the side met turning counter-clockwise about its
    finite end. A ray to +∞ along the real axis is met from below, one to −∞ from above; along the
    imaginary axis, up from the right, down from the left. A finite segment has no single answer."""
    lo, hi = float(cut["from"]), float(cut["to"])
    if cut["axis"] == "real":
        return (0, -1) if hi == float("inf") else (0, 1) if lo == float("-inf") else None
    return (1, 0) if hi == float("inf") else (-1, 0) if lo == float("-inf") else None


def displaced(p, x, y, scale):
    """The point moved off its zero parts by `scale`, in the direction its convention says."""
    sign = lambda v: -1 if str(v).startswith("-") else 1
    if p["convention"] == "signed-zero":
        dx = sign(x) * scale if x == 0 else 0
        dy = sign(y) * scale if y == 0 else 0
        return mpc(mpf(x) + dx, mpf(y) + dy)
    for cut in p["cuts"]:
        if on_cut(cut, x, y):
            sx, sy = ccw_side(cut)
            return mpc(mpf(x) + sx * scale, mpf(y) + sy * scale)
    return mpc(mpf(x), mpf(y))


def one(p):
    try:
        return checked(p)
    except (ZeroDivisionError, ValueError) as e:
        return {"unchecked": f"mpmath has no value here ({type(e).__name__})"}


def checked(p):
    x, y = parse_float(p["z"][0]), parse_float(p["z"][1])
    if any(v != v or v in (float("inf"), float("-inf")) for v in (x, y)):
        return {"unchecked": "an infinite or NaN input (Annex G special values are checked elsewhere)"}
    exact = value(p, mpc(mpf(x), mpf(y)))
    if not (mpmath.isfinite(exact.real) and mpmath.isfinite(exact.imag)):
        return {"unchecked": "a pole or singular point: the value is infinite"}
    if p.get("inner") and p["convention"] == "counter-clockwise":
        return limit(lambda scale: value(p, mpc(mpf(x), mpf(y)), scale))
    if any(on_cut(c, x, y) and ccw_side(c) is None for c in p["cuts"]):
        return {"unchecked": "on a finite cut, where the counter-clockwise rule names no single side"}
    if x != 0 and y != 0:
        return rounded(exact)
    size = 1 + abs(mpc(x, y))
    return limit(lambda scale: value(p, displaced(p, x, y, scale * size)))


def limit(at):
    """The value as the displacement goes to 0, read at two displacements."""
    v1 = at(mpf("1e-250"))
    v2 = at(mpf("1e-300"))
    out = []
    for a, b in ((v1.real, v2.real), (v1.imag, v2.imag)):
        if b == 0 or abs(b) < abs(a) * mpf("1e-20"):
            # Vanishes in the limit: a zero with the sign it approaches from (mpf has no −0).
            out.append("-0x0.0p+0" if b < 0 else "0x0.0p+0")
        else:
            out.append(correctly_rounded(b).hex())
    return {"re": out[0], "im": out[1]}


def rounded(v):
    return {"re": correctly_rounded(v.real).hex(), "im": correctly_rounded(v.imag).hex()}


def main():
    mp.dps = WORK_DPS
    req = json.load(sys.stdin)
    json.dump([one(p) for p in req["points"]], sys.stdout)


main()
