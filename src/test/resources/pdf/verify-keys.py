#!/usr/bin/python3
"""Checks every answer key in keys/ against the text that pdftotext -layout
prints for the page of each table.

A key is written by hand from the LaTeX source; this script makes sure that
what it says can actually be seen on the PDF page: the caption start, every
header word, every row-label word, every numeric value (with its uncertainty,
percent sign and footnote markers) and that every "Table N" caption on a page
is listed in the key. It also checks the key's own shape (every row times every
column has exactly one cell).

Needs poppler-utils (pdftotext, pdfinfo) and python3-yaml; run with /usr/bin/python3.
Exit code 0 when all keys pass, 1 on any mismatch.
"""
import pathlib
import re
import subprocess
import sys

import yaml

HERE = pathlib.Path(__file__).resolve().parent
CELL_FIELDS = {"row", "column", "value", "pm", "percent", "markers", "bold", "underline", "missing", "text"}
TABLE_FIELDS = {"number", "page", "caption_start", "columns", "rows", "cells"}
NUMBER = re.compile(r"^-?\d+(\.\d+)?$")
# pdfTeX fonts without ToUnicode maps may come out as ligature code points.
LIGATURES = {"\ufb00": "ff", "\ufb01": "fi", "\ufb02": "fl", "\ufb03": "ffi", "\ufb04": "ffl"}
CAPTION_LINE = re.compile(r"^\s*(Table|Tab\.)\s+(\d+)[:.]", re.MULTILINE)


def normalise(text):
    for lig, letters in LIGATURES.items():
        text = text.replace(lig, letters)
    return text.replace("\u2212", "-")  # the key writes the math minus as ASCII


def page_count(pdf):
    info = subprocess.run(["pdfinfo", str(pdf)], capture_output=True, text=True, check=True).stdout
    return int(re.search(r"^Pages:\s+(\d+)", info, re.MULTILINE).group(1))


def page_text(pdf, page, cache={}):
    key = (pdf, page)
    if key not in cache:
        out = subprocess.run(["pdftotext", "-layout", "-f", str(page), "-l", str(page), str(pdf), "-"],
                             capture_output=True, text=True, check=True).stdout
        cache[key] = normalise(out)
    return cache[key]


def value_pattern(cell):
    """Regex for the printed form of a numeric cell: value, %, markers, uncertainty."""
    num = r"(?<![\d.])" + re.escape(cell["value"]) + r"(?![\d])"
    tail = ""
    if cell.get("percent"):
        tail += r"\s*%"
    for i, mark in enumerate(cell.get("markers", [])):
        tail += (r"\s*" if i == 0 else r"[\s,]*") + re.escape(mark)
    if "pm" in cell:
        pm = re.escape(cell["pm"]) + r"(?![\d])"
        tail += r"\s*(±\s*" + pm + r"|\(\s*" + pm + r"\s*\))"
    return num + tail


def check_key(path, problems):
    key = yaml.safe_load(path.read_text(encoding="utf-8"))
    pdf = HERE / key["pdf"]
    where = path.name
    if not pdf.is_file():
        problems.append(f"{where}: {key['pdf']} does not exist")
        return 0, 0
    pages = page_count(pdf)
    if pages != key["pages"]:
        problems.append(f"{where}: key says {key['pages']} pages, PDF has {pages}")
    listed = key["cells_listed"]
    tables = key["tables"]
    cells_checked = 0

    for table in tables:
        label = f"{where} table {table['number']}"
        unknown = set(table) - TABLE_FIELDS
        if unknown:
            problems.append(f"{label}: unknown fields {sorted(unknown)}")
        text = page_text(pdf, table["page"])
        flat = " ".join(text.split())
        caption = " ".join(table["caption_start"].split())
        if caption not in flat:
            problems.append(f"{label}: caption start {caption!r} not on page {table['page']}")
        if not re.match(r"^(Table|Tab\.) " + re.escape(table["number"]) + r"[:.]", caption):
            problems.append(f"{label}: caption start {caption!r} does not begin with its label")
        if not listed:
            continue

        columns = [tuple(c) for c in table["columns"]]
        rows = [tuple(r) for r in table["rows"]]
        if len(set(columns)) != len(columns) or len(set(rows)) != len(rows):
            problems.append(f"{label}: duplicate row or column path")
        for header in {w for c in columns for part in c for w in part.split()}:
            if header not in text:
                problems.append(f"{label}: header word {header!r} not on page {table['page']}")
        for word in {w for r in rows for part in r for w in part.split()}:
            if word not in text:
                problems.append(f"{label}: row-label word {word!r} not on page {table['page']}")

        seen = set()
        expected_order = [(r, c) for r in rows for c in columns]
        actual_order = []
        for cell in table["cells"]:
            unknown = set(cell) - CELL_FIELDS
            if unknown:
                problems.append(f"{label}: cell has unknown fields {sorted(unknown)}")
            where_cell = (tuple(cell["row"]), tuple(cell["column"]))
            actual_order.append(where_cell)
            if where_cell in seen:
                problems.append(f"{label}: cell {where_cell} listed twice")
            seen.add(where_cell)
            if where_cell[0] not in rows or where_cell[1] not in columns:
                problems.append(f"{label}: cell {where_cell} is outside rows/columns")
            kinds = [k for k in ("value", "missing", "text") if k in cell]
            if len(kinds) != 1:
                problems.append(f"{label}: cell {where_cell} needs exactly one of value/missing/text")
                continue
            if "value" in cell:
                if not NUMBER.match(cell["value"]):
                    problems.append(f"{label}: cell {where_cell} value {cell['value']!r} is not a plain number")
                    continue
                if not re.search(value_pattern(cell), text):
                    problems.append(f"{label}: cell {where_cell} printed as {value_pattern(cell)!r} "
                                    f"not found on page {table['page']}")
                cells_checked += 1
            elif "text" in cell:
                if " ".join(cell["text"].split()) not in flat:
                    problems.append(f"{label}: cell {where_cell} text {cell['text']!r} not on page")
                cells_checked += 1
        if actual_order != expected_order:
            problems.append(f"{label}: cells are not exactly rows x columns in row-major order")
        if any("missing" in c for c in table["cells"]) and not re.search(r"(^|\s)(-|–|—|n/a)(\s|$)", text):
            problems.append(f"{label}: key has missing cells but no -, –, —, n/a on page {table['page']}")

    # Every table caption printed in the PDF must be in the key.
    known = {(t["number"], t["page"]) for t in tables}
    for page in range(1, pages + 1):
        for match in CAPTION_LINE.finditer(page_text(pdf, page)):
            if (match.group(2), page) not in known:
                problems.append(f"{where}: caption '{match.group(0).strip()}' on page {page} is not in the key")
    return len(tables), cells_checked


def main():
    problems = []
    keys = sorted((HERE / "keys").glob("*.yaml"))
    if not keys:
        print("verify-keys: no keys found", file=sys.stderr)
        return 1
    total_tables = total_cells = 0
    for path in keys:
        before = len(problems)
        tables, cells = check_key(path, problems)
        total_tables += tables
        total_cells += cells
        status = "ok" if len(problems) == before else f"{len(problems) - before} problem(s)"
        print(f"{path.name:32s} {tables:2d} tables {cells:4d} cells  {status}")
    for problem in problems:
        print("MISMATCH " + problem)
    print(f"verify-keys: {len(keys)} keys, {total_tables} tables, {total_cells} cells checked, "
          f"{len(problems)} mismatches")
    return 1 if problems else 0


if __name__ == "__main__":
    sys.exit(main())
