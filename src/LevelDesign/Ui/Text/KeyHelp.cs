namespace LevelDesign.Ui.Text;

/// <summary>Every key of the board, in one list for the help page (the key bar shows the main ones, as many as fit).</summary>
public static class KeyHelp
{
    public static readonly IReadOnlyList<(string Keys, string What)> All =
    [
        ("F1", "this help (Esc or F1 again to leave)"),
        ("Tab / Shift+Tab", "move between board, parameters and the page"),
        ("F3", "next page: states, shifts, spectrum, crossings, quantities, matrix, compare, map"),
        ("F4", "wide page: hide or show the board column (small terminals)"),
        ("↑ ↓ PgUp PgDn Home End", "move in lists; scroll pages"),
        ("Enter or F2 (parameters)", "edit in place, units as in the file (\"210 MHz\", \"0.31 Φ0\"); ← bias edits that bias (biases override element values); · marks derived values"),
        ("F2 (file with errors)", "fix the first listed error's value in place; unsaved until Ctrl+S"),
        ("Insert (board)", "add an element or coupler (kind picker; default values marked in the file)"),
        ("Delete (board)", "remove the selected item and, as the question lists, what goes with it"),
        ("Enter (board point)", "the states at that operating point; Esc returns to the file's biases"),
        ("a / b", "mark what the states page shows (cursor, named point, file) as A / B for compare"),
        ("p", "save the sweep cursor as an operating point [points.NAME] of the file (undoable)"),
        ("F6 (board)", "rename the selected element, coupler or bias; every reference in the file follows"),
        ("F5", "sweep: BIAS START STOP POINTS, e.g. qc_flux 0.3 mA 0.6 mA 41; a second axis after ';'"),
        ("Esc (while working)", "stop the running sweep (keeping its points), fit or target search (device unchanged)"),
        ("F7", "spectrum manifold: single excitations → up to two → all kept"),
        ("← → (spectrum)", "move the bias cursor; Shift+← → jump 10 points"),
        ("+ − > < (spectrum)", "zoom the frequency axis (+ −) about the cursor's level, the bias axis (> <) about the cursor"),
        ("PgUp / PgDn, ↑ ↓ (spectrum)", "pan the frequency axis; Home fits it again"),
        ("Enter (crossings)", "cursor to the crossing's nearest sweep point (listed nearest the operating points)"),
        ("Enter, arrows (pages)", "quantities, matrix, map: Enter picks what is shown (zz:qa:qb, qa.n); arrows: cursor"),
        ("F8", "export the sweep or states (.csv, .json) or the spectrum with crossings (.svg, .png)"),
        ("F9", "target: biases where a quantity has a value (zz:qa:qb = 0 MHz by qc_flux 0.15 mA to 1 mA); a digit applies a root (undoable)"),
        ("F9 fit", "fit qa.ej_sum qa.ec to qa.f01 = 5.2 GHz, qa.anharmonicity = -230 MHz [at POINT]; a applies"),
        ("Ctrl+S", "save (comments and layout kept, atomic, previous file kept as .bak)"),
        ("Ctrl+W", "save as"),
        ("Ctrl+Z / Ctrl+Y", "undo / redo (every edit)"),
        ("Ctrl+L", "reload the file from disk"),
        ("trunc (status line)", "truncation check of the key values (f01 and α of qubits, 2χ, ZZ) at the file's biases; F3 shifts lists each change in kHz"),
        ("L (help)", "limits of the model"),
        ("Ctrl+Q", "quit (asks first when there are unsaved changes)"),
    ];
}
