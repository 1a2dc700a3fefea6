#!/usr/bin/env python3
"""Checks that the output of api-examples/bulk-recalculate.sh on the demo library is the one
README.md shows (the fenced block between <!-- demo-output:begin --> and <!-- demo-output:end -->).
Usage: check-demo-output.py OUTPUT_FILE README.md"""
import sys


def main():
    output = [line.rstrip() for line in open(sys.argv[1], encoding="utf-8") if line.strip()]
    readme = open(sys.argv[2], encoding="utf-8").read()
    begin = readme.index("<!-- demo-output:begin -->")
    end = readme.index("<!-- demo-output:end -->")
    block = [line for line in readme[begin:end].splitlines()[1:] if line.strip() and line.strip() != "```"]
    indent = min(len(line) - len(line.lstrip()) for line in block)
    documented = [line[indent:].rstrip() for line in block]
    if output == documented:
        print(f"demo output: {len(output)} lines as README.md shows")
        return 0
    print("The demo library's bulk validation prints something else than README.md shows:")
    for i, (got, want) in enumerate(zip(output + [""] * len(documented), documented + [""] * len(output))):
        if got != want:
            print(f"  first difference at line {i + 1}:\n    README: {want}\n    now:    {got}")
            break
    print("Update the README's block (and its demo verdict table) if the change is intended.")
    return 1


if __name__ == "__main__":
    sys.exit(main())
