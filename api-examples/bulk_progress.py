#!/usr/bin/env python3
"""Reads the NDJSON answer stream of a batch endpoint (POST /api/<calculation>/batch) and prints
progress while it arrives, then a summary: rows OK, INVALID and LIMIT_REACHED; for technique-sheet
validations the verdicts and the findings of every sheet that did not pass; the problem of every
INVALID row.

    curl ... -H 'Accept: application/x-ndjson' | python3 bulk_progress.py
    python3 bulk_progress.py answers.ndjson

Exit status: 0 when every row was answered (OK or INVALID), 2 when the service stopped at a limit
(LIMIT_REACHED: resume from first_unprocessed_row), 3 when the stream is not NDJSON.
Needs Python 3.8 or later, nothing else.
"""
import argparse
import collections
import json
import sys
import time


def main():
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("answers", nargs="?", help="NDJSON file (default: standard input)")
    parser.add_argument("--every", type=float, default=1.0, help="seconds between progress lines (default 1)")
    parser.add_argument("--quiet", action="store_true", help="no progress lines, only the summary")
    args = parser.parse_args()
    stream = open(args.answers, encoding="utf-8") if args.answers else sys.stdin

    statuses = collections.Counter()
    verdicts = collections.Counter()
    not_passed = []   # (row, id, verdict, findings that are not PASS)
    invalid = []      # (row, id, problem)
    limit = None
    last = time.monotonic()
    rows = 0
    for line_number, line in enumerate(stream, start=1):
        line = line.strip()
        if not line:
            continue
        try:
            row = json.loads(line)
        except ValueError as e:
            print(f"line {line_number} is not JSON ({e}): {line[:200]}", file=sys.stderr)
            return 3
        rows += 1
        status = row.get("status", "?")
        statuses[status] += 1
        if status == "OK":
            result = row.get("result") or {}
            verdict = result.get("verdict")
            if verdict is not None:
                verdicts[verdict] += 1
                if verdict != "PASS":
                    findings = [f for f in result.get("findings", []) if f.get("verdict") != "PASS"]
                    not_passed.append((row.get("row"), row.get("id") or result.get("sheet_id"), verdict, findings))
        elif status == "INVALID":
            invalid.append((row.get("row"), row.get("id"), row.get("problem") or {}))
        elif status == "LIMIT_REACHED":
            limit = row
        now = time.monotonic()
        if not args.quiet and now - last >= args.every:
            last = now
            print(f"  ... {rows} rows: " + ", ".join(f"{n} {s}" for s, n in sorted(statuses.items())),
                  file=sys.stderr, flush=True)

    print(f"{rows} rows: {statuses['OK']} OK, {statuses['INVALID']} INVALID"
          + (f", {statuses['LIMIT_REACHED']} LIMIT_REACHED" if statuses["LIMIT_REACHED"] else ""))
    if verdicts:
        print("verdicts: " + ", ".join(f"{verdicts[v]} {v}" for v in ("PASS", "FAIL", "INCOMPLETE", "NOT_COVERED")
                                       if verdicts[v]))
        for number, sheet, verdict, findings in not_passed:
            print(f"  row {number} {sheet}: {verdict}")
            for f in findings:
                print("    " + describe(f))
    for number, ident, problem in invalid:
        where = f"row {number}" + (f" {ident}" if ident else "")
        detail = problem.get("detail", "")
        print(f"  {where}: INVALID {problem.get('type', '')}: {detail}")
        for e in problem.get("errors", [])[:5]:
            if e.get("detail") and e.get("detail") not in detail:
                print(f"    {e.get('pointer', '')}: {e.get('detail')}")
    if limit is not None:
        print(f"stopped at a limit: {(limit.get('problem') or {}).get('detail', '')}")
        print(f"resume from row {limit.get('first_unprocessed_row')}")
        return 2
    return 0


def describe(finding):
    """One finding in a line: rule, verdict, the metric's value against its limit (or the reason of a
    failed feasibility check), and the sheet inputs to add when the rule could not be evaluated."""
    if finding.get("reason"):
        return f"{finding.get('profile_id')}/{finding.get('rule_id')}: {finding.get('verdict')}: {finding['reason']}"
    words = {"AT_LEAST": ">=", "AT_MOST": "<=", "EQUALS": "=", "ABOVE": ">", "BELOW": "<"}
    comparison = words.get(finding.get("comparison"), finding.get("comparison", ""))
    limit = finding.get("limit_metric") or ""
    limit_value = number(finding.get("limit"))
    limit_text = f"{limit} = {limit_value}" if limit and limit_value != "n/a" else (limit or limit_value)
    text = (f"{finding.get('rule_id')}: {finding.get('verdict')}: {finding.get('metric')} = "
            f"{number(finding.get('actual'))}, required {comparison} {limit_text}")
    if finding.get("missing_inputs"):
        text += " (add: " + ", ".join(finding["missing_inputs"]) + ")"
    elif finding.get("missing"):
        text += " (missing: " + ", ".join(finding["missing"]) + ")"
    return text


def number(value):
    if value is None:
        return "n/a"
    return f"{value:.4g}" if isinstance(value, float) else str(value)


if __name__ == "__main__":
    sys.exit(main())
