using LevelDesign.Core.Model;
using LevelDesign.Core.Presentation;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

/// <summary>
/// Named operating points and the comparison of two points: Enter on a point of the board shows its states; a and b
/// mark what the states page shows as A and B; the comparison page lists both with B − A; p saves the sweep cursor as
/// a new operating point of the file.
/// </summary>
public sealed partial class MainWindow
{
    private CompareText.Mark? _markA, _markB;

    /// <summary>A named point shown on the state pages (Enter on it on the board); null once the cursor moves or the file changes.</summary>
    private (string Name, PointSnapshot Snapshot)? _pointView;

    private readonly LatestOnly _namedPointJobs = new();

    /// <summary>Computes the device at a named operating point off the UI thread and shows its states.</summary>
    private void ShowNamedPoint(string name)
    {
        if (_session.Document is not { } document) return;
        Device device;
        try { device = document.AtPoint(name); }
        catch (ArgumentException e) { Say("✗ " + e.Message, warning: true); return; }
        var (generation, token) = _namedPointJobs.Begin();
        Say($"⟳ computing the states at point {name}…");
        Task.Run(() =>
        {
            try
            {
                var snapshot = PointComputer.Compute(device, checkConvergence: false, token);
                _scheduler.Post(() =>
                {
                    if (!_namedPointJobs.IsCurrent(generation) || !ReferenceEquals(document, _session.Document)) return;
                    _cursorSnapshot = null;
                    _pointView = (name, snapshot);
                    if (_pageShown is not (Page.States or Page.Shifts or Page.Matrix or Page.Compare)) ShowPage(Page.States);
                    RefreshPage();
                    Say($"states at point {name}: a or b marks it for the comparison page; Esc on the board goes back to the file's biases");
                });
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() => Say($"✗ cannot compute point {name}: {DescribeProblem(e)}", warning: true));
            }
        }, CancellationToken.None);
    }

    /// <summary>Back to the file's biases on the state pages (the named point view ends).</summary>
    private bool LeavePointView()
    {
        if (_pointView is null) return false;
        _pointView = null;
        _namedPointJobs.Cancel();
        RefreshPage();
        Say("states at the biases in the file");
        return true;
    }

    private string PointWhere(string name)
    {
        var point = _session.Document?.Points.FirstOrDefault(p => p.Name == name);
        return point is null ? $"point {name}" : $"point {name} ({BoardOutline.PointText(_session.Document!, point)})";
    }

    /// <summary>Marks what the state pages show now as A or B of the comparison.</summary>
    private void Mark(char which)
    {
        if (Shown is not { } shown) { Say("nothing computed yet"); return; }
        var mark = new CompareText.Mark(Where(), shown.Spectrum, shown.Quantities);
        if (which == 'a') _markA = mark; else _markB = mark;
        Say($"{char.ToUpperInvariant(which)} = {mark.Where}" + (_pageShown == Page.Compare ? "" : "; F3 to the comparison page shows A, B and B − A"));
        RefreshPage();
    }

    /// <summary>A, or the file's biases when nothing was marked as A (the everyday idle point).</summary>
    private CompareText.Mark? MarkA => _markA ?? (_snapshot is { } file ? new CompareText.Mark("the biases in the file", file.Spectrum, file.Quantities) : null);

    private IReadOnlyList<TextLine> ComparePage(int width) =>
        CompareText.Build(MarkA, _markB, width, _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold);

    /// <summary>p: the sweep cursor's bias values become a new [points.NAME] table (one undoable edit).</summary>
    private void AskSaveCursorAsPoint()
    {
        var document = _session.Document;
        if (document is null || _sweep is null || _cursorSnapshot is null || CursorPointIndex < 0 || CursorPointIndex >= _sweep.Points.Count)
        {
            Say("p saves the sweep cursor as an operating point: run a sweep (F5) and move the cursor (← →) first");
            return;
        }
        var point = _sweep.Points[CursorPointIndex];
        var values = new List<(string Bias, string Value)>();
        for (int i = 0; i < _sweep.Plan.Axes.Count; i++)
        {
            string path = _sweep.Plan.Axes[i].Path;
            if (document.Bias(path) is null)
            {
                Say($"the sweep moves {path} directly; an operating point holds bias values, so sweep a bias to save points", warning: true);
                return;
            }
            values.Add((path, ShownUnit.Of(document, path).Text(point.AxisValues[i], 10)));
        }
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
