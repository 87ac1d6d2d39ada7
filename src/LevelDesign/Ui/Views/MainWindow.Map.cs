using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

/// <summary>
/// The map page of a two-axis sweep: one chosen quantity shaded over the grid, a cursor moved with the arrows whose
/// point the state pages show, Enter to choose the quantity. Grid, cursor and quantity are the sweep controller's.
/// </summary>
public sealed partial class MainWindow
{
    public string MapQuantity(SweepResult sweep) => _sweeps.MapQuantity(sweep);

    private double Threshold => _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold;

    private IReadOnlyList<TextLine> MapPage(int width)
    {
        if (!_sweeps.IsMapSweep || _sweeps.Result is not { } sweep)
            return TextFit.Wrap("the map shows a two-axis sweep: F5 with two axes separated by ';', e.g. " +
                                "qa_flux 0 0.5 31; qc_flux 0.15 mA 1 mA 31 (or a sweep of the file with a second axis)", width)
                .Select(l => new TextLine(l)).ToList();
        var grid = _sweeps.CurrentMapGrid(sweep);
        var (x, y) = (grid.X, grid.Y);
        var unitX = ShownUnit.Of(_session.Document, x.Path);
        var unitY = ShownUnit.Of(_session.Document, y.Path);
        var cursor = (Math.Clamp(_sweeps.MapCursor.I, 0, x.Count - 1), Math.Clamp(_sweeps.MapCursor.J, 0, y.Count - 1));
        string where = $"{x.Path} = {unitX.Text(MapGrid.ValueAt(x, cursor.Item1))}, {y.Path} = {unitY.Text(MapGrid.ValueAt(y, cursor.Item2))}";
        return MapText.Build(grid.Quantity, grid.Values, grid.Hybridized, (x.Path, unitX.Text(x.Start), unitX.Text(x.Stop)),
            (y.Path, unitY.Text(y.Start), unitY.Text(y.Stop)), cursor, where, width, Math.Max(10, _page.Viewport.Height));
    }

    private void AskMapQuantity()
    {
        if (!_sweeps.IsMapSweep || _sweeps.Result is not { } sweep) { Say("run a two-axis sweep first: F5, two axes separated by ';'"); return; }
        var available = QuantitySeries.Available(sweep);
        _prompt.Ask($"shade on the map: {string.Join(", ", available.Take(12))}{(available.Count > 12 ? ", …" : "")}", MapQuantity(sweep),
            _sweeps.ChooseMapQuantity);
    }
}
