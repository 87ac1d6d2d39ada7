namespace LevelDesign.Ui.Text;

/// <summary>Every key of the board, in one list for the help page (the status bar shows the main ones).</summary>
public static class KeyHelp
{
    public static readonly IReadOnlyList<(string Keys, string What)> All =
    [
        ("F1", "this help (Esc or F1 again to leave)"),
        ("Tab / Shift+Tab", "move between board, parameters and the page"),
        ("F3", "next page: states → shifts → spectrum → crossings"),
        ("F4", "wide page: hide or show the board column (small terminals)"),
        ("↑ ↓ PgUp PgDn Home End", "move in lists; scroll pages"),
        ("Enter or F2 (parameters)", "edit the value in place, units as in the file (\"210 MHz\", \"0.31 Φ0\")"),
        ("Insert (board)", "add an element or coupler through the kind picker"),
        ("Delete (board)", "remove the selected element or coupler"),
        ("F6 (board)", "rename the selected element or coupler (couplers follow)"),
        ("F5", "sweep: bias (or bias+linked path), start, stop, points; runs in the background"),
        ("Esc (while sweeping)", "cancel the running sweep (points computed so far are kept)"),
        ("F7", "spectrum manifold: single excitations → up to two → all kept"),
        ("← → (spectrum)", "move the bias cursor; Shift+← → jump 10 points"),
        ("+ / − (spectrum)", "zoom the frequency axis in / out"),
        ("PgUp / PgDn, ↑ ↓ (spectrum)", "pan the frequency axis; Home fits it again"),
        ("Enter (crossings)", "move the cursor to that crossing and show the spectrum"),
        ("F8", "export the sweep (or the states table) to .csv or .json; .svg/.png when plots are built"),
        ("F9", "target: solve a bias for a quantity (e.g. qa.f01 = 5.2 GHz by qa_flux) and apply it"),
        ("Ctrl+S", "save (comments and layout kept, atomic, previous file kept as .bak)"),
        ("Ctrl+W", "save as"),
        ("Ctrl+Z / Ctrl+Y", "undo / redo (every edit)"),
        ("Ctrl+L", "reload the file from disk"),
        ("L (help)", "limits of the model"),
        ("Ctrl+Q", "quit (asks first when there are unsaved changes)"),
    ];
}
