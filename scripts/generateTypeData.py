#!/usr/bin/env python3
"""Writes src/data/type<X>.ts from the ITS-90 coefficient file.

Every coefficient NIST prints has at most 12 significant digits, so the shortest decimal form of its nearest
double (what `repr` writes here and `String(x)` gives in JavaScript) is exactly the printed decimal value: the
float path and the decimal.js check path (which reads `String(x)`) share one source with no digit lost. The
script asserts that for every number before writing.

A type whose EMF starts by falling (type B) also gets where its EMF becomes unique (the lowest EMF and the upper
root of E(t) = E(minC)), computed here by the same float64 operations, in the same order, as the engine's search for
a data object it did not generate (`_monotoneStart` in src/its90/compiled.ts: bisection on the slope, then
safeguarded Newton on compensated residuals and the ulp walk): Python floats are IEEE 754 doubles, so the numbers
are the engine's bit for bit (tests/its90/checkedData.test.ts compares them with the run-time search).

Usage: python3 scripts/generateTypeData.py [coefficients.json [output folder]]
(defaults: scripts/its90/coefficients.json, in the repo, and src/data). The generated modules are committed; the
project never reads the input file at build time (tests/its90/checkedData.test.ts runs this script into a temporary
folder and compares the output with the committed modules byte for byte).
"""
import json, sys, pathlib
from decimal import Decimal

src = sys.argv[1] if len(sys.argv) > 1 else str(pathlib.Path(__file__).resolve().parent / "its90" / "coefficients.json")
data = json.load(open(src), parse_float=str, parse_int=str)
out = pathlib.Path(sys.argv[2]) if len(sys.argv) > 2 else pathlib.Path(__file__).resolve().parent.parent / "src" / "data"

def num(text):
    value = float(text)
    shortest = repr(value)
    assert Decimal(shortest) == Decimal(text), (text, shortest)
    assert len(Decimal(text).normalize().as_tuple().digits) <= 15, text
    return shortest.replace("e-0", "e-").replace("e+0", "e+") if "e" in shortest else shortest

def arr(xs):
    return "[" + ", ".join(num(x) for x in xs) + "]"

def js_string(value):
    """String(x) of JavaScript for a float: integral values without a fraction, else the shortest round trip."""
    if value == int(value) and abs(value) < 1e21:
        return str(int(value))
    return computed(value)

def computed(value):
    """A computed float as JavaScript's String(x) writes it (shortest round trip)."""
    shortest = repr(value)
    assert float(shortest) == value
    return shortest.replace("e-0", "e-").replace("e+0", "e+") if "e" in shortest else shortest

# The engine's float operations (src/its90/compiled.ts), one for one.
def horner(c, x):
    acc = c[-1]
    for i in range(len(c) - 2, -1, -1):
        acc = acc * x + c[i]
    return acc

def horner_derivative(c, x):
    acc = 0.0
    for i in range(len(c) - 1, 0, -1):
        acc = acc * x + i * c[i]
    return acc

def residual(c, t, target):
    split = 134217729.0 * t
    th = split - (split - t)
    tl = t - th
    s = c[-1]
    e = 0.0
    for i in range(len(c) - 2, -1, -1):
        p = s * t
        q = 134217729.0 * s
        sh = q - (q - s)
        sl = s - sh
        ci = c[i]
        total = p + ci
        bb = total - p
        e = e * t + (sh * th - p + sh * tl + sl * th + sl * tl + (p - (total - bb) + (ci - bb)))
        s = total
    return s - target + e

def solve(c, target, low, high):
    lo, hi = low, high
    f_lo = residual(c, lo, target)
    f_hi = residual(c, hi, target)
    if f_lo >= 0:
        return lo
    if f_hi <= 0:
        return hi
    t = lo + (hi - lo) * (-f_lo / (f_hi - f_lo))
    for _ in range(100):
        f = residual(c, t, target)
        if f == 0:
            return t
        if f < 0:
            lo = t
        else:
            hi = t
        nxt = t - f / horner_derivative(c, t)
        if not (nxt > lo and nxt < hi):
            nxt = 0.5 * (lo + hi)
        step = abs(nxt - t)
        t = nxt
        if step <= 2e-16 * (1 + abs(t)):
            break
    f = residual(c, t, target)
    direction = 1.0 if f < 0 else -1.0
    for _ in range(64):
        if f == 0:
            break
        nxt = t + direction * max(abs(t) * 2.0 ** -53, 2.0 ** -1074)
        if nxt == t:
            nxt = t + direction * abs(t) * 2.0 ** -52
        if nxt < low or nxt > high:
            break
        g = residual(c, nxt, target)
        if (g < 0) != (f < 0) or g == 0:
            return nxt if abs(g) < abs(f) else t
        t = nxt
        f = g
    return t

