using LevelDesign.Core.Sweeps;
using LevelDesign.Plots;

namespace LevelDesign.Ui.Export;

/// <summary>Writes the sweep's spectrum with <see cref="SpectrumPlot"/> as .svg or .png.</summary>
public sealed class SpectrumPlotExporter : IPlotExporter
{
    public bool Supports(string extension) => extension is ".svg" or ".png";

    public void Export(SweepResult sweep, IReadOnlyList<Crossing> crossings, string title, string path, Core.DeviceFiles.DeviceDocument? document,
        Predicate<int>? manifold)
    {
        var plot = SpectrumPlot.Build(sweep, crossings, title: title, document: document, manifold: manifold);
        if (Path.GetExtension(path).Equals(".png", StringComparison.OrdinalIgnoreCase)) SpectrumPlot.SavePng(plot, path);
        else SpectrumPlot.SaveSvg(plot, path);
    }
}
