#!/usr/bin/env python3
"""Refreshes the README's JSON examples from the tool's real output on the demo rig.

Each example follows a line '<!-- example: ARGS -->' (ARGS as given to rotordrive, run from the repository root) and is
the command's --json document abridged: arrays cut to their first two numbers or first object, numbers rounded to 4 significant digits.
ReadmeExampleTests (tests/RotorDrive.Cli.Tests) holds every example to the real output. Usage:
    python3 tools/readme-examples.py "dotnet src/RotorDrive.Cli/bin/Debug/net10.0/rotordrive.dll"
"""
import json, re, subprocess, sys

def abridge(value):
    if isinstance(value, dict):
        return {k: abridge(v) for k, v in value.items()}
    if isinstance(value, list):
        keep = 1 if value and isinstance(value[0], (dict, list)) else 2
        return [abridge(v) for v in value[:keep]]
    if isinstance(value, float):
        rounded = float(f"{value:.4g}")
        return int(rounded) if rounded.is_integer() else rounded
    return value

def main():
    tool = sys.argv[1].split()
    text = open("README.md", encoding="utf-8").read()
    pattern = re.compile(r"(<!-- example: (.+?) -->\n```json\n)(.*?)(\n```)", re.S)
    def refresh(m):
        out = subprocess.run(tool + m.group(2).split(), capture_output=True, text=True).stdout
        doc = abridge(json.loads(out))
        # One line per top-level key; nested values on that line.
        lines = [f'  {json.dumps(k)}: {json.dumps(v, ensure_ascii=False)}' for k, v in doc.items()]
        return m.group(1) + "{\n" + ",\n".join(lines) + "\n}" + m.group(4)
    open("README.md", "w", encoding="utf-8").write(pattern.sub(refresh, text))

main()
