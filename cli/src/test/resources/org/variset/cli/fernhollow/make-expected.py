# Expected audit, plan and trend figures for the Fernhollow test gym, computed from the CSV files with Python and
# SciPy straight from docs/spec/metrics.md, without Variset's code.
# Run: python3 make-expected.py > expected.json   (Python 3.11, SciPy 1.17.1, NumPy as installed with it)
import csv, json, math, itertools, statistics
from datetime import date, timedelta
from fractions import Fraction
import numpy as np
from scipy import stats
from scipy.spatial import ConvexHull

def rows(name):
    with open(name, newline="", encoding="utf-8") as f:
        return list(csv.DictReader(f))

def split(s):
    return [x.strip() for x in s.split(";") if x.strip()] if s else []

walls = {w["wall"]: w for w in rows("walls.csv")}
routes = []
for r in rows("routes.csv"):
    routes.append(dict(wall=r["wall"], label=r["route"], set_on=date.fromisoformat(r["set_on"]),
                       stripped=date.fromisoformat(r["stripped_on"]) if r["stripped_on"] else None,
                       discipline=r["discipline"], grade=r["grade"], setters=split(r["setters"]),
                       moves=split(r["moves"]), styles=split(r["styles"]),
                       md=[int(x) for x in split(r["move_difficulty"])], holds=[],
                       angle=float(walls[r["wall"]]["angle_deg"])))
    routes[-1]["reset"] = r["wall"] + " " + r["set_on"]
key = {(r["wall"], r["label"], r["set_on"]): r for r in routes}
for h in rows("holds.csv"):
    r = key[(h["wall"], h["route"], date.fromisoformat(h["set_on"]))]
    r["holds"].append(dict(seq=int(h["seq"]) if h["seq"] else None, role=h["role"], type=h["type"],
                           size=h["size"] or None, grips=[float(g) for g in split(h["grip"])],
                           ref=h["hold_ref"] or None,
                           pos=(float(h["x_m"]), float(h["y_m"])) if h["x_m"] else None))

def name(r):
    return f'{r["label"]} ({r["wall"]}, {r["set_on"]})'

def standing(d):
    return [r for r in routes if r["set_on"] <= d and (r["stripped"] is None or d < r["stripped"])]

HAND = {"hand", "start", "finish"}
VOCAB = {"holds": 10, "moves": 23, "styles": 12, "sizes": 5}     # docs/spec/vocabulary.md term counts; sizes xs..xl
PYRAMID = dict(zip(["VB", "V0", "V1", "V2", "V3", "V4", "V5", "V6", "V7", "V8", "V9"], [1, 2, 3, 4, 5, 6, 5, 4, 3, 1, 1]))

def sector(t):
    return int(math.floor((t + 22.5) / 45)) % 8

def grip(rs):
    a = np.array([g for r in rs for h in r["holds"] if h["role"] in HAND for g in h["grips"]])
    n = len(a)
    if n == 0:
        return dict(n=0)
    rad = np.radians(a)
    R = stats.directional_stats(np.column_stack([np.cos(rad), np.sin(rad)])).mean_resultant_length
    counts = np.bincount([sector(t) for t in a], minlength=8)
    out = dict(n=n, resultant_length=float(R), circular_variance=float(stats.circvar(a, high=360, low=0)),
               sectors=[int(c) for c in counts], sector_entropy=float(stats.entropy(counts) / np.log(8)),
               horizontal_edge_share=float((counts[0] + counts[4]) / n))
    if R > 1e-9:
        out["mean_direction_deg"] = float(stats.circmean(a, high=360, low=0))
        out["circular_sd_deg"] = float(stats.circstd(a, high=360, low=0))
    if n >= 2:
        Rn = R * n
        out["rayleigh_p"] = float(min(1, max(0, math.exp(math.sqrt(1 + 4 * n + 4 * (n * n - Rn * Rn)) - (1 + 2 * n)))))
    return out

def variety(values, k):
    counts = {}
    for v in values:
        counts[v] = counts.get(v, 0) + 1
    c = np.array(list(counts.values()))
    if len(c) == 0:
        return dict(n=0)
    p = c / c.sum()
    h = float(stats.entropy(c))
    out = dict(n=int(c.sum()), richness=int((c > 0).sum()), shannon=h, gini_simpson=float(1 - (p ** 2).sum()),
               hill_n1=math.exp(h), hill_n2=float(1 / (p ** 2).sum()))
    if k is not None:
        out["coverage"] = math.exp(h) / min(k, int(c.sum()))
    return out

