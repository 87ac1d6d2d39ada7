using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Export;

/// <summary>SVG/PNG export of a sweep's spectrum with its crossings (src/LevelDesign.Plots does the drawing).</summary>
public interface IPlotExporter
{
    bool Supports(string extension);
    void Export(SweepResult sweep, IReadOnlyList<Crossing> crossings, string title, string path);
}