def monotone_start(t):
    """(lowest EMF, monotonic-from temperature) of a type whose E starts by falling, else None."""
    first = t["forward"][0]
    c = [float(x) for x in first["c"]]
    min_c = float(t["t_min_C"])
    if horner_derivative(c, min_c) > 0:
        return None
    # The engine adds type K's exponential term from 0 °C with Math.exp; no falling start may need it here.
    assert "exponential" not in t or float(first["t_min"]) < 0, "the start search would need the exponential term"
    top = float(first["t_max"])
    lo, hi = min_c, top
    for _ in range(200):
        mid = 0.5 * (lo + hi)
        if horner_derivative(c, mid) <= 0:
            lo = mid
        else:
            hi = mid
    turn = 0.5 * (lo + hi)
    return horner(c, turn), solve(c, horner(c, min_c), turn, top)

short_source = {
    "B": "type_b.tab", "E": "type_e.tab", "J": "type_j.tab", "K": "type_k.tab",
    "N": "type_n.tab", "R": "type_r.tab", "S": "type_s.tab", "T": "type_t.tab",
}

for letter, t in data["types"].items():
    src_note = t["source"]
    lines = []
    lines.append("// Generated by scripts/generateTypeData.py from the ITS-90 coefficient file; do not edit by hand.")
    lines.append('import { _checked } from "./checkedData.js";')
    lines.append('import { _deepFreeze } from "./deepFreeze.js";')
    lines.append('import type { ApproximateInverseData, ThermocoupleData } from "./thermocoupleData.js";')
    lines.append("")
    lines.append("/**")
    lines.append(f" * ITS-90 reference function of the type {letter} thermocouple (data only).")
    lines.append(" *")
    lines.append(f" * Source: {src_note}")
    lines.append(" */")
    lines.append(f"export const type{letter}: ThermocoupleData = /* @__PURE__ */ _checked({{")
    lines.append(f'  type: "{letter}",')
    lines.append(f'  source: "NIST SRD 60, {short_source[letter]}",')
    lines.append(f'  minC: {num(t["t_min_C"])},')
    lines.append(f'  maxC: {num(t["t_max_C"])},')
    lines.append("  forward: [")
    for f in t["forward"]:
        lines.append(f'    {{ minC: {num(f["t_min"])}, maxC: {num(f["t_max"])}, coefficients: {arr(f["c"])} }},')
    lines.append("  ],")
    if "exponential" in t:
        e = t["exponential"]
        lines.append(f'  exponential: {{ a0: {num(e["a0"])}, a1: {num(e["a1"])}, a2: {num(e["a2"])} }},')
    start = monotone_start(t)
    if start is None:
        lines.append("});")
    else:
        # E falls from E(minC) to a minimum, then climbs back: the EMF is unique only above E(minC).
        lowest, from_c = start
        e0 = js_string(horner([float(x) for x in t["forward"][0]["c"]], float(t["t_min_C"])))
        ambiguity = f"is ambiguous (E dips below {e0} mV up to {from_c:.2f} °C: two temperatures); use an EMF above {e0} mV"
        lines.append("}, {")
        lines.append(f"  lowestEmf: {computed(lowest)},")
        lines.append(f"  monotonicFromC: {computed(from_c)},")
        lines.append(f'  ambiguity: "{ambiguity}",')
        lines.append("});")
    lines.append("")
    lines.append("/**")
    lines.append(f" * Published approximate inverse t(E) of the type {letter} thermocouple with its stated error bands (data only),")
    lines.append(" * kept apart from the reference function so that a bundle converting exactly does not carry it.")
    lines.append(" *")
    lines.append(f" * Source: {src_note}")
    lines.append(" */")
    lines.append(f"export const type{letter}ApproximateInverse: ApproximateInverseData = /* @__PURE__ */ _deepFreeze({{")
    lines.append(f'  type: "{letter}",')
    lines.append(f'  source: "NIST SRD 60 / Monograph 175 (1993), {short_source[letter]} and allcoeff.tab",')
    lines.append("  ranges: [")
    for f in t["inverse"]:
        lines.append(
            f'    {{ minEmfMillivolts: {num(f["E_min_mV"])}, maxEmfMillivolts: {num(f["E_max_mV"])}, minC: {num(f["t_min"])}, maxC: {num(f["t_max"])}, '
            f'errorMinC: {num(f["error_min_C"])}, errorMaxC: {num(f["error_max_C"])}, coefficients: {arr(f["d"])} }},'
        )
    lines.append("  ],")
    lines.append("});")
    (out / f"type{letter}.ts").write_text("\n".join(lines) + "\n")
    print("wrote", out / f"type{letter}.ts")
