#!/usr/bin/env python3
"""Turns the design file's JSON Schema (`partforge schema`) into the README's key table.

Usage: partforge schema | python3 scripts/schema-to-markdown.py > table.md
"""
import json
import sys


def fmt(v):
    if isinstance(v, bool):
        return "true" if v else "false"
    if isinstance(v, float) and v.is_integer():
        return str(int(v))
    return str(v)


def allowed(p):
    if "enum" in p:
        return " | ".join(fmt(x) for x in p["enum"])
    parts = []
    lo = p.get("minimum", p.get("exclusiveMinimum"))
    hi = p.get("maximum", p.get("exclusiveMaximum"))
    if lo is not None or hi is not None:
        left = "(" if "exclusiveMinimum" in p else "["
        right = ")" if "exclusiveMaximum" in p else "]"
        parts.append(f"{left}{fmt(lo) if lo is not None else ''} .. {fmt(hi) if hi is not None else ''}{right}")
    if "pattern" in p:
        parts.append(f"pattern `{p['pattern']}`")
    return ", ".join(parts)


def walk(props, required, prefix, rows):
    for key, p in props.items():
        path = f"{prefix}{key}"
        types = p.get("type", "")
        if isinstance(types, list):
            types = " or ".join(t for t in types if t != "null")
        if types == "object" and "properties" in p:
            rows.append((f"`{path}`", "section", "", "required" if key in required else "optional", p.get("description", "")))
            walk(p["properties"], p.get("required", []), path + ".", rows)
            continue
        default = fmt(p["default"]) if "default" in p else ("required" if key in required else "none")
        rows.append((f"`{path}`", types, allowed(p), default, p.get("description", "")))


schema = json.load(sys.stdin)
rows = []
walk(schema["properties"], schema.get("required", []), "", rows)
print("| key | type | allowed | default | meaning |")
print("|---|---|---|---|---|")
for r in rows:
    print("| " + " | ".join(c.replace("|", "\\|") for c in r) + " |")
