"""Python's cmath behind Sheetkeeper's stdio JSON-lines protocol.

Written in Python on purpose: the protocol exists so libraries in other languages
can be tested (see docs/stdio-protocol.md). Run with Debian's /usr/bin/python3.
cmath follows ISO C Annex G for special values and signed zeros, but raises
ValueError / OverflowError where C returns a value and signals an exception.
"""
import cmath
import json
import operator
import platform
import sys


def read_number(text):
    if not isinstance(text, str):
        raise ValueError("numbers travel as strings, got %r" % (text,))
    t = text.strip().lower()
    if "0x" in t:
        return float.fromhex(t)
    return float(t)


def write_number(x):
    if x != x:
        return "nan"
    if x == float("inf"):
        return "inf"
    if x == float("-inf"):
        return "-inf"
    # repr is the shortest string that reads back to the same double; -0.0 stays "-0.0".
    return repr(x)


def read_complex(pair):
    if not isinstance(pair, list) or len(pair) != 2:
        raise ValueError("a complex number is a pair [re, im], got %r" % (pair,))
    return complex(read_number(pair[0]), read_number(pair[1]))


def write_complex(z):
    return [write_number(z.real), write_number(z.imag)]


UNARY = {
    "sqrt": cmath.sqrt,
    "exp": cmath.exp,
    "log": cmath.log,
    "asin": cmath.asin,
    "acos": cmath.acos,
    "atan": cmath.atan,
    "asinh": cmath.asinh,
    "acosh": cmath.acosh,
    "atanh": cmath.atanh,
    "neg": operator.neg,
}

# Python's complex ** complex (complex_pow), not C's cpow: both go through exp(w log z).
BINARY = {
    "pow": operator.pow,
    "add": operator.add,
    "sub": operator.sub,
    "mul": operator.mul,
    "div": operator.truediv,
}


def entry_points(pair):
    """Builds [re, im] every way Python allows and reads the parts back."""
    re_, im_ = read_number(pair[0]), read_number(pair[1])
    ways = {
        "constructor": lambda: complex(re_, im_),
        "string": lambda: complex(repr(complex(re_, im_))),
        "mixed-arithmetic": lambda: re_ + im_ * 1j,
        "imaginary-literal-first": lambda: im_ * 1j + re_,
    }
    out = {}
    for name, build in ways.items():
        try:
            out[name] = write_complex(build())
        except Exception as e:  # a way that refuses the input is itself a finding
            out[name] = {"error": "%s: %s" % (type(e).__name__, e)}
    return out


def call(op, item):
    try:
        if op in UNARY:
            return write_complex(UNARY[op](read_complex(item)))
        if not isinstance(item, list) or len(item) != 2:
            raise ValueError("%s takes a list of two pairs" % op)
        return write_complex(BINARY[op](read_complex(item[0]), read_complex(item[1])))
    except (ValueError, OverflowError, ZeroDivisionError) as e:
        return {"error": "%s: %s" % (type(e).__name__, e)}


def answer(request):
    rid = request.get("id") if isinstance(request, dict) else None
    if not isinstance(request, dict) or not isinstance(request.get("op"), str) or not isinstance(request.get("args"), list):
        return {"id": rid, "error": "a request is {\"id\", \"op\", \"args\": [...]}"}
    op, args = request["op"], request["args"]
    if op == "describe":
        return {"id": rid, "library": "cmath", "version": platform.python_version(), "ops": sorted(list(UNARY) + list(BINARY))}
    if op == "entry-points":
        return {"id": rid, "results": [entry_points(item) for item in args]}
    if op not in UNARY and op not in BINARY:
        return {"id": rid, "error": "unsupported op %r" % op}
    return {"id": rid, "results": [call(op, item) for item in args]}


def main():
    for line in sys.stdin:
        if not line.strip():
            continue
        try:
            request = json.loads(line)
        except ValueError as e:
            reply = {"id": None, "error": "not JSON: %s" % e}
        else:
            reply = answer(request)
        sys.stdout.write(json.dumps(reply) + "\n")
        sys.stdout.flush()


if __name__ == "__main__":
    main()