def grades(rs):
    bands = [b for b in PYRAMID]
    band_of = lambda g: "V0" if g in ("V0-", "V0+") else g
    obs = np.array([sum(1 for r in rs if band_of(r["grade"]) == b) for b in bands])
    t = np.array([PYRAMID[b] for b in bands], dtype=float)
    out = dict(histogram={b: int(o) for b, o in zip(bands, obs) if o > 0},
               gaps=[b for b, o in zip(bands, obs) if o == 0])
    if obs.sum() > 0:
        idx = np.arange(len(bands))
        out["emd_to_target"] = float(stats.wasserstein_distance(idx, idx, u_weights=obs, v_weights=t))
        chi = stats.chisquare(obs, f_exp=obs.sum() * t / t.sum())
        out["chi_square"] = float(chi.statistic)
        out["chi_square_p"] = float(chi.pvalue)
    return out

def profile_class(d):
    if len(d) < 3:
        return "unclassified"
    m, sd = np.mean(d), np.std(d)          # population standard deviation (ddof=0)
    if sd / m < 0.15:
        return "steady"
    k = sum(1 for x in d if x >= m + sd)
    return ["sustained", "single_crux", "multi_crux"][min(k, 2)]

def profiles(rs):
    counts = {c: 0 for c in ["steady", "sustained", "single_crux", "multi_crux", "unclassified"]}
    for r in rs:
        counts[profile_class(r["md"])] += 1
    cl = np.array([counts[c] for c in ["steady", "sustained", "single_crux", "multi_crux"]])
    if cl.sum() > 0:
        counts["split_entropy"] = float(stats.entropy(cl) / np.log(4))
    return counts

def ordered_hand(r):
    hand = [h for h in r["holds"] if h["role"] in HAND]
    return sorted(hand, key=lambda h: (h["seq"] is None, h["seq"] or 0))

def gie(r):
    hs = ordered_hand(r)
    if len(hs) < 3 or any(h["pos"] is None for h in hs):
        return None
    pts = np.array([h["pos"] for h in hs])
    L = float(np.sum(np.hypot(*np.diff(pts, axis=0).T)))
    c = ConvexHull(pts).area                    # in two dimensions, Qhull's "area" is the perimeter
    return math.log(2 * L / c)

def features(r):
    f = set()
    for h in ordered_hand(r):
        if not h["grips"]:
            f.add(f'hold:{h["type"]}@none')
        for g in h["grips"]:
            f.add(f'hold:{h["type"]}@{45 * sector(g)}')
    for m in r["moves"]:
        f.add("move:" + m)
    for a, b in zip(r["moves"], r["moves"][1:]):
        f.add(f"pair:{a}>{b}")
    detail = len(f)
    f.add("angle:" + f'{15 * math.floor(r["angle"] / 15)}-{15 * math.floor(r["angle"] / 15) + 15}')
    f.add("grade:" + r["grade"])
    return f, detail

def jaccard(a, b):
    (fa, da), (fb, db) = features(a), features(b)
    if da < 4 or db < 4 or a["discipline"] != b["discipline"]:
        return None
    return Fraction(len(fa & fb), len(fa | fb))

def longest_run(a, b):
    best = 0
    for i in range(len(a)):
        for j in range(len(b)):
            k = 0
            while i + k < len(a) and j + k < len(b) and a[i + k] == b[j + k]:
                k += 1
            best = max(best, k)
    return best

def is_repeat(a, b):
    # The evidence rule of docs/spec/metrics.md section 5, written from its text: shapes decide when both routes name
    # three or more hand-hold shapes; otherwise the same grade band and the same run of moves.
    sa = [h for h in ordered_hand(a) if h["ref"]]
    sb = [h for h in ordered_hand(b) if h["ref"]]
    if len(sa) >= 3 and len(sb) >= 3:
        left, pairs = list(sb), []
        for h in sa:
            m = next((o for o in left if o["ref"] == h["ref"]), None)
            if m is not None:
                left.remove(m)
                pairs.append((h, m))
        offs = [(m["pos"][0] - h["pos"][0], m["pos"][1] - h["pos"][1]) for h, m in pairs if h["pos"] and m["pos"]]
        apart = 0
        if offs:
            dx, dy = statistics.median(o[0] for o in offs), statistics.median(o[1] for o in offs)
            apart = sum(1 for o in offs if math.hypot(o[0] - dx, o[1] - dy) > 0.2 + 1e-9)
        return len(pairs) - apart >= max(3, 0.5 * min(len(sa), len(sb)))
    run = longest_run(a["moves"], b["moves"])
    same_seq = run >= 3 or run >= 2 and run >= min(len(a["moves"]), len(b["moves"]))
    return a["grade"] == b["grade"] and same_seq

