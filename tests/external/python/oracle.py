"""Answers batches of requests from Python's cmath and mpmath (Debian's python3-mpmath).

Reads one JSON document on stdin: {"source": "cmath"|"cmath-formula"|"mpmath", "dps": 60, "points": [...]},
each point {"fn", "z": [re, im] as float.hex strings, "w"?: [re, im] hex or p/q | "p/q", "n"?: int}.
Writes one JSON document: a list of results, each {"re", "im"} as float.hex (cmath) or as
decimal strings with dps digits plus "re_double"/"im_double" (mpmath's float()) and
"re_rounded"/"im_rounded" (correctly rounded from the exact binary value) as float.hex (mpmath), or
{"raises": "ValueError"} when cmath raises instead of returning a value.
"""
import cmath
import json
import sys
from fractions import Fraction

from oracle_rounding import correctly_rounded


def parse_float(text):
    return float.fromhex(text) if "0x" in text.lower() else float(text)


def run_cmath(points):
    out = []
    for p in points:
        z = complex(parse_float(p["z"][0]), parse_float(p["z"][1]))
        try:
            v = getattr(cmath, p["fn"])(z)
            out.append({"re": v.real.hex(), "im": v.imag.hex()})
        except (ValueError, OverflowError) as e:
            out.append({"raises": type(e).__name__})
    return out


def run_cmath_formula(points):
    """Each point carries "formula", a Python expression over z using cmath's functions."""
    names = {name: getattr(cmath, name) for name in ("sqrt", "exp", "log", "asin", "acos", "atan", "asinh", "acosh", "atanh")}
    out = []
    for p in points:
        z = complex(parse_float(p["z"][0]), parse_float(p["z"][1]))
        try:
            v = eval(p["formula"], {"__builtins__": {}}, dict(names, z=z))
            out.append({"re": v.real.hex(), "im": v.imag.hex()})
        except (ValueError, OverflowError, ZeroDivisionError) as e:
            out.append({"raises": type(e).__name__})
    return out


def parse_exact(text, mpf):
    """A wire number for mpmath: p/q as that ratio at the working precision, else a double."""
    if "/" in text:
        q = Fraction(text)
        return mpf(q.numerator) / q.denominator
    return mpf(parse_float(text))


def run_mpmath(points, dps):
    import mpmath
    from mpmath import mp, mpc, mpf

    # mpmath's complex inverse functions are accurate to about 10^-dps relative to |f(z)|, not
    # to each part: at 60 digits asin(1e-300 + 1e-300j) comes back with imaginary part 0.0.
    # Working at dps + 660 digits keeps parts down to 1e-600 correct to dps digits.
    mp.dps = dps + 660
    names = {"pow": "power", "nthroot": "root"}
    out = []
    for p in points:
        # A point may ask for more working digits: a part of 1/z as small as 1e-904 beside 1
        # (asech at z = -1.57e308 + 6.4e-288i) is lost at 720, and its sign picks the side of a cut.
        mp.dps = p.get("work_dps", dps + 660)
        z = mpc(mpf(parse_float(p["z"][0])), mpf(parse_float(p["z"][1])))
        fn = p["fn"]
        if fn == "pow":
            w = p["w"]
            if isinstance(w, str):
                arg = parse_exact(w, mpf)
            else:
                arg = mpc(parse_exact(w[0], mpf), parse_exact(w[1], mpf))
            v = mpmath.power(z, arg)
        elif fn == "nthroot":
            v = mpmath.root(z, int(p["n"]))
        else:
            v = getattr(mpmath, names.get(fn, fn))(z)
        v = mpc(v)
        out.append({
            "re": mpmath.nstr(v.real, dps, min_fixed=1, max_fixed=0),
            "im": mpmath.nstr(v.imag, dps, min_fixed=1, max_fixed=0),
            "re_double": float(v.real).hex(),
            "im_double": float(v.imag).hex(),
            "re_rounded": correctly_rounded(v.real).hex(),
            "im_rounded": correctly_rounded(v.imag).hex(),
        })
    return out


def main():
    req = json.load(sys.stdin)
    if req["source"] == "cmath":
        result = run_cmath(req["points"])
    elif req["source"] == "cmath-formula":
        result = run_cmath_formula(req["points"])
    else:
        result = run_mpmath(req["points"], int(req.get("dps", 60)))
    json.dump(result, sys.stdout)


main()
