using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Export;

/// <summary>Hook for SVG/PNG export through src/LevelDesign.Plots once it is merged.</summary>
public interface IPlotExporter
{
    bool Supports(string extension);
    void Export(SpectrumSeries series, string title, string path);
}
