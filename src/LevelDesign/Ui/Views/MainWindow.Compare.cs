using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

/// <summary>
/// Named operating points and the comparison of two points: Enter on a point of the board shows its states; a and b
/// mark what the states page shows as A and B; the comparison page lists both with B − A; p saves the sweep cursor as
/// a new operating point of the file. The points and marks are the sweep controller's.
/// </summary>
public sealed partial class MainWindow
{
    /// <summary>Marks what the state pages show now as A or B of the comparison.</summary>
    private void Mark(char which)
    {
        if (_sweeps.Mark(which, _point.Snapshot) is not { } mark) { Say("nothing computed yet"); return; }
        Say($"{char.ToUpperInvariant(which)} = {mark.Where}" + (_pageShown == Page.Compare ? "" : "; F3 to the comparison page shows A, B and B − A"));
    }

    private IReadOnlyList<TextLine> ComparePage(int width) =>
        CompareText.Build(_sweeps.MarkAOr(_point.Snapshot), _sweeps.MarkB, width, Threshold);

    /// <summary>p: the sweep cursor's bias values become a new [points.NAME] table (one undoable edit).</summary>
    private void AskSaveCursorAsPoint()
    {
        if (_sweeps.CursorAsPoint(out string refusal, out bool warning) is not { } values) { Say(refusal, warning); return; }
        var document = _session.Document!;
        string suggestion = Enumerable.Range(1, 999).Select(n => $"point_{n}").First(n => document.Points.All(p => p.Name != n));
        _prompt.Ask($"save the cursor ({string.Join(", ", values.Select(v => $"{v.Bias} = {v.Value}"))}) as operating point NAME", suggestion, text =>
        {
            _selectAfterEdit = text.Trim();   // the board selects the new point when it is rebuilt
            var outcome = _session.AddPoint(text.Trim(), values);
            if (!outcome.Accepted) { _selectAfterEdit = null; return outcome.Message; }
            Report(outcome);
            return null;
        });
    }
}
