#!/usr/bin/env python3
"""One-off step: turn sample-listings/fernhollow-vocab-source.json (the demo generator's own
simple form) into sample-listings/fernhollow.vocab.json (the Sheaf vocabulary format,
docs/vocab-format.md). Run from the repository root; then `./sheaf check` the result.
See docs/decisions/121-demo-vocabulary-conversion.md."""
import json, sys

src = sys.argv[1] if len(sys.argv) > 1 else "sample-listings/fernhollow-vocab-source.json"
dst = sys.argv[2] if len(sys.argv) > 2 else "sample-listings/fernhollow.vocab.json"
with open(src, encoding="utf-8") as f:
    d = json.load(f)
if d.get("format") != "fernhollow-vocab-source":
    sys.exit(f"{src}: expected format fernhollow-vocab-source, found {d.get('format')!r}")
lang = d.get("language", "en")
cats = {c["id"] for c in d["categories"]}

facets = []
for f in sorted(d["facets"], key=lambda x: x["id"]):
    o = {"id": f["id"], "prefLabel": {lang: f["label"]}}
    if f.get("scopeNote"):
        o["scopeNote"] = {lang: f["scopeNote"]}
    o["valueKind"] = {"yesno": "yes-no"}.get(f["valueKind"], f["valueKind"])
    o["multiValued"] = bool(f["multiValued"])
    fc = f.get("categories") or []
    if fc and set(fc) != cats:
        o["categories"] = sorted(fc)
    if f.get("unit"):
        o["unit"] = f["unit"]
    if f.get("buckets"):
        bs = []
        for b in f["buckets"]:
            x = {"label": b["label"]}
            if b.get("min") is not None:
                x["min"] = float(b["min"])
            if b.get("max") is not None:
                x["max"] = float(b["max"])
            bs.append(x)
        o["buckets"] = bs
    o["regulatedClaim"] = bool(f.get("regulatedClaim", False))
    facets.append(o)

# facets and concepts share one id space; a concept named like its facet (facet "hood", value
# "hood") gets the suffix "-value" so both keep a stable id.
facet_ids = {f["id"] for f in d["facets"]}
renamed = {c["id"]: c["id"] + "-value" for c in d["concepts"] if c["id"] in facet_ids}
concepts = []
for c in sorted(d["concepts"], key=lambda x: renamed.get(x["id"], x["id"])):
    c = dict(c, broader=[renamed.get(b, b) for b in c.get("broader") or []],
             related=[renamed.get(r, r) for r in c.get("related") or []])
    o = {"id": renamed.get(c["id"], c["id"]), "prefLabel": {lang: c["prefLabel"]}}
    if c.get("altLabels"):
        o["altLabel"] = {lang: sorted(c["altLabels"])}
    if c.get("hiddenLabels"):
        o["hiddenLabel"] = {lang: sorted(c["hiddenLabels"])}
    o["broader"] = sorted(c["broader"]) if c.get("broader") else [c["facet"]]
    if c.get("related"):
        o["related"] = sorted(c["related"])
    if c.get("scopeNote"):
        o["scopeNote"] = {lang: c["scopeNote"]}
    concepts.append(o)

out = {"format": "sheaf-vocabulary", "formatVersion": 1,
       "scheme": {"id": "fernhollow", "title": {lang: d["name"]},
                  "baseIri": "https://fernhollow.example/vocab/", "defaultLanguage": lang},
       "facets": facets, "concepts": concepts}
with open(dst, "w", encoding="utf-8", newline="\n") as f:
    f.write(json.dumps(out, indent=2, ensure_ascii=False) + "\n")
print(f"wrote {dst}: {len(facets)} facets, {len(concepts)} concepts")
