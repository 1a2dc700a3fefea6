#!/usr/bin/env python3
"""Top methods of a JFR execution-sample dump (jfr print --json --events jdk.ExecutionSample)."""
import collections
import json
import sys

TOP = 25


def frame_name(f):
    m = f["method"]
    return m["type"]["name"].replace("/", ".") + "." + m["name"]


def main(path):
    events = json.load(open(path))["recording"]["events"]
    own = collections.Counter()
    inclusive = collections.Counter()
    for e in events:
        frames = e["values"]["stackTrace"]["frames"]
        if not frames:
            continue
        own[frame_name(frames[0])] += 1
        for name in {frame_name(f) for f in frames}:
            inclusive[name] += 1
    total = len(events)
    print(f"{total} samples")
    print("-- own (top of stack)")
    for name, n in own.most_common(TOP):
        print(f"{100 * n / total:6.1f} %  {name}")
    print("-- inclusive, utdigit and a few framework entry points")
    keys = [k for k in inclusive if k.startswith("utdigit.") or k.split(".")[-1] in
            ("valueToTree", "treeToValue", "readValue", "writeValue", "validate", "doDispatch", "digest")]
    for name in sorted(keys, key=lambda k: -inclusive[k])[:TOP]:
        print(f"{100 * inclusive[name] / total:6.1f} %  {name}")


if __name__ == "__main__":
    main(sys.argv[1])
