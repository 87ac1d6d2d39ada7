using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

/// <summary>
/// The map page of a two-axis sweep: one chosen quantity shaded over the grid, a cursor moved with the arrows whose
/// point the state pages show, Enter to choose the quantity.
/// </summary>
public sealed partial class MainWindow
{
    /// <summary>The quantity shaded on the map; null: the first ZZ, or the first qubit's f01.</summary>
    private string? _mapQuantity;

    /// <summary>The map cursor: indices along the first and second axis.</summary>
    private (int I, int J) _mapCursor;

    /// <summary>The sweep point under the map cursor, or −1 (no two-axis sweep).</summary>
    private int _mapPoint = -1;

    private bool IsMapSweep => _sweep is { Plan.Axes.Count: 2, Points.Count: > 0 };

    public string MapQuantity(SweepResult sweep) =>
        _mapQuantity is string chosen && QuantitySeries.Available(sweep).Contains(chosen) ? chosen : MapGrid.DefaultQuantity(sweep);

    private double Threshold => _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold;

    /// <summary>The grid last laid out, kept while sweep, quantity and threshold stay (a cursor step only redraws).</summary>
    private MapGrid? _mapGrid;
    private (SweepResult Sweep, string Quantity, double Threshold)? _mapGridKey;

    private MapGrid CurrentMapGrid(SweepResult sweep)
    {
        var key = (sweep, MapQuantity(sweep), Threshold);
        if (_mapGrid is null || _mapGridKey is not { } k || !ReferenceEquals(k.Sweep, sweep) || k.Quantity != key.Item2 || k.Threshold != key.Threshold)
            (_mapGrid, _mapGridKey) = (MapGrid.From(sweep, key.Item2, key.Threshold), key);
        return _mapGrid;
    }

    private IReadOnlyList<TextLine> MapPage(int width)
    {
        if (!IsMapSweep || _sweep is not { } sweep)
            return TextFit.Wrap("the map shows a two-axis sweep: F5 with two axes separated by ';', e.g. " +
                                "qa_flux 0 0.5 31; qc_flux 0.15 mA 1 mA 31 (or a sweep of the file with a second axis)", width)
                .Select(l => new TextLine(l)).ToList();
        var grid = CurrentMapGrid(sweep);
        var (x, y) = (grid.X, grid.Y);
        var unitX = ShownUnit.Of(_session.Document, x.Path);
        var unitY = ShownUnit.Of(_session.Document, y.Path);
        var cursor = (Math.Clamp(_mapCursor.I, 0, x.Count - 1), Math.Clamp(_mapCursor.J, 0, y.Count - 1));
        string where = $"{x.Path} = {unitX.Text(MapGrid.ValueAt(x, cursor.Item1))}, {y.Path} = {unitY.Text(MapGrid.ValueAt(y, cursor.Item2))}";
        return MapText.Build(grid.Quantity, grid.Values, grid.Hybridized, (x.Path, unitX.Text(x.Start), unitX.Text(x.Stop)),
            (y.Path, unitY.Text(y.Start), unitY.Text(y.Stop)), cursor, where, width, Math.Max(10, _page.Viewport.Height));
    }

    /// <summary>Moves the map cursor by (di, dj) grid steps; the state pages then show that point.</summary>
    private bool MoveMapCursor(int di, int dj)
    {
        if (!IsMapSweep || _sweep is not { } sweep) return false;
        var (x, y) = (sweep.Plan.Axes[0], sweep.Plan.Axes[1]);
        _mapCursor = (Math.Clamp(_mapCursor.I + di, 0, x.Count - 1), Math.Clamp(_mapCursor.J + dj, 0, y.Count - 1));
        _mapPoint = CurrentMapGrid(sweep).PointAt(_mapCursor.I, _mapCursor.J);
        _cursorSnapshot = _mapPoint >= 0 ? PointComputer.FromSweepPoint(sweep.Points[_mapPoint], DateTime.Now) : null;
        _pointView = null;
        RefreshPage();
        return true;
    }

    private void AskMapQuantity()
    {
        if (!IsMapSweep || _sweep is not { } sweep) { Say("run a two-axis sweep first: F5, two axes separated by ';'"); return; }
        var available = QuantitySeries.Available(sweep);
        _prompt.Ask($"shade on the map: {string.Join(", ", available.Take(12))}{(available.Count > 12 ? ", …" : "")}", MapQuantity(sweep), text =>
        {
            string chosen = text.Trim();
            if (!available.Contains(chosen)) return $"'{chosen}' is not computed along this sweep{Core.DeviceFiles.EditDistance.Suggestion(chosen, available)}";
            _mapQuantity = chosen;
            RefreshPage();
            return null;
        });
    }
}
