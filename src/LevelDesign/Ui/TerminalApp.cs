using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Views;
using Terminal.Gui.App;

namespace LevelDesign.Ui;

/// <summary>Starts the terminal UI on a document, a file path, or the demo device.</summary>
public static class TerminalApp
{
    /// <summary>Target solving (Core's TargetSolver); tests may plug in another.</summary>
    public static ITargetSolver Targets { get; set; } = new TargetSearch();

    /// <summary>SVG/PNG export of sweeps (src/LevelDesign.Plots).</summary>
    public static IPlotExporter? Plots { get; set; } = new SpectrumPlotExporter();

    public static int Run(DeviceDocument? document, string? path)
    {
        // keep a core for keys and drawing while a module's point or a sweep computes
        ComputeCores.Limit = ComputeCores.AllButOne;
        var session = new EditSession();
        if (document is not null) session.OpenDocument(document, path ?? (document.Path.Length > 0 && document.Path != DeviceDocument.DemoPath ? document.Path : null));
        else if (path is not null) session.OpenFile(path);
        else session.OpenDemo();

        using IApplication app = Application.Create();
        app.Init();
        using var window = new MainWindow(session, new AppScheduler(app), new SweepService(), Targets, Plots);
        app.Run(window);
        return 0;
    }
}
