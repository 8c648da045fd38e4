"""Extract reference numbers from open data packages into tests/reference/*.json.

Run by hand (never in CI), from the repository root:

    pip install chemicals==1.5.2              # MIT; CRC tables, ATcT gas values
    apt-get install -y python3-pymatgen       # MIT; Shannon radii, IE, EA
    python3 src/node/scripts/reference/extract_reference.py chemicals llnl
    /usr/bin/python3 src/node/scripts/reference/extract_reference.py pymatgen
    # (Debian's pymatgen is built for Debian's python3 and numpy, hence the two runs.)

Each output file names the package, its version, its licence and the file
inside the package the numbers come from. Only numbers and identifiers (CAS
numbers, formulas, the package's own short labels) are written: no prose.
The vitest cross-checks in tests/data/reference-crosscheck.test.ts read these
files, so CI needs no Python.
"""
from __future__ import annotations

import csv
import json
import os
import re
import sys
from datetime import date
from importlib import metadata

ROOT = os.path.abspath(os.path.join(os.path.dirname(__file__), "..", "..", "..", ".."))
OUT = os.path.join(ROOT, "tests", "reference")
LLNL = os.environ.get("IONHEAT_LLNL", os.path.join(ROOT, "..", "..", "shared", "reference", "phreeqc", "llnl.dat"))


# ---------------------------------------------------------------- formulas
def _composition(text: str) -> dict[str, float]:
    """Element counts of a formula such as KAl(SO4)2·12H2O, CaCl2:6H2O or [HC(O)O]."""
    total: dict[str, float] = {}
    for part_index, part in enumerate(re.split(r"[·:.*]", text)):
        m = re.match(r"^(\d+)(.*)$", part) if part_index > 0 else None
        mult = int(m.group(1)) if m else 1
        body = m.group(2) if m else part
        for el, n in _parse_group(body).items():
            total[el] = total.get(el, 0) + n * mult
    return total


def _parse_group(s: str) -> dict[str, float]:
    stack: list[dict[str, float]] = [{}]
    i = 0
    while i < len(s):
        c = s[i]
        if c in "([":
            stack.append({})
            i += 1
        elif c in ")]":
            group = stack.pop()
            i += 1
            m = re.match(r"\d+", s[i:])
            n = int(m.group(0)) if m else 1
            i += len(m.group(0)) if m else 0
            for el, k in group.items():
                stack[-1][el] = stack[-1].get(el, 0) + k * n
        else:
            m = re.match(r"([A-Z][a-z]?)(\d*)", s[i:])
            if not m:
                raise ValueError(f"cannot read formula {s!r} at {i}")
            el, n = m.group(1), int(m.group(2) or 1)
            stack[-1][el] = stack[-1].get(el, 0) + n
            i += len(m.group(0))
    if len(stack) != 1:
        raise ValueError(f"unbalanced brackets in {s!r}")
    return stack[0]


def hill(comp: dict[str, float]) -> str:
    """Hill formula (C, H first when carbon is present, then alphabetical)."""
    def term(el: str) -> str:
        n = comp[el]
        return el + ("" if n == 1 else str(int(n)))
    keys = sorted(comp)
    if "C" in comp:
        first = ["C"] + (["H"] if "H" in comp else [])
        keys = first + [k for k in keys if k not in first]
    return "".join(term(k) for k in keys)


# Rows whose CAS number the identifier table lacks or gives as an ion (lithium
# oxide as HLi2O+): the formula their label names.
LABEL_FORMULAS = {
    "Lithium oxide": "Li2O",
    "Titanium(IV) oxide (rutile)": "TiO2",
    "Titanium(IV) oxide (anatase)": "TiO2",
    "Titanium(IV) oxide (brookite)": "TiO2",
    "Barium titanate [BaTiO3]": "BaTiO3",
    "Lithium bromate": "LiBrO3",
}

HYDRATE_NUMBERS = {"mono": 1, "di": 2, "tri": 3, "tetra": 4, "penta": 5, "hexa": 6, "hepta": 7, "octa": 8, "nona": 9, "deca": 10, "dodeca": 12}

