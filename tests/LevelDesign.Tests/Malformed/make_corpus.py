#!/usr/bin/env python3
"""Writes the malformed device corpus. Each case marks the line that must be reported with '#!'; the script
turns that into the header '# expect: line N: "fragment"' read by MalformedCorpusTests. Run from this folder."""
import os

BASE = '''[device]
name = "t"

[elements.qa]
kind = "transmon"
ec = "220 MHz"
ej = "15 GHz"
levels = 3

[elements.r]
kind = "resonator"
frequency = "7 GHz"
levels = 3

[couplers.qa_r]
kind = "capacitive"
between = ["qa", "r"]
g = "80 MHz"
'''

def sub(old, new):
    assert old in BASE, old
    return BASE.replace(old, new, 1)

CASES = {
    "unknown_key_ejsum": ("unknown key 'ejsum'", sub('kind = "transmon"', 'kind = "tunable_transmon"\nejsum = "24 GHz" #!')),
    "missing_kind": ("missing required value 'kind'", sub('[elements.r] \n'.strip() + '\nkind = "resonator"', '[elements.r] #!')),
    "unknown_element_kind": ("did you mean 'transmon'", sub('kind = "transmon"', 'kind = "transmn" #!')),
    "wrong_unit_ec": ("is a capacitance", sub('ec = "220 MHz"', 'ec = "92 fF" #!')),
    "negative_capacitance": ("capacitance must be > 0", sub('ec = "220 MHz"', 'capacitance = "-5 fF" #!')),
    "negative_ej": ("E_J must be ≥ 0", sub('ej = "15 GHz"', 'ej = "-1 GHz" #!')),
    "one_level": ("out of range", sub('levels = 3\n\n[elements.r]', 'levels = 1 #!\n\n[elements.r]')),
    "duplicate_element": ("duplicate id", BASE + '\n[elements.qa] #!\nkind = "resonator"\nfrequency = "6 GHz"\n'),
    "coupler_unknown_element": ("no element 'qz'", sub('between = ["qa", "r"]', 'between = ["qz", "r"] #!')),
    "coupler_unknown_operator": ("has no operator 'phase'", sub('between = ["qa", "r"]', 'between = ["qa", "r"]\noperators = ["phase", "n"] #!')),
    "overlap_not_positive": ("not positive definite", BASE + '\n[elements.tls]\nkind = "level_list"\nenergies = ["0 GHz", "5 GHz"]\noverlap = [[1, 2], [2, 1]] #!\n'),
    "too_large": ("allow_large = true", sub('[device]', '[truncation] #!\ndefault_levels = 4\n\n[device]') + ''.join(f'\n[elements.x{i}]\nkind = "resonator"\nfrequency = "{6 + i / 10} GHz"\nlevels = 6\n' for i in range(10))),
    "syntax_error": ("not valid TOML", sub('ej = "15 GHz"', 'ej = #!')),
    "not_finite": ("not a finite number", sub('ej = "15 GHz"', 'ej = nan #!')),
    "missing_ej": ("missing required value 'ej'", sub('[elements.qa] \n'.strip() + '\nkind = "transmon"\nec = "220 MHz"\nej = "15 GHz"', '[elements.qa] #!\nkind = "transmon"\nec = "220 MHz"')),
    "capacitance_without_unit": ("has no unit", sub('ec = "220 MHz"', 'capacitance = 90 #!')),
    "unknown_table": ("did you mean 'elements'", BASE + '\n[element.qb] #!\nkind = "transmon"\n'),
    "asymmetry_out_of_range": ("[−1, 1]", sub('kind = "transmon"\nec = "220 MHz"\nej = "15 GHz"', 'kind = "tunable_transmon"\nec = "220 MHz"\nej_sum = "15 GHz"\nasymmetry = 1.5 #!')),
    "ec_and_capacitance": ("not both", sub('ec = "220 MHz"', 'ec = "220 MHz"\ncapacitance = "90 fF" #!')),
    "coupler_without_strength": ("missing required value 'g'", sub('[couplers.qa_r]\nkind = "capacitive"\nbetween = ["qa", "r"]\ng = "80 MHz"', '[couplers.qa_r] #!\nkind = "capacitive"\nbetween = ["qa", "r"]')),
    "two_strengths": ("only one coupling strength", sub('g = "80 MHz"', 'g = "80 MHz"\ncoefficient = "20 MHz" #!')),
    "bias_unknown_target": ("is not a parameter", BASE + '\n[biases.qa_flux]\ntarget = "qa.flux" #!\nvalue = 0.1\n'),
    "point_unknown_bias": ("unknown key 'qa_flx'", sub('kind = "transmon"\nec = "220 MHz"\nej = "15 GHz"', 'kind = "tunable_transmon"\nec = "220 MHz"\nej_sum = "15 GHz"') + '\n[biases.qa_flux]\ntarget = "qa.flux"\nvalue = 0.1\n\n[points.idle]\nqa_flx = 0.2 #!\n'),
    "sweep_count_one": ("out of range", sub('kind = "transmon"\nec = "220 MHz"\nej = "15 GHz"', 'kind = "tunable_transmon"\nec = "220 MHz"\nej_sum = "15 GHz"') + '\n[sweeps.scan]\nvary = "qa.flux"\nfrom = 0\nto = 0.5\ncount = 1 #!\n'),
    "capacitance_matrix_not_positive": ("not positive definite", sub('ec = "220 MHz"\n', '').replace('[device]', '[capacitance_matrix]\nnodes = ["qa", "r"]\nmatrix = [["80 fF", "-90 fF"], ["-90 fF", "80 fF"]] #!\n\n[device]')),
    "capacitance_matrix_not_square": ("square matrix", sub('ec = "220 MHz"\n', '').replace('[device]', '[capacitance_matrix]\nnodes = ["qa", "r"]\nmatrix = [["80 fF", "-1 fF"], ["-1 fF"]] #!\n\n[device]')),
    "kerr_turns_down": ("turns down", BASE + '\n[elements.k]\nkind = "kerr"\nfrequency = "5 GHz"\nanharmonicity = "-2 GHz"\nlevels = 6 #!\n'),
    "level_list_too_many_levels": ("keep at most 2", BASE + '\n[elements.tls]\nkind = "level_list"\nenergies = ["0 GHz", "5 GHz"]\nlevels = 3 #!\n'),
    "coupler_self_link": ("two different elements", sub('between = ["qa", "r"]', 'between = ["qa", "qa"] #!')),
    "levels_not_number": ("expected a whole number", sub('levels = 3\n\n[elements.r]', 'levels = "four" #!\n\n[elements.r]')),
    "unit_case": ("did you mean \"GHz\"", sub('frequency = "7 GHz"', 'frequency = "7 Ghz" #!')),
    "negative_kappa": ("κ must be ≥ 0", sub('frequency = "7 GHz"', 'frequency = "7 GHz"\nkappa = "-1 MHz" #!')),
    "bias_mixed_units": ("same unit", sub('kind = "transmon"\nec = "220 MHz"\nej = "15 GHz"', 'kind = "tunable_transmon"\nec = "220 MHz"\nej_sum = "15 GHz"') + '\n[biases.qa_flux]\ntarget = "qa.flux"\nvalue = "0.1 mA"\nperiod = "2 V" #!\n'),
    "inductive_on_transmon": ("does not have", sub('kind = "capacitive"\nbetween = ["qa", "r"]', 'kind = "inductive"\nbetween = ["qa", "r"] #!')),
    "top_level_key": ("unknown top-level key", 'name = "t" #!\n' + BASE),
    "duplicate_key": ("given twice", sub('ej = "15 GHz"', 'ej = "15 GHz"\nej = "16 GHz" #!')),
    "coupler_id_is_element": ("already used by an element", BASE + '\n[couplers.r] #!\nkind = "capacitive"\nbetween = ["qa", "r"]\ng = "10 MHz"\n'),
    "frequency_zero": ("frequency must be > 0", sub('frequency = "7 GHz"', 'frequency = "0 GHz" #!')),
    "fluxonium_missing_el": ("missing required value 'el'", BASE + '\n[elements.f] #!\nkind = "fluxonium"\nec = "1 GHz"\nej = "4 GHz"\n'),
    "inductance_wrong_unit": ("is a capacitance", BASE + '\n[elements.f]\nkind = "fluxonium"\nec = "1 GHz"\nej = "4 GHz"\ninductance = "160 fF" #!\n'),
    "coherence_bad_temperature": ("expected a temperature", BASE + '\n[coherence]\nq_cap = 2e6\nqubit_temperature = "warm" #!\n'),
    "coherence_unknown_key": ("unknown key 'q_cpa'", BASE + '\n[coherence]\nq_cpa = 2e6 #!\n'),
    "transmon_ratio_beyond_basis": ("lower ej, raise E_C or keep fewer levels", sub('ec = "220 MHz"\nej = "15 GHz"', 'ec = "1 kHz"\nej = "1 THz" #!')),
    "transmon_ej_beyond_precision": ("beyond what a 1 Hz convergence test resolves", sub('ej = "15 GHz"', 'ej = "1e6 GHz" #!')),
}

for name, (fragment, text) in CASES.items():
    lines = text.split('\n')
    marked = [i for i, l in enumerate(lines) if l.rstrip().endswith('#!')]
    assert len(marked) == 1, name
    lines[marked[0]] = lines[marked[0]].replace(' #!', '').replace('#!', '')
    line = marked[0] + 2  # one header line comes first; lines count from 1
    header = f'# expect: line {line}: "{fragment}"'
    with open(f'{name}.toml', 'w', encoding='utf-8') as f:
        f.write(header + '\n' + '\n'.join(lines))
print(len(CASES), 'files')
