"""What every Python adapter of Sheetkeeper's stdio protocol shares (docs/stdio-protocol.md):
numbers as strings both ways, and the loop that answers one JSON line with one JSON line.

cmath_adapter.py and numpy_adapter.py import it from their own folder (Python puts a script's
folder first on sys.path).
"""
import json
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


def read_pair(pair):
    """[re, im] as two doubles, exactly as written."""
    if not isinstance(pair, list) or len(pair) != 2:
        raise ValueError("a complex number is a pair [re, im], got %r" % (pair,))
    return read_number(pair[0]), read_number(pair[1])


def reply_to(request, answer):
    """answer(id, op, args, request) for a request of the protocol's shape, else the error answer naming that shape."""
    rid = request.get("id") if isinstance(request, dict) else None
    if not isinstance(request, dict) or not isinstance(request.get("op"), str) or not isinstance(request.get("args"), list):
        return {"id": rid, "error": "a request is {\"id\", \"op\", \"args\": [...]}"}
    return answer(rid, request["op"], request["args"], request)


def serve(answer):
    """Answers each non-blank line of stdin as one JSON line, flushed (reply_to); exits when stdin closes."""
    for line in sys.stdin:
        if not line.strip():
            continue
        try:
            request = json.loads(line)
        except ValueError as e:
            reply = {"id": None, "error": "not JSON: %s" % e}
        else:
            reply = reply_to(request, answer)
        sys.stdout.write(json.dumps(reply) + "\n")
        sys.stdout.flush()