# Carbon compounds kept: carbonates, acetates, cyanides and the like (≤ 2 C), and
# the non-electrolyte pack fills (urea, sucrose, xylitol, erythritol).
PACK_ORGANICS = {"CH4N2O", "C12H22O11", "C5H12O5", "C4H10O4"}


def _inorganic(formula: str) -> bool:
    comp = _composition(formula)
    return comp.get("C", 0) <= 2 or hill(comp) in PACK_ORGANICS


def write(name: str, header: dict, records: list) -> None:
    path = os.path.join(OUT, name)
    body = dict(header)
    body["records"] = records
    with open(path, "w", encoding="utf-8") as f:
        f.write("{\n")
        items = list(body.items())
        for k, (key, value) in enumerate(items):
            if key == "records":
                f.write('  "records": [\n')
                for j, rec in enumerate(value):
                    f.write("    " + json.dumps(rec, ensure_ascii=False) + ("," if j < len(value) - 1 else "") + "\n")
                f.write("  ]")
            else:
                f.write(f"  {json.dumps(key)}: {json.dumps(value, ensure_ascii=False)}")
            f.write(",\n" if k < len(items) - 1 else "\n")
        f.write("}\n")
    print(f"{name}: {len(records)} records")


def num(text: str) -> float | None:
    text = (text or "").strip()
    return float(text) if text else None


def kj(text: str) -> float | None:
    v = num(text)
    return None if v is None else round(v / 1000, 4)


