"""Python's cmath behind Sheetkeeper's stdio JSON-lines protocol.

Written in Python on purpose: the protocol exists so libraries in other languages
can be tested (see docs/stdio-protocol.md). Run with Debian's /usr/bin/python3.
cmath follows ISO C Annex G for special values and signed zeros, but raises
ValueError / OverflowError where C returns a value and signals an exception.
"""
import cmath
import operator
import platform

from stdio_protocol import read_number, read_pair, serve, write_number


def read_complex(pair, entry="complex"):
    """Builds the value through the entry the request names (ENTRIES), never patching it."""
    re_, im_ = read_pair(pair)
    if entry == "string":
        return complex(complex_text(re_, im_))
    return complex(re_, im_)


def complex_text(re_, im_):
    """z as a person writes it for complex(): "-4.0-0.0j", "nan+infj" (each zero's sign kept as text)."""
    negative = im_ < 0 or (im_ == 0 and str(im_).startswith("-"))
    return "%s%s%sj" % (write_number(re_), "-" if negative else "+", write_number(abs(im_)))


# The ways a value gets in (docs/stdio-protocol.md, "entries"): the constructor from two
# numbers is the default; the string form is complex("re±imj").
EVERYTHING = {"imaginaryPart": True, "realZeroSign": True, "imaginaryZeroSign": True}
ENTRIES = [
    {"name": "complex", "call": "complex(re, im)", "default": True, "carries": EVERYTHING},
    {"name": "string", "call": "complex(\"re±imj\")", "default": False, "carries": EVERYTHING},
]


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
        "string": lambda: complex(complex_text(re_, im_)),
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


def echo(pair):
    """Reads a pair as a catalogue operation reads its arguments and writes it back, no function between."""
    try:
        re_, im_ = read_pair(pair)
        return [write_number(re_), write_number(im_)]
    except ValueError as e:
        return {"error": "%s: %s" % (type(e).__name__, e)}


def call(op, item, entry):
    try:
        if op in UNARY:
            return write_complex(UNARY[op](read_complex(item, entry)))
        if not isinstance(item, list) or len(item) != 2:
            raise ValueError("%s takes a list of two pairs" % op)
        return write_complex(BINARY[op](read_complex(item[0], entry), read_complex(item[1], entry)))
    except (ValueError, OverflowError, ZeroDivisionError) as e:
        return {"error": "%s: %s" % (type(e).__name__, e)}


def answer(rid, op, args, request):
    if op == "describe":
        return {
            "id": rid,
            "library": "cmath",
            "version": platform.python_version(),
            "ops": sorted(list(UNARY) + list(BINARY)),
            "entries": ENTRIES,
            # The sign of a zero picks the side of every cut (docs/stdio-protocol.md, "convention").
            "convention": "signed-zero",
        }
    if op == "entry-points":
        return {"id": rid, "results": [entry_points(item) for item in args]}
    if op == "echo":
        return {"id": rid, "results": [echo(item) for item in args]}
    if op not in UNARY and op not in BINARY:
        return {"id": rid, "error": "unsupported op %r" % op}
    entry = request.get("entry", "complex")
    if entry not in [e["name"] for e in ENTRIES]:
        return {"id": rid, "error": "no entry %r; the entries are %s" % (entry, ", ".join(e["name"] for e in ENTRIES))}
    return {"id": rid, "results": [call(op, item, entry) for item in args]}


def main():
    serve(answer)


if __name__ == "__main__":
    main()
