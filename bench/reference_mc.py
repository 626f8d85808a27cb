#!/usr/bin/env python3
"""Reference for ampsieve's speed: the per-unit Monte Carlo of `ampsieve rank`, as a plain
vectorised numpy script. A comparison for bench/compare-reference, NOT part of the program:
it is not shipped, not tested for its numbers, and its yields are not ampsieve's.

    bench/reference_mc.py CATALOG_DIR STAGE_FILE [--seed S]

What it does, per catalog file and part, the way a careful engineer would script it:
  * reads every *.yaml under CATALOG_DIR (pyyaml, with the C loader when present) and the stage;
  * hard constraints as ampsieve's rank applies the cheap ones: supply range holds the stage's
    supply (with its variation), rated temperature covers the stage's, price within max-price;
    a part that fails one gets no Monte Carlo (as rank does);
  * the DC model of a difference stage (noise gain 1 + r2/(r1 + rs), the bias currents through
    r2 and through (r3 + rs) || r4), the terms that stay at their bounds (CMRR, PSRR, open-loop
    gain, resistor tempco, 3.3 x rms noise over the noise bandwidth) summed once per part;
  * per simulated unit, as ampsieve's YieldModel draws it: offset and drift N(0, max(typ, max/k))
    truncated at +/- max, IB N(typ, (max - typ)/k) truncated at typ +/- (max - typ) and IOS
    N(0, s) truncated at +/- max, drawn anew at each end of the temperature range and at 25 C,
    aging N(0, typ) truncated at k x typ, resistor ratio uniform in +/- tolerance, trim
    resolution uniform; the error at Tmin and Tmax, the larger kept, plus the gain error;
  * no sampling when the bounds decide (every unit's error within the limit, or the fixed terms
    alone over it), as ampsieve skips it;
  * units in blocks (numpy arrays, no Python loop over units) with the looks ampsieve takes: after
    100, 200 and 500 units, then every 1000, each with the Wilson interval at z = 3.29 against the
    yield target, up to max-trials (default 200,000); when the stage allows a trim, the trimmed
    units (offset and 25 C currents removed) are the same units, drawn once for both runs, each
    run stopping at its own look, as ampsieve's YieldModel.beforeAndAfterTrim does.

Simplified against ampsieve (so the script does no more work than ampsieve does, never less on
the sampling): no missing-value rules beyond "absent = 0" and "no typ = max/k", no
operating-point, crossover, self-heating or ripple terms, no advice, no report. Its yields are
therefore close to, not equal to, ampsieve's; what it is for is the cost of the same sampling.
"""

import argparse
import math
import os
import re
import sys
import time

import numpy as np
import yaml

LOADER = getattr(yaml, "CSafeLoader", yaml.SafeLoader)
PREFIX = {"f": 1e-15, "p": 1e-12, "n": 1e-9, "u": 1e-6, "µ": 1e-6, "m": 1e-3, "": 1.0, "k": 1e3,
          "M": 1e6, "G": 1e9}
QTY = re.compile(r"^\s*([-+0-9.eE]+)\s*([fpnuµmkMG]?)(.*)$")
INTERIM_Z = 3.2905267314919255
Z95 = 1.959963984540054
BLOCK = 1000


def si(v):
    """'12.3 uV' -> 1.23e-05; a plain number as it is; None as None. 'kohm', 'mA', 'MHz'."""
    if v is None:
        return None
    if isinstance(v, (int, float)):
        return float(v)
    m = QTY.match(str(v))
    if not m:
        raise ValueError("cannot read %r" % v)
    num, pre, unit = m.groups()
    if unit.strip() == "%":
        return float(num) * 0.01
    return float(num) * PREFIX[pre]


def spread(d):
    if not d:
        return (None, None, None)
    return (si(d.get("typ")), si(d.get("max")), si(d.get("max-over-temp")))


def wilson(p, n, z):
    if n == 0:
        return (0.0, 1.0)
    ph = p / n
    z2 = z * z
    den = 1 + z2 / n
    c = (ph + z2 / (2 * n)) / den
    h = z * math.sqrt(ph * (1 - ph) / n + z2 / (4 * n * n)) / den
    return (max(0.0, c - h), min(1.0, c + h))


def truncnorm(rng, mean, sigma, lo, hi, n):
    """Rejection from the untruncated normal, as ampsieve does for limits past 0.67 sigma."""
    if sigma == 0:
        return np.full(n, min(hi, max(lo, mean)))
    out = mean + sigma * rng.standard_normal(n)
    bad = (out < lo) | (out > hi)
    while bad.any():
        k = int(bad.sum())
        out[bad] = mean + sigma * rng.standard_normal(k)
        bad = (out < lo) | (out > hi)
    return out