# ---------------------------------------------------------------- chemicals
def chemicals_files() -> None:
    import chemicals
    from chemicals.identifiers import pubchem_db

    version = metadata.version("chemicals")
    base = os.path.dirname(chemicals.__file__)
    pkg = {"package": "chemicals (PyPI)", "version": version, "licence": "MIT"}

    def formula_of(cas: str, label: str = "") -> str | None:
        hit = pubchem_db.search_CAS(cas)
        formula = hit.formula if hit else None
        if (not formula or re.search(r"[+-]", formula)) and label.strip() in LABEL_FORMULAS:
            formula = LABEL_FORMULAS[label.strip()]
        return formula

    def with_hydrates(rows: list[dict], label_key: str = "Chemical") -> dict[str, str]:
        """CAS → formula. A hydrate ('… hexahydrate') takes the formula of the
        anhydrous row of the same label plus its water: the identifier table
        writes some hydrates with one water only, so its formula is not used for
        them; a hydrate without an anhydrous row is left out."""
        by_cas: dict[str, str] = {}
        by_label: dict[str, str] = {}
        hydrates = []
        for r in rows:
            m = re.match(r"^(.*\S)\s+(\w+)hydrate$", r[label_key].strip().lower())
            if m:
                hydrates.append((r["CAS"], m))
                continue
            f = formula_of(r["CAS"], r[label_key])
            if f and not re.search(r"[+-]", f):
                by_cas[r["CAS"]] = f
                by_label[r[label_key].strip().lower()] = f
        for cas, m in hydrates:
            if m.group(2) in HYDRATE_NUMBERS and m.group(1) in by_label:
                by_cas[cas] = f"{by_label[m.group(1)]}.{HYDRATE_NUMBERS[m.group(2)]}H2O"
        return by_cas

    # CRC Handbook, standard thermodynamic properties of chemical substances.
    rel = "chemicals/Heat Capacity/CRC Standard Thermodynamic Properties of Chemical Substances.tsv"
    rows = list(csv.DictReader(open(os.path.join(base, "Heat Capacity", "CRC Standard Thermodynamic Properties of Chemical Substances.tsv")), delimiter="\t"))
    formulas = with_hydrates(rows)
    out = []
    for r in rows:
        values = {"cr": (kj(r["Hfs"]), num(r["Cps"])), "l": (kj(r["Hfl"]), num(r["Cpl"])), "g": (kj(r["Hfg"]), num(r["Cpg"]))}
        formula = formulas.get(r["CAS"])
        if not formula or re.search(r"[+-]", formula) or not _inorganic(formula):
            continue
        for phase, (hf, cp) in values.items():
            if hf is None and cp is None:
                continue
            if phase == "g" and "C" in _parse_group(formula):
                continue  # organic gases: nothing here to compare
            out.append({"cas": r["CAS"], "label": r["Chemical"].strip(), "hill": hill(_composition(formula)), "phase": phase, "dfH": hf, "cp": cp})
    write("chemicals-crc-thermo.json", {**pkg, "file": rel,
          "upstream": "CRC Handbook of Chemistry and Physics, table of standard thermodynamic properties of chemical substances (as carried by the package)",
          "units": {"dfH": "kJ/mol (package: J/mol)", "cp": "J/(mol·K)"},
          "conditions": "298.15 K, 1 bar", "formulaFrom": "Hill formula of the CAS number in the package's pubchem identifier table; a hydrate missing there takes the formula of the anhydrous row of the same label plus its water"}, out)

    # CRC Handbook, thermodynamic properties of aqueous ions.
    rel = "chemicals/Electrolytes/CRC Thermodynamic Properties of Aqueous Ions.tsv"
    rows = csv.DictReader(open(os.path.join(base, "Electrolytes", "CRC Thermodynamic Properties of Aqueous Ions.tsv")), delimiter="\t")
    out = []
    for r in rows:
        m = re.match(r"^(.*?)([+-])(\d*)$", r["Formula"].strip())
        if not m:
            continue
        charge = (1 if m.group(2) == "+" else -1) * int(m.group(3) or 1)
        hf, cp = kj(r["Hf(aq)"]), num(r["Cp(aq)"])
        if hf is None and cp is None:
            continue
        out.append({"formula": r["Formula"].strip(), "hill": hill(_parse_group(m.group(1))), "charge": charge, "dfH": hf, "cp": cp})
    write("chemicals-crc-aqueous-ions.json", {**pkg, "file": rel,
          "upstream": "CRC Handbook of Chemistry and Physics, thermodynamic properties of aqueous ions (as carried by the package)",
          "units": {"dfH": "kJ/mol (package: J/mol)", "cp": "J/(mol·K)"},
          "conventions": "298.15 K, 1 bar, standard state 1 mol/kg; conventional scale, dfH(H+, aq) = 0"}, out)

    # CRC Handbook, physical constants of inorganic compounds: density.
    rel = "chemicals/Misc/Physical Constants of Inorganic Compounds.csv"
    rows = list(csv.DictReader(open(os.path.join(base, "Misc", "Physical Constants of Inorganic Compounds.csv")), delimiter="\t"))
    formulas = with_hydrates(rows)
    out = []
    for r in rows:
        rho = num(r["rho"])
        formula = formulas.get(r["CAS"])
        if rho is None or not formula or re.search(r"[+-]", formula) or not _inorganic(formula):
            continue
        out.append({"cas": r["CAS"], "label": r["Chemical"].strip(), "hill": hill(_composition(formula)), "density": round(rho / 1000, 5)})
    write("chemicals-crc-densities.json", {**pkg, "file": rel,
          "upstream": "CRC Handbook of Chemistry and Physics, physical constants of inorganic compounds, density column (as carried by the package)",
          "units": {"density": "g/cm³ (package: kg/m³)"},
          "formulaFrom": "Hill formula of the CAS number in the package's pubchem identifier table; a hydrate missing there takes the formula of the anhydrous row of the same label plus its water"}, out)

    # CRC Handbook, physical constants of organic compounds: density of the few
    # organic solutes a pack may use (urea, sugars, sugar alcohols).
    rel = "chemicals/Misc/Physical Constants of Organic Compounds.csv"
    rows = csv.DictReader(open(os.path.join(base, "Misc", "Physical Constants of Organic Compounds.csv")), delimiter="\t")
    out = []
    for r in rows:
        rho = num(r["rho"])
        formula = formula_of(r["CAS"])
        if rho is None or not formula or re.search(r"[+-]", formula) or hill(_composition(formula)) not in PACK_ORGANICS:
            continue
        out.append({"cas": r["CAS"], "label": r["Name"].strip(), "hill": hill(_composition(formula)), "density": round(rho / 1000, 5)})
    write("chemicals-crc-organic-densities.json", {**pkg, "file": rel,
          "upstream": "CRC Handbook of Chemistry and Physics, physical constants of organic compounds, density column (as carried by the package)",
          "units": {"density": "g/cm³ (package: kg/m³)"},
          "selection": "only the Hill formulas of the organic solutes ionheat tabulates (PACK_ORGANICS)",
          "formulaFrom": "Hill formula of the CAS number in the package's pubchem identifier table"}, out)

    # Active Thermochemical Tables 1.112, gas phase.
    rel = "chemicals/Reactions/ATcT 1.112 (g).tsv"
    rows = csv.DictReader(open(os.path.join(base, "Reactions", "ATcT 1.112 (g).tsv")), delimiter="\t")
    out = []
    for r in rows:
        m = re.match(r"^(.*?)\s*\(g\)$", r["Formula"].strip())
        if not m:
            continue
        text = m.group(1)
        cm = re.match(r"^(.*?)(\d*)([+-])$", text) if text.endswith(("+", "-")) else None
        charge = 0
        if cm:
            charge = (1 if cm.group(3) == "+" else -1) * int(cm.group(2) or 1)
            text = cm.group(1)
        try:
            comp = _parse_group(text)
        except ValueError:
            continue
        if sum(comp.values()) > 8:
            continue
        out.append({"cas": r["CAS"], "formula": r["Formula"].strip(), "hill": hill(comp), "charge": charge,
                    "dfH0K": kj(r["Hfg_0K"]), "dfH": kj(r["Hfg"]), "u": kj(r["uncertainty"])})
    write("chemicals-atct-gas.json", {**pkg, "file": rel,
          "upstream": "Active Thermochemical Tables (ATcT) version 1.112, gas phase (as carried by the package)",
          "units": {"dfH0K": "kJ/mol at 0 K", "dfH": "kJ/mol at 298.15 K", "u": "kJ/mol, ATcT stated uncertainty"},
          "conventions": "ion convention (stationary electron): dfH(H+, g) = 1530.05 kJ/mol; electron-convention value = dfH + charge × 5/2 RT",
          "selection": "species of at most 8 atoms"}, out)

    # JANAF Thermochemical Tables (1998), gas phase: atoms and small ions.
    rel = "chemicals/Reactions/JANAF_1998.tsv"
    rows = csv.DictReader(open(os.path.join(base, "Reactions", "JANAF_1998.tsv")), delimiter="\t")
    out = []
    for r in rows:
        text = r["formula"].strip()
        cm = re.match(r"^(.*?)([+-])(\d*)$", text)
        charge = 0
        if cm:
            charge = (1 if cm.group(2) == "+" else -1) * int(cm.group(3) or 1)
            text = cm.group(1)
        try:
            comp = _parse_group(text)
        except ValueError:
            continue
        hf = kj(r["Hfg"])
        if hf is None or sum(comp.values()) > 8:
            continue
        out.append({"cas": r["CAS"], "formula": r["formula"].strip(), "hill": hill(comp), "charge": charge, "dfH": hf})
    write("chemicals-janaf-gas.json", {**pkg, "file": rel,
          "upstream": "NIST-JANAF Thermochemical Tables, 4th edition (1998), gas phase (as carried by the package)",
          "units": {"dfH": "kJ/mol at 298.15 K (package: J/mol)"},
          "conventions": "electron convention (thermal electron), as JANAF tabulates ions",
          "selection": "species of at most 8 atoms"}, out)

    # JANAF Thermochemical Tables (1998), solids: heat capacity at 298.15 K.
    rel = "chemicals/Heat Capacity/JANAF_1998_solid_Cp.json"
    with open(os.path.join(base, "Heat Capacity", "JANAF_1998_solid_Cp.json"), encoding="utf-8") as f:
        table = json.load(f)
    out = []
    for cas, (temperatures, cps) in table.items():
        formula = formula_of(cas)
        if not formula or re.search(r"[+-]", formula) or not _inorganic(formula) or 298.15 not in temperatures:
            continue
        out.append({"cas": cas, "hill": hill(_parse_group(formula)), "cp": cps[temperatures.index(298.15)]})
    write("chemicals-janaf-solid-cp.json", {**pkg, "file": rel,
          "upstream": "NIST-JANAF Thermochemical Tables, 4th edition (1998), condensed phases: Cp at 298.15 K (as carried by the package)",
          "units": {"cp": "J/(mol·K)"}}, out)

    # Perry's Chemical Engineers' Handbook, table 2-151: heat capacities of inorganic solids (cal/(mol·K) equations).
    rel = "chemicals/Heat Capacity/Perrys Table 2-151.tsv"
    rows = csv.DictReader(open(os.path.join(base, "Heat Capacity", "Perrys Table 2-151.tsv")), delimiter="\t")
    out = []
    for r in rows:
        if r["main phase"].strip() != "c":
            continue
        formula = r["Formula"].strip()
        try:
            comp = _composition(formula)
        except ValueError:
            continue
        try:
            terms = [num(r[k]) or 0.0 for k in ("Constant Term", "+*T term", "/T^2 term", "*T^2 term")]
            limits = [num(r["Tmin"]), num(r["Tmax"]), num(r["%error"])]
        except ValueError:
            continue  # a footnote mark in a number cell
        out.append({"formula": formula, "hill": hill(comp), "subphase": r["subphase"].strip() or None,
                    "a": terms[0], "b": terms[1], "c": terms[2], "d": terms[3],
                    "tmin": limits[0], "tmax": limits[1], "errorPercent": limits[2]})
    write("chemicals-perry-cp.json", {**pkg, "file": rel,
          "upstream": "Perry's Chemical Engineers' Handbook, table 2-151, heat capacities of the elements and inorganic compounds (as carried by the package)",
          "units": {"a": "cal/(mol·K)", "b": "cal/(mol·K²)", "c": "cal·K/mol", "d": "cal/(mol·K³)", "tmin": "K", "tmax": "K", "errorPercent": "%"},
          "equation": "Cp = a + b·T + c/T² + d·T², cal/(mol·K); × 4.184 for J/(mol·K)"}, out)


