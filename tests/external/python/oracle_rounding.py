"""Correct rounding of an mpmath mpf to binary64, shared by the oracle and the verdict audit."""
from fractions import Fraction


def correctly_rounded(x):
    """The binary64 nearest to the mpf x, ties to even, with gradual underflow and overflow.

    float(mpf) rounds to 53 bits and then lets ldexp round again in the subnormal range (twice
    rounded), so the rounding is done here from x's exact binary value instead."""
    sign, man, exp, bc = x._mpf_
    if man == 0:
        return 0.0
    top = exp + bc
    if top > 1025:
        return -float("inf") if sign else float("inf")
    if top < -1075:
        return -0.0 if sign else 0.0
    value = Fraction(man) * (Fraction(2) ** exp)
    try:
        f = float(value)
    except OverflowError:
        f = float("inf")
    return -f if sign else f