class Stage:
    def __init__(self, path):
        with open(path, encoding="utf-8") as f:
            s = yaml.load(f, Loader=LOADER)
        self.r1, self.r2, self.r3, self.r4 = (si(s[k]) for k in ("r1", "r2", "r3", "r4"))
        self.rs = si(s.get("source-resistance", 0))
        self.tmin = si(s["temperature"]["min"])
        self.tmax = si(s["temperature"]["max"])
        self.vs = si(s["supply"]["voltage"])
        self.dvs = si(s["supply"].get("variation", 0))
        self.limit = si(s["limit"])
        self.target = float(str(s["criterion"]).split()[1]) / 100.0
        self.k = float(s.get("max-to-sigma", 3))
        self.trials = int(s.get("trials", 20000))
        self.max_trials = int(s.get("max-trials", 200_000))
        self.seed = int(s.get("seed", 1))
        rr = s.get("resistor-ratio", {})
        self.tol = si(rr.get("tolerance", "0.1 %"))
        self.tempco = si(str(rr.get("tempco", "0 ppm/C")).replace("ppm/C", "")) * 1e-6
        self.vfs = si(s.get("full-scale-output", 0))
        self.fh = si(s["band"]["high"])
        self.life_h = 10 * 8766.0
        trim = s.get("trim", {}) or {}
        self.trim = bool(trim.get("allowed", False))
        self.resolution = si(trim.get("resolution", 0)) if self.trim else 0.0
        self.max_price = float(s["max-price"]) if "max-price" in s else math.inf
        self.quantity = int(s.get("quantity", 1000))
        self.ng = 1 + self.r2 / (self.r1 + self.rs)
        rp = (self.r3 + self.rs) * self.r4 / (self.r3 + self.rs + self.r4)
        self.per_ib = self.r2 - self.ng * rp  # IB- through r2 less IB+ through Rp times NG
        self.per_ios = 0.5 * (self.r2 + self.ng * rp)


def fixed_terms(st, p):
    """Terms held at their bounds: CMRR, PSRR, open-loop gain, resistor tempco, noise (3.3 x rms)."""
    def db(d):
        v = si((d or {}).get("min")) or si((d or {}).get("typ"))
        return 60.0 if v is None else v
    cm = st.ng * 0.15 / 10 ** (db(p.get("cmrr")) / 20)
    ps = st.ng * st.dvs / 10 ** (db(p.get("psrr")) / 20)
    aol = st.vfs * st.ng / 10 ** (db(p.get("aol")) / 20)
    tc = st.vfs * 2 * st.tempco * max(abs(st.tmax - 25), abs(25 - st.tmin))
    en = si((p.get("noise") or {}).get("en")) or 20e-9
    noise = 3.3 * st.ng * en * math.sqrt(math.pi / 2 * st.fh)
    return cm + ps + aol + tc + noise


def passes_constraints(st, p):
    sup = p.get("supply") or {}
    lo, hi = si(sup.get("min")), si(sup.get("max"))
    if lo is None or hi is None or st.vs - st.dvs < lo or st.vs + st.dvs > hi:
        return False
    t = p.get("temperature") or {}
    if si(t.get("min", "-40 C")) > st.tmin or si(t.get("max", "85 C")) < st.tmax:
        return False
    price = (p.get("price") or {}).get("unit")
    return price is None or float(price) <= st.max_price


EARLY_LOOKS = (100, 200, 500)