# ---------------------------------------------------------------- pymatgen
ROMAN = {"I": 1, "II": 2, "III": 3, "IV": 4, "V": 5, "VI": 6, "VII": 7, "VIII": 8, "IX": 9, "X": 10, "XI": 11, "XII": 12, "XIV": 14}

def pymatgen_file() -> None:
    import pymatgen.core as mg  # Debian python3-pymatgen
    from pymatgen.core.periodic_table import Element

    version = getattr(mg, "__version__", "unknown")
    data_file = os.path.join(os.path.dirname(mg.__file__), "periodic_table.json")
    with open(data_file, encoding="utf-8") as f:
        table = json.load(f)
    radii, ies, eas, masses = [], [], [], []
    ev = 96.48533212  # kJ/mol per eV (CODATA 2018)
    for sym, d in table.items():
        try:
            z = Element(sym).Z
        except ValueError:
            continue
        shannon = d.get("Shannon radii") or {}
        for ox, by_cn in shannon.items():
            for cn, by_spin in by_cn.items():
                for spin, r in by_spin.items():
                    number = ROMAN.get(cn.replace("SQ", "").replace("PY", "").strip())
                    if number is None:
                        continue
                    radii.append({"element": sym, "charge": int(ox), "coordination": number, "site": cn,
                                  "spin": {"High Spin": "high", "Low Spin": "low"}.get(spin), "ionic": r.get("ionic_radius"), "crystal": r.get("crystal_radius")})
        for stage, e in enumerate(d.get("Ionization energies") or [], start=1):
            if e is not None and stage <= 8:
                ies.append({"element": sym, "stage": stage, "eV": e, "kJ": round(e * ev, 2)})
        ea = d.get("Electron affinity")
        if ea is not None:
            eas.append({"element": sym, "eV": ea, "kJ": round(ea * ev, 2)})
        am = d.get("Atomic mass")
        if am is not None:
            masses.append({"element": sym, "z": z, "mass": am})
    pkg = {"package": "python3-pymatgen (Debian)", "version": version, "licence": "MIT (debian/copyright)",
           "file": "pymatgen/core/periodic_table.json"}
    write("pymatgen-shannon-radii.json", {**pkg, "upstream": "Shannon (1976) effective ionic radii as carried by the package",
          "units": {"ionic": "Å", "crystal": "Å"}}, radii)
    write("pymatgen-atomic.json", {**pkg, "upstream": "ionization energies and electron affinities as carried by the package (NIST ASD based)",
          "units": {"eV": "eV", "kJ": "kJ/mol, eV × 96.48533212", "mass": "g/mol"}},
          [{"kind": "ionization", **r} for r in ies] + [{"kind": "affinity", **r} for r in eas] + [{"kind": "mass", **r} for r in masses])