def missing_share(standing_grades, own_grades=None):
    # Target share of the bands missing as a range: runs of two or more adjacent empty target bands in the standing
    # set, and such runs between the audited set's own easiest and hardest routes.
    def runs(hist, bands):
        out, run = set(), []
        for b in bands + [None]:
            if b is not None and hist.get(b, 0) == 0:
                run.append(b)
            else:
                if len(run) >= 2:
                    out |= set(run)
                run = []
        return out
    bands = list(PYRAMID)
    missing = runs(standing_grades["histogram"], bands)
    if own_grades is not None:
        present = [i for i, b in enumerate(bands) if own_grades["histogram"].get(b, 0) > 0]
        missing |= runs(own_grades["histogram"], bands[present[0]:present[-1] + 1])
    return sum(PYRAMID[b] for b in missing) / sum(PYRAMID.values())

def figures(rs):
    hold_list = [h for r in rs for h in r["holds"]]
    return dict(grip=grip(rs), holds=variety([h["type"] for h in hold_list], VOCAB["holds"]),
                sizes=variety([h["size"] for h in hold_list if h["size"]], VOCAB["sizes"]),
                moves=variety([m for r in rs for m in r["moves"]], VOCAB["moves"]),
                styles=variety([s for r in rs for s in r["styles"]], VOCAB["styles"]),
                profiles=profiles(rs), gie=[g for g in (gie(r) for r in rs) if g is not None])

WEIGHTS = dict(grip=0.25, holds=0.20, moves=0.20, grades=0.15, novelty=0.20)
def score(parts):
    used = {k: w for k, w in WEIGHTS.items() if parts.get(k) is not None}
    if len(used) < 3:
        return None
    return 100 * sum(w * min(1.0, parts[k]) for k, w in used.items()) / sum(used.values())

# 1. The reset Arch 2026-02-02 against its 365-day window, the wall's previous three resets and the gym's standing set.
day = date(2026, 2, 2)
reset = [r for r in routes if r["reset"] == "Arch 2026-02-02"]
window = [r for r in routes if r["reset"] != "Arch 2026-02-02" and day - timedelta(365) <= r["set_on"] < day]
near, inside, aside, best = [], [], [], []
for i, r in enumerate(reset):
    if features(r)[1] < 4:
        continue
    js = [(jaccard(r, w), w) for w in window]
    js = [(j, w) for j, w in js if j is not None]
    best.append(max([float(j) for j, _ in js], default=0.0))
    near += [[name(r), name(w), float(j)] for j, w in js if j >= Fraction(3, 5) and is_repeat(r, w)]
    aside += [[name(r), name(w), float(j)] for j, w in js if j >= Fraction(3, 5) and not is_repeat(r, w)]
    inside += [[name(r), name(o), float(jaccard(r, o))] for o in reset[i + 1:]
               if jaccard(r, o) is not None and jaccard(r, o) >= Fraction(3, 5) and is_repeat(r, o)]
    aside += [[name(r), name(o), float(jaccard(r, o))] for o in reset[i + 1:]
              if jaccard(r, o) is not None and jaccard(r, o) >= Fraction(3, 5) and not is_repeat(r, o)]
novelty = 1 - sum(best) / len(best)
earlier = ["Arch 2026-01-05", "Arch 2025-12-08"]
prev_keys = {(h["ref"], k) for r in routes if r["reset"] in earlier for h in r["holds"] if h["ref"]
             for k in ([45 * sector(g) for g in h["grips"]] or ["none"])}
placements = [h for r in reset for h in r["holds"]]
reused = sum(1 for h in placements if h["ref"] and any((h["ref"], k) in prev_keys
                                                        for k in ([45 * sector(g) for g in h["grips"]] or ["none"])))
f = figures(reset)
gym_day = [r for r in standing(day) if r["discipline"] == "boulder"]
g_standing = grades(gym_day)
parts = dict(grip=f["grip"]["sector_entropy"], holds=f["holds"]["coverage"], moves=f["moves"]["coverage"],
             grades=math.exp(-g_standing["emd_to_target"]) * (1 - missing_share(g_standing, grades(reset))),
             novelty=novelty)