def next_look(trials):
    for early in EARLY_LOOKS:
        if trials < early:
            return early
    return (trials // BLOCK + 1) * BLOCK


def yield_runs(st, p, fixed, with_trim, rng):
    """The untrimmed yield and, when with_trim, the trimmed one, on the same simulated units."""
    k = st.k
    vt, vm, vot = spread(p.get("vos"))
    dt_, dm, _ = spread(p.get("vos-drift"))
    it, im, iot = spread(p.get("ib"))
    ot, om, oot = spread(p.get("ios"))
    ltd = p.get("long-term-drift") or {}
    aging_typ = (si(ltd.get("value")) or 0.0) * math.sqrt(st.life_h / 1000.0)
    vm = vm or 0.0
    dm = dm or (vm / 298.15)
    im, om = im or 0.0, om or 0.0
    f_ib = [(iot or im) / im if im else 1.0] * 2
    f_ios = [(oot or om) / om if om else 1.0] * 2
    dts = (st.tmin - 25.0, st.tmax - 25.0)
    room = st.limit - fixed
    s_vos = max(vt or 0.0, vm / k)
    s_dr = max(dt_ or 0.0, dm / k)
    s_ios = max(ot or 0.0, om / k)
    half_ib = im - (it or im)
    modes = (False, True) if with_trim else (False,)
    results = {}
    running = []
    for trimmed in modes:
        # as ampsieve, no sampling when the bounds decide: every unit within its bounds passes, or none can
        bound = st.ng * (vm + dm * max(abs(d) for d in dts) + k * aging_typ) \
            + abs(st.per_ib) * im * (max(f_ib) + (1.0 if trimmed else 0.0)) \
            + abs(st.per_ios) * om * (max(f_ios) + (1.0 if trimmed else 0.0)) + st.resolution + st.vfs * st.tol
        if bound <= room:
            results[trimmed] = (1.0, 1.0, 1.0, 0)
        elif room < 0:
            results[trimmed] = (0.0, 0.0, 0.0, 0)
        else:
            running.append(trimmed)
    state = {m: [0, 0] for m in running}  # passes, trials
    units = max(st.trials, st.max_trials)
    trials = 0
    while running:
        n = min(next_look(trials), units) - trials
        vos = truncnorm(rng, 0.0, s_vos, -vm, vm, n)
        dr = truncnorm(rng, 0.0, s_dr, -dm, dm, n)
        ib = [truncnorm(rng, it or im, half_ib / k, max(0.0, (it or im) - half_ib), im, n) for _ in range(2)]
        ios = [truncnorm(rng, 0.0, s_ios, -om, om, n) for _ in range(2)]
        aging = truncnorm(rng, 0.0, aging_typ, -k * aging_typ, k * aging_typ, n) if aging_typ else 0.0
        ratio = st.tol * (2 * rng.random(n) - 1)
        if True in running:  # what only a trimmed unit reads
            ib.append(truncnorm(rng, it or im, half_ib / k, max(0.0, (it or im) - half_ib), im, n))
            ios.append(truncnorm(rng, 0.0, s_ios, -om, om, n))
            res = st.resolution * (2 * rng.random(n) - 1)
        trials += n
        for trimmed in list(running):
            worst = np.zeros(n)
            for j in range(2):
                e = st.ng * (vos + dr * dts[j] - (vos if trimmed else 0.0) + aging) \
                    + st.per_ib * (f_ib[j] * ib[j] - (ib[2] if trimmed else 0.0)) \
                    + st.per_ios * (f_ios[j] * ios[j] - (ios[2] if trimmed else 0.0)) + (res if trimmed else 0.0)
                worst = np.maximum(worst, np.abs(e))
            worst += np.abs(st.vfs * ratio)  # the gain error at the end of the swing (ratio sensitivity 1)
            st_ = state[trimmed]
            st_[0] += int((worst <= room).sum())
            st_[1] = trials
            done = trials >= units
            if not done:
                lo, hi = wilson(st_[0], st_[1], INTERIM_Z)
                done = lo >= st.target or hi < st.target
            if done:
                lo, hi = wilson(st_[0], st_[1], Z95)
                results[trimmed] = (st_[0] / st_[1], lo, hi, st_[1])
                running.remove(trimmed)
    return results[False], results.get(True)


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("catalog")
    ap.add_argument("stage")
    args = ap.parse_args()
    t0 = time.perf_counter()
    st = Stage(args.stage)
    parts = []
    for root, dirs, files in os.walk(args.catalog):
        dirs[:] = sorted(d for d in dirs if not d.startswith(".") and d != "stages")
        for name in sorted(files):
            if name.endswith(".yaml"):
                with open(os.path.join(root, name), encoding="utf-8") as f:
                    doc = yaml.load(f, Loader=LOADER) or {}
                parts.extend(doc.get("parts", []))
    t1 = time.perf_counter()
    rng = np.random.default_rng(st.seed)  # numpy's PCG64 with its ziggurat normals
    fits, rejected, units = [], 0, 0
    for p in parts:
        if not passes_constraints(st, p):
            rejected += 1
            continue
        fixed = fixed_terms(st, p)
        y, t = yield_runs(st, p, fixed, st.trim, rng)
        units += max(y[3], t[3] if t else 0)
        best = y
        if t is not None:
            best = t if t[1] > y[1] else y
        if best[1] >= st.target:
            price = (p.get("price") or {}).get("unit")
            fits.append((float(price) if price is not None else math.inf, p["id"], best[0]))
    fits.sort()
    t2 = time.perf_counter()
    print("reference: %d parts, %d rejected, %d fit, %d units drawn" % (len(parts), rejected, len(fits), units))
    for price, pid, y in fits[:15]:
        print("  %-12s %8.2f  %.4f" % (pid, price, y))
    print("reference: read %.2f s, Monte Carlo %.2f s" % (t1 - t0, t2 - t1), file=sys.stderr)


if __name__ == "__main__":
    main()