# ---------------------------------------------------------------- llnl.dat
def llnl_file() -> None:
    text = open(LLNL, encoding="latin-1").read().splitlines()
    start = next(i for i, line in enumerate(text) if line.strip() == "PHASES")
    out = []
    i = start + 1
    while i < len(text):
        line = text[i]
        if line.strip() in ("EXCHANGE_MASTER_SPECIES", "SURFACE_MASTER_SPECIES", "RATES", "END"):
            break  # the next keyword block
        if line and not line[0].isspace() and not line.startswith("#"):
            name = line.strip()
            reaction = text[i + 1].strip() if i + 1 < len(text) else ""
            rec = {"phase": name, "reaction": reaction}
            j = i + 2
            while j < len(text) and (not text[j] or text[j][0].isspace() or text[j].startswith("#")):
                s = text[j].strip()
                m = re.match(r"^log_k\s+(\S+)", s)
                if m:
                    rec["logK"] = float(m.group(1))
                m = re.match(r"^-delta_H\s+(\S+)\s*(kJ/mol|kcal/mol)?", s)
                if m:
                    v = float(m.group(1))
                    rec["dH"] = round(v * 4.184, 4) if m.group(2) == "kcal/mol" else v
                m = re.match(r"^#\s*Enthalpy of formation:\s+(\S+)\s*(kJ/mol|kcal/mol)", s)
                if m:
                    v = float(m.group(1))
                    rec["dfH"] = round(v * 4.184, 4) if m.group(2) == "kcal/mol" else v
                j += 1
            solid = reaction.split("=")[0].split(" + ")[0].strip()
            try:
                rec["hill"] = hill(_composition(solid))
            except (ValueError, IndexError):
                rec["hill"] = None
            rec["solid"] = solid
            if rec.get("dH") == 0:
                rec["dH"] = None
            if rec.get("dfH") == 0:
                rec["dfH"] = None
            if rec["hill"] and ("logK" in rec):
                out.append(rec)
            i = j
            continue
        i += 1
    write("phreeqc-llnl-phases.json", {"package": "PHREEQC 3 database llnl.dat (USGS)", "version": "usgs-coupled/phreeqc3 commit 8176af0c5e28ac469227b932f89fac3a29d5909c, database/llnl.dat",
          "licence": "USGS user rights notice (public domain): tests/reference/phreeqc-NOTICE.TXT, copied unchanged from doc/NOTICE.TXT of the same commit",
          "file": "database/llnl.dat, PHASES block",
          "acknowledgement": "PHREEQC and its databases are by D. L. Parkhurst and C. A. J. Appelo, U.S. Geological Survey; llnl.dat after the Lawrence Livermore National Laboratory thermodynamic database",
          "modifications": f"Not the original distribution (which is the repository and commit named in version). Extracted on {date.today().isoformat()} by the ionheat project with src/node/scripts/reference/extract_reference.py: only each phase's name, reaction, log_k, -delta_H and enthalpy-of-formation comment, kcal/mol converted to kJ/mol (x 4.184), zeros read as missing.",
          "units": {"logK": "log10 K at 25 °C", "dH": "kJ/mol, enthalpy of the dissolution reaction at 25 °C (kcal converted × 4.184)", "dfH": "kJ/mol, enthalpy of formation of the solid (kcal converted × 4.184)"}}, out)


if __name__ == "__main__":
    os.makedirs(OUT, exist_ok=True)
    parts = sys.argv[1:] or ["chemicals", "pymatgen", "llnl"]
    if "chemicals" in parts:
        chemicals_files()
    if "pymatgen" in parts:
        pymatgen_file()
    if "llnl" in parts:
        llnl_file()