reset_audit = dict(figures=f, grades_of_reset=grades(reset), gym_grades=g_standing, near_repeats=near,
                   internal_repeats=inside, similar_not_repeats=aside, novelty=novelty,
                   window_routes=len([w for w in window if w["discipline"] == reset[0]["discipline"]]),
                   hold_reuse_rate=reused / len(placements), parts=parts, score=score(parts),
                   gie_mean=float(np.mean(f["gie"])), gie_min=min(f["gie"]), gie_max=max(f["gie"]))

# 2. The whole gym's standing set on 2026-02-15 (no novelty).
sday = date(2026, 2, 15)
up = standing(sday)
fs = figures(up)
gs = grades([r for r in up if r["discipline"] == "boulder"])
sparts = dict(grip=fs["grip"]["sector_entropy"], holds=fs["holds"]["coverage"], moves=fs["moves"]["coverage"],
              grades=math.exp(-gs["emd_to_target"]) * (1 - missing_share(gs)), novelty=None)
standing_audit = dict(routes=len(up), figures=fs, grades=gs, parts=sparts, score=score(sparts))

# 3. Bo Renner's routes set 2025-12-01 to 2026-02-28, against the other setters' routes of the period.
period = [r for r in routes if date(2025, 12, 1) <= r["set_on"] <= date(2026, 2, 28)]
bo = [r for r in period if "Bo Renner" in r["setters"]]
setter_audit = dict(routes=len(bo), others=len(period) - len(bo), grip=grip(bo), holds=variety(
    [h["type"] for r in bo for h in r["holds"]], VOCAB["holds"]))

# 4. Plan 4 routes for Arch on 2026-03-02: brute force over every way to put 4 slots into the pyramid's bands.
pday = date(2026, 3, 2)
rest = [r for r in standing(pday) if r["discipline"] == "boulder" and r["wall"] != "Arch"]
bands = list(PYRAMID)
rest_c = [sum(1 for r in rest if r["grade"] == b) for b in bands]
prev_c = [sum(1 for r in reset if r["grade"] == b) for b in bands]
t = np.array([PYRAMID[b] for b in bands], dtype=float)
idx = np.arange(len(bands))
def comps(n, k):
    if k == 1:
        yield (n,)
        return
    for v in range(n + 1):
        for rr in comps(n - v, k - 1):
            yield (v,) + rr
dists = {x: float(stats.wasserstein_distance(idx, idx, u_weights=np.array(rest_c) + np.array(x), v_weights=t))
         for x in comps(4, len(bands))}
least = min(dists.values())
optimal = [list(x) for x, d in dists.items() if abs(d - least) < 1e-12]
plan = dict(bands=bands, rest=rest_c, previous=prev_c, least_distance=least, optimal_slots=optimal)

# 5. Trends from 2025-12-01 to 2026-03-10.
tfrom, tto = date(2025, 12, 1), date(2026, 3, 10)
life = [(r["stripped"] - r["set_on"]).days for r in routes if r["stripped"] and tfrom <= r["stripped"] <= tto]
last = {w: max(r["set_on"] for r in routes if r["wall"] == w and r["set_on"] <= tto) for w in walls}
cycle = {w: int(walls[w]["cycle_days"]) if walls[w]["cycle_days"] else (56 if walls[w]["discipline"] == "rope" else 28)
         for w in walls}
status = {}
for w in walls:
    since = (tto - last[w]).days
    status[w] = dict(days_since_reset=since, cycle_days=cycle[w],
                     status="ok" if since <= cycle[w] else "due" if since <= cycle[w] + 14 else "overdue")
tperiod = [r for r in routes if tfrom <= r["set_on"] <= tto]
setters = {}
for r in tperiod:
    for s in r["setters"]:
        setters[s] = setters.get(s, 0) + 1
trend = dict(lifetime=dict(stripped=len(life), median_days=statistics.median(life),
                           still_up=len(standing(tto))), walls=status, setter_routes=setters)

print(json.dumps(dict(generated_with="make-expected.py, SciPy " + __import__("scipy").__version__,
                      reset_audit=reset_audit, standing_audit=standing_audit, setter_audit=setter_audit,
                      plan=plan, trend=trend), indent=1, default=str))
