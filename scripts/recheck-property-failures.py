"""Recomputes the library values of every failed property check in a run's JSON with mpmath.

Usage: /usr/bin/python3 scripts/recheck-property-failures.py RUN.json

For each failed check of a demo principal suite (the function is the suite id before
"-principal"), prints the shrunk counterexample and, for each library value the law used, the
value mpmath gives at 60 digits (Debian's python3-mpmath) and the library's normwise relative
error in units of 2^-52. A value at 0 itself is not recomputed: the reciprocal functions' values
there are a convention, and mpmath has no signed zero; docs/property-results.md names the Annex G
clause for those. A -0 part picks its side of a cut as Annex G says; under counter-clockwise a
zero part is taken as +0, the side Kahan's rule closes for the logarithm's cut (the only cut
among the demo's failures where the side of a zero part matters under that convention).
"""
import json, sys, math
import mpmath as mp
mp.mp.dps = 60
d = json.load(open(sys.argv[1]))
EPS = 2.0**-52
def num(s):
    return float(s)
def pair(w): return (num(w['re']), num(w['im']))
FN = {'acos':mp.acos,'acosh':mp.acosh,'acot':mp.acot,'acoth':mp.acoth,'acsc':mp.acsc,'acsch':mp.acsch,
      'asec':mp.asec,'asech':mp.asech,'asin':mp.asin,'asinh':mp.asinh,'atan':mp.atan,'atanh':mp.atanh,
      'exp':mp.exp,'log':mp.log,'sqrt':mp.sqrt,'pow-third':lambda z: mp.power(z, mp.mpf(1)/3) if z != 0 else mp.mpc(0)}
def limit(fn, z, ccw=False):
    """f at z. mpmath's own acosh and asech drop an imaginary part below its working precision
    (asech(-8 + 5e-324j) came out +1.696j, the other side's value), so a part that is zero, or
    below 1e-45 of the other, is replaced by 1e-45 of the other with its sign: the side it names
    (Annex G), or the upper/right side under ccw. That moves the value by far less than a double's ulp.
    The value at 0 itself is a convention for the reciprocal functions: None."""
    x, y = z
    if x == 0 and y == 0:
        return None
    X, Y = mp.mpf(x), mp.mpf(y)
    side = lambda v: 1 if (ccw and v == 0) or math.copysign(1, v) > 0 else -1
    if abs(Y) < mp.mpf('1e-45') * abs(X):
        Y = side(y) * mp.mpf('1e-45') * abs(X)
    elif abs(X) < mp.mpf('1e-45') * abs(Y):
        X = side(x) * mp.mpf('1e-45') * abs(Y)
    return FN[fn](mp.mpc(X, Y))
def fmt(v): return 'none' if v is None else mp.nstr(v, 17)
def err(lib, true):
    if true is None: return ''
    if not all(math.isfinite(t) for t in lib): return ' (library not finite; true value finite)' if mp.isfinite(true.real) and mp.isfinite(true.imag) else ''
    e = abs(mp.mpc(*lib) - true) / abs(true) if true != 0 else abs(mp.mpc(*lib))
    return ' normwise error %.3g (%.3g eps)' % (float(e), float(e)/EPS)
for r in d['results']:
    sid = r['suite']['id']
    fn = sid.split('-principal')[0]
    ccw = sid.endswith('-ccw')
    for o in r.get('properties') or []:
        if o['kind'] != 'failed': continue
        zs = [pair(z) for z in o['counterexample']]
        vals = {v['name']: pair(v['value']) for v in o['values']}
        print(f"{sid} {o['law']}: {o['reason']}")
        print(f"   counterexample {zs}")
        if o['law'] in ('conjugate-symmetry', 'odd-symmetry'):
            z = zs[0]
            if o['law'] == 'conjugate-symmetry':
                tz = (z[0], -z[1]); S = lambda p: (p[0], -p[1]); ln, rn = 'f(conj z)', 'conj f(z)'
            else:
                tz = (-z[0], -z[1]); S = lambda p: (-p[0], -p[1]); ln, rn = 'f(-z)', '-f(z)'
            if ccw:  # zero signs carry no meaning: a -0 is +0
                tz = tuple(0.0 if t == 0 else t for t in tz)
            lib_fz = S(vals[rn]); lib_ftz = vals[ln]
            t_fz = limit(fn, z, ccw); t_ftz = limit(fn, tz, ccw)
            print(f"   f(z)   at {z}: library {lib_fz}, mpmath {fmt(t_fz)}{err(lib_fz, t_fz)}")
            print(f"   f(T z) at {tz}: library {lib_ftz}, mpmath {fmt(t_ftz)}{err(lib_ftz, t_ftz)}")
        elif o['law'] == 'root-power':
            z = zs[0]; t = limit(fn, z, ccw)
            print(f"   f(z): library {vals['f(z)']}, mpmath {fmt(t)}{err(vals['f(z)'], t)}")
        elif o['law'] == 'exp-log':
            z = zs[0]; t = limit('log', z, ccw)
            print(f"   log z: library {vals['log z']}, mpmath {fmt(t)}{err(vals['log z'], t)}")
        elif o['law'] == 'range':
            z = zs[0]; t = limit('log', z, ccw)
            print(f"   log z: library {vals['f(z)']}, mpmath (ccw side) {fmt(t)}{err(vals['f(z)'], t)}")
        elif o['law'] == 'unwinding':
            for name, z in (('log z1', zs[0]), ('log z2', zs[1])):
                t = limit('log', z, ccw)
                lib = vals.get(name)
                print(f"   {name} at {z}: library {lib}, mpmath {fmt(t)}{err(lib, t) if lib else ''}")
            p = vals.get('z1*z2')
            if p:
                t = limit('log', p, ccw)
                print(f"   log(z1*z2) at {p}: library {vals['log(z1*z2)']}, mpmath {fmt(t)}{err(vals['log(z1*z2)'], t)}")
