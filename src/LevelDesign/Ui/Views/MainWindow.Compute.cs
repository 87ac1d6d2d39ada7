using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

public sealed partial class MainWindow
{
    // ---- sweeps ---------------------------------------------------------------------------------

    private void AskSweep()
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        _prompt.Ask($"sweep: {SweepRequestParser.Syntax}", _sweeps.Suggestion(document), text =>
        {
            if (_sweeps.Ask(text) is string error) return error;
            ShowPage(_sweeps.Request!.Axes.Count == 2 ? Page.Map : Page.Spectrum);
            return null;
        });
    }

    private void OnSweepProgress()
    {
        _spectrum.Status = _sweeps.SpectrumStatus;
        _spectrum.SetNeedsDraw();
        UpdateStatus();
    }

    /// <summary>The sweep, its crossings, the manifold or a cursor changed: the spectrum and the page are drawn again.</summary>
    private void OnSweepChanged()
    {
        if (_sweeps.Series is { } series) _spectrum.FormatBias = v => _sweeps.AxisText(series.AxisName, v);
        _spectrum.ManifoldText = _sweeps.Manifold.Describe();
        _spectrum.Status = _sweeps.SpectrumStatus;
        _spectrum.Show(_sweeps.Series, _sweeps.Crossings);
        RefreshPage();
        UpdateStatus();
    }

    /// <summary>A named point's states arrived: they show on a state page.</summary>
    private void OnNamedPointShown()
    {
        if (_pageShown is not (Page.States or Page.Shifts or Page.Matrix or Page.Compare)) ShowPage(Page.States);
    }

    private void NextManifold() => _sweeps.NextManifold();

    private string Where() => _sweeps.Where();

    private PointSnapshot? Shown => _sweeps.Shown(_point.Snapshot);

    private void RefreshPage()
    {
        _crossingList.Visible = _pageShown == Page.Crossings && _pageFrame.Visible;
        _page.Visible = !_crossingList.Visible;
        var page = _pageShown == Page.Spectrum ? Page.States : _pageShown; // in wide mode the lower page shows states
        _pageFrame.Title = page switch
        {
            Page.States => "States at cursor",
            Page.Shifts => "Shifts at cursor",
            Page.Crossings => "Crossings (Enter: go to)",
            Page.Quantities => "Quantities along the sweep (Enter: choose)",
            Page.Matrix => "Matrix elements (Enter: operator)",
            Page.Compare => "Compare A and B (a, b mark)",
            Page.Map => "Map of a two-axis sweep (Enter: quantity)",
            Page.Help => _showLimits ? "Help: limits of the model" : "Help: keys",
            Page.Errors => "Errors in the device file",
            _ => "",
        };
        var shown = Shown;
        int width = PageWidth;
        switch (page)
        {
            case Page.States:
                _page.SetLines(shown is null ? [new TextLine(_point.IsComputing ? "⟳ computing…" : "nothing computed yet")] : StatesTableText.Build(shown.Spectrum, Where(), width, _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold));
                break;
            case Page.Shifts:
                _page.SetLines(shown is null ? [new TextLine(_point.IsComputing ? "⟳ computing…" : "nothing computed yet")]
                    : ShiftsText.Build(shown.Quantities, Where(), _point.Snapshot?.Convergence, _point.Snapshot?.Spectrum.Device, _point.Snapshot?.ConvergenceProblem, width,
                        ReferenceEquals(shown, _point.Snapshot) ? _point.Snapshot?.Coherence : null,
                        _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold));
                break;
            case Page.Help:
                _page.SetLines(_showLimits ? HelpText.Limits(width) : HelpText.Keys(width));
                break;
            case Page.Errors:
                _page.SetLines(LoadErrorText.Build(_session.LoadErrors, _session.LoadedText, width));
                break;
            case Page.Quantities:
                _page.SetLines(QuantityPage(width));
                break;
            case Page.Matrix:
                _page.SetLines(MatrixPage(width));
                break;
            case Page.Compare:
                _page.SetLines(ComparePage(width));
                break;
            case Page.Map:
                _page.SetLines(MapPage(width));
                break;
            case Page.Crossings:
                string axis = _sweeps.Series?.AxisName ?? "";
                _crossingList.SetLines(CrossingsText.Build(_sweeps.Crossings, _sweeps.Result, _sweeps.Series?.AxisName, _sweeps.CrossingsPending,
                    v => ShownUnit.Of(_session.Document, axis).Text(v, 4), width - 1, _sweeps.CrossingPoints()));
                break;
        }
        SetNeedsDraw();
    }

    private void JumpToCrossing(int index)
    {
        if (_sweeps.CrossingAt(index - CrossingsText.HeaderLines) is not { } mark) return;
        _spectrum.SetCursor(mark.PointIndex);
        ShowPage(Page.Spectrum);
        string axis = _sweeps.Series?.AxisName ?? "";
        Say($"cursor at the sweep point nearest the crossing {mark.LabelA} ↔ {mark.LabelB} ({axis} = {_sweeps.AxisText(axis, mark.Crossing.Bias)})");
    }

    private IReadOnlyList<TextLine> QuantityPage(int width)
    {
        var sweep = _sweeps.Result;
        if (sweep is null || sweep.Plan.Axes.Count != 1 || sweep.Points.Count == 0)
            return QuantitiesText.Build([], [], 0, ShownUnit.Plain, "", width, 0, 0);
        string axis = sweep.Plan.Axes[0].Path;
        var names = _sweeps.QuantityNames ?? QuantitySeries.Default(sweep);
        var series = names.Select(n => QuantitySeries.From(sweep, n)).ToList();
        var values = sweep.Points.Select(p => p.AxisValues[0]).ToArray();
        int cursor = Math.Clamp(_sweeps.CursorIndex, 0, values.Length - 1);
        int height = Math.Max(8, _page.Viewport.Height);
        return QuantitiesText.Build(series, values, cursor, ShownUnit.Of(_session.Document, axis), axis, width, height,
            _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold);
    }

    private void AskQuantities()
    {
        if (_sweeps.Result is not { Points.Count: > 0 } sweep) { Say("run a sweep first (F5)"); return; }
        var available = QuantitySeries.Available(sweep);
        string current = string.Join(", ", _sweeps.QuantityNames ?? QuantitySeries.Default(sweep));
        _prompt.Ask($"plot along the sweep (comma-separated): {string.Join(", ", available.Take(12))}{(available.Count > 12 ? ", …" : "")}", current,
            _sweeps.ChooseQuantities);
    }
}
