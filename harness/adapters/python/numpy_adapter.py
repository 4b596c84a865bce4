"""NumPy's complex128 functions behind Sheetkeeper's stdio JSON-lines protocol
(docs/stdio-protocol.md; docs/c-and-numpy-adapters.md says what the demo catalogue finds).

Run with Debian's /usr/bin/python3 and python3-numpy. NumPy computes in C (npymath), returns a
value with a floating-point flag where cmath raises, and has no cbrt or nthroot for complex input.
Its floating-point warnings are switched off for each batch (np.errstate): a flag is not a
failed call, and Python would print the warning on stderr, which the harness quotes in errors.
"""
import operator

import numpy as np

from stdio_protocol import read_pair, serve, write_number

# The ways a value gets in (docs/c-and-numpy-adapters.md, "Entries"); declared beside discovery as
# harness/adapters/numpy-entries.ts, and a test holds the two equal. Probed with NumPy 1.24.2:
# the arithmetic entry computes im * 1j as the complex product (im + 0j)(0 + 1j) = (im·0 − 0, im + 0),
# so an imaginary −0 becomes +0 always, a real −0 becomes +0 where im >= +0, and an infinite or NaN
# im makes the real part NaN.
EVERYTHING = {"imaginaryPart": True, "realZeroSign": True, "imaginaryZeroSign": True}
ENTRIES = [
    {"name": "complex128", "call": "np.complex128(complex(re, im))", "default": True, "carries": EVERYTHING},
    {"name": "array", "call": "np.array([complex(re, im), …])", "default": False, "carries": EVERYTHING},
    {
        "name": "arithmetic",
        "call": "np.array([re, …]) + np.array([im, …]) * 1j",
        "default": False,
        "carries": {"imaginaryPart": True, "realZeroSign": False, "imaginaryZeroSign": False},
    },
]
ENTRY_NAMES = [e["name"] for e in ENTRIES]


def build(entry, parts):
    """The column of values for the (re, im) parts, built the way the entry says and never patched.

    complex128 gives a list of scalars (each call on its own, as a scalar user calls); the array
    entries give one complex128 array, and the operation runs once over the whole batch.
    """
    if entry == "complex128":
        return [np.complex128(complex(re_, im_)) for re_, im_ in parts]
    if entry == "array":
        return np.array([complex(re_, im_) for re_, im_ in parts], dtype=np.complex128)
    re_column = np.array([p[0] for p in parts], dtype=np.float64)
    im_column = np.array([p[1] for p in parts], dtype=np.float64)
    return re_column + im_column * 1j


UNARY = {
    "sqrt": np.sqrt,
    "exp": np.exp,
    "log": np.log,
    "asin": np.arcsin,
    "acos": np.arccos,
    "atan": np.arctan,
    "asinh": np.arcsinh,
    "acosh": np.arccosh,
    "atanh": np.arctanh,
    "neg": np.negative,
}

# np.power is NumPy's own complex power (npy_cpow), not Python's **.
BINARY = {
    "pow": np.power,
    "add": np.add,
    "sub": np.subtract,
    "mul": np.multiply,
    "div": np.true_divide,
}


def write_complex(z):
    return [write_number(float(z.real)), write_number(float(z.imag))]


def read_items(op, args):
    """Each item's argument parts, or the reason it cannot be read (its own slot's error)."""
    arity = 2 if op in BINARY else 1
    read = []
    for item in args:
        try:
            if arity == 1:
                read.append([read_pair(item)])
            elif isinstance(item, list) and len(item) == 2:
                read.append([read_pair(item[0]), read_pair(item[1])])
            else:
                raise ValueError("%s takes a list of two pairs" % op)
        except ValueError as e:
            read.append("ValueError: %s" % e)
    return read


def results(op, args, entry):
    """One answer per item: the function over the readable items, built through the entry, in order."""
    read = read_items(op, args)
    good = [i for i, r in enumerate(read) if not isinstance(r, str)]
    out = [{"error": r} if isinstance(r, str) else None for r in read]
    if not good:
        return out
    # Building re + im * 1j computes inf * 0 for an infinite im: that warning is switched off too.
    with np.errstate(all="ignore"):
        columns = [build(entry, [read[i][k] for i in good]) for k in range(len(read[good[0]]))]
        if op == "echo":
            values = columns[0]
        elif op in UNARY:
            fn = UNARY[op]
            values = [fn(z) for z in columns[0]] if entry == "complex128" else fn(columns[0])
        else:
            fn = BINARY[op]
            values = [fn(a, b) for a, b in zip(*columns)] if entry == "complex128" else fn(*columns)
    for k, i in enumerate(good):
        out[i] = write_complex(values[k])
    return out


def entry_points(pair):
    """Builds [re, im] every way the entries allow and reads the parts back before any function runs."""
    try:
        parts = read_pair(pair)
    except ValueError as e:
        return {name: {"error": "ValueError: %s" % e} for name in ENTRY_NAMES}
    with np.errstate(all="ignore"):
        return {name: write_complex(build(name, [parts])[0]) for name in ENTRY_NAMES}


def answer(rid, op, args, request):
    if op == "describe":
        return {
            "id": rid,
            "library": "numpy",
            "version": np.__version__,
            "ops": sorted(list(UNARY) + list(BINARY)),
            "entries": ENTRIES,
            # The sign of a zero picks the side of every cut (docs/stdio-protocol.md, "convention").
            "convention": "signed-zero",
        }
    if op == "entry-points":
        return {"id": rid, "results": [entry_points(item) for item in args]}
    if op not in UNARY and op not in BINARY and op != "echo":
        return {"id": rid, "error": "unsupported op %r" % op}
    entry = request.get("entry", "complex128")
    if entry not in ENTRY_NAMES:
        return {"id": rid, "error": "no entry %r; the entries are %s" % (entry, ", ".join(ENTRY_NAMES))}
    return {"id": rid, "results": results(op, args, entry)}


if __name__ == "__main__":
    serve(answer)
