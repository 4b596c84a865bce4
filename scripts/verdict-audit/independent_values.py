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
The limit is read at two displacements, δ = 1e-250 and 1e-300 times |z| (1 at z = 0): a part that
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
                w = mpc(x + sx * scale * (abs(w) or 1), y + sy * scale * (abs(w) or 1))
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
        if p.get("regular"):
            return regular(p)
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
    # Relative to |z|: 1e-250 * (1 + |z|) moved log(-5e-324 - 0i) to -5e-324 - 1e-250i, whose logarithm
    # is -690.78 - 1.57i, not the limit -744.44 - 3.14i.
    size = abs(mpc(x, y)) or 1
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


def g_function(text):
    """g(z) from its written form ("z^2 - 1", "(z - 1) / (z + 1)"): numbers become exact mpf, ^ a power."""
    import re

    if not re.fullmatch(r"[\sz0-9.eE+\-*/^()i,xp]*", text):
        raise ValueError("g uses more than z, numbers, + - * / ^, i and exp")
    code = re.sub(r"(?<![A-Za-z])(\d+(?:\.\d+)?(?:[eE][+-]?\d+)?)", lambda m: f"mpf('{m.group(1)}')", text)
    code = re.sub(r"(?<![A-Za-z])i(?![A-Za-z])", "I", code).replace("^", "**")
    return lambda z: mpc(eval(code, {"__builtins__": {}}, {"z": z, "mpf": mpf, "I": mpc(0, 1), "exp": mpmath.exp}))


def cut_segments(cuts, reach):
    """Each cut as segments; a cut continued to infinity gets its last segment stretched past `reach`."""
    out = []
    for cut in cuts:
        pts = [mpc(parse_exact(a), parse_exact(b)) for a, b in cut["points"]]
        if cut.get("to_infinity"):
            d = pts[-1] - pts[-2]
            pts.append(pts[-1] + d / abs(d) * reach * 1000)
        out.extend(zip(pts, pts[1:]))
    return out


def orient(a, b, c):
    return (b.real - a.real) * (c.imag - a.imag) - (b.imag - a.imag) * (c.real - a.real)


def crosses(a, b, c, d):
    """Whether segments ab and cd meet, touching included (exact at the working precision for doubles)."""
    o1, o2, o3, o4 = orient(a, b, c), orient(a, b, d), orient(c, d, a), orient(c, d, b)
    if ((o1 > 0 and o2 < 0) or (o1 < 0 and o2 > 0)) and ((o3 > 0 and o4 < 0) or (o3 < 0 and o4 > 0)):
        return True
    on = lambda p, q, r, o: o == 0 and min(p.real, q.real) <= r.real <= max(p.real, q.real) and min(p.imag, q.imag) <= r.imag <= max(p.imag, q.imag)
    return on(a, b, c, o1) or on(a, b, d, o2) or on(c, d, a, o3) or on(c, d, b, o4)


def distance(e, a, b):
    """The distance from e to the segment ab."""
    d = b - a
    if d == 0:
        return abs(e - a)
    t = max(0, min(1, ((e - a) * mpmath.conj(d)).real / abs(d) ** 2))
    return abs(a + d * t - e)


def arg_change(g, a, b, depth=0):
    """The continuous change of arg g along the segment ab, by steps that each turn less than 0.5 rad."""
    steps = 64
    total = mpf(0)
    prev = g(a)
    for k in range(1, steps + 1):
        z = a + (b - a) * k / steps
        cur = g(z)
        turn = mpmath.arg(cur / prev)
        if abs(turn) > 0.5:
            if depth > 12:
                raise ValueError("arg g turns too fast along the path (a zero or pole of g on it)")
            turn = arg_change(g, a + (b - a) * (k - 1) / steps, z, depth + 1)
        total += turn
        prev = cur
    return total


def regular(p):
    """g(z)^ν continued from z0 along paths that avoid the cuts: f = f0 · exp(ν (ln|g(z)/g(z0)| + iΔarg g)).

    The paths are z0 → z straight, or z0 → w → z through waypoints w on a circle around everything;
    the first two that cross no cut must give the same value, else the point is unchecked."""
    r = p["regular"]
    g = g_function(r["g"])
    z = mpc(mpf(parse_float(p["z"][0])), mpf(parse_float(p["z"][1])))
    z0 = mpc(parse_exact(r["z0"][0]), parse_exact(r["z0"][1]))
    nu = mpc(parse_exact(r["nu"][0]), parse_exact(r["nu"][1]))
    pts = [z, z0] + [mpc(parse_exact(a), parse_exact(b)) for c in r["cuts"] for a, b in c["points"]]
    reach = 4 * max(1, *[abs(q) for q in pts])
    segments = cut_segments(r["cuts"], reach)
    if any(crosses(z, z, c, d) for c, d in segments):
        return {"unchecked": "on a regular branch's cut (its sides are checked by the straddle's neighbours)"}
    if g(z) == 0:
        return {"unchecked": "a zero of g: a branch point"}
    ends = [q for c, d in segments for q in (c, d)]
    waypoints = [None] + [reach * mpmath.expj(mpmath.pi * k / 8) for k in range(16)]
    values = []
    for w in waypoints:
        route = [z0, z] if w is None else [z0, w, z]
        legs = list(zip(route, route[1:]))
        if any(crosses(a, b, c, d) for a, b in legs for c, d in segments):
            continue
        # Keep away from the branch points (the cuts' ends): passing one at 1e-300 would need the
        # arg of g followed through hundreds of halvings.
        if any(distance(e, a, b) < min(reach / 1000, abs(z - e) / 2, abs(z0 - e) / 2) for a, b in legs for e in ends):
            continue
        turn = sum((arg_change(g, a, b) for a, b in legs), mpf(0))
        if "f0" in r:
            f0 = mpc(parse_exact(r["f0"][0]), parse_exact(r["f0"][1]))
        else:
            f0 = mpmath.exp(nu * mpmath.log(g(z0))) * mpmath.expj(2 * mpmath.pi * nu * int(r["k"]))
        values.append(f0 * mpmath.exp(nu * (mpmath.log(abs(g(z) / g(z0))) + mpc(0, 1) * turn)))
        if len(values) == 2:
            break
    if len(values) < 2:
        return {"unchecked": "fewer than two paths from z0 avoid the cuts"}
    if abs(values[0] - values[1]) > abs(values[0]) * mpf("1e-40"):
        return {"unchecked": "two paths that avoid the cuts give different values"}
    return rounded(values[0])


def rounded(v):
    return {"re": correctly_rounded(v.real).hex(), "im": correctly_rounded(v.imag).hex()}


def main():
    mp.dps = WORK_DPS
    req = json.load(sys.stdin)
    json.dump([one(p) for p in req["points"]], sys.stdout)


main()
