using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Export;

/// <summary>SVG/PNG export of a sweep's spectrum with its crossings (src/LevelDesign.Plots does the drawing).</summary>
public interface IPlotExporter
{
    bool Supports(string extension);
    /// <param name="manifold">The excitation numbers shown on screen, so the picture shows the same branches.</param>
    void Export(SweepResult sweep, IReadOnlyList<Crossing> crossings, string title, string path, Core.DeviceFiles.DeviceDocument? document, Predicate<int>? manifold);
}
