using LevelDesign.Core.DeviceFiles;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Views;
using Terminal.Gui.App;

namespace LevelDesign.Ui;

/// <summary>Starts the terminal UI on a document, a file path, or the demo device.</summary>
public static class TerminalApp
{
    /// <summary>Target solving hook: the sweep engine's root finder plugs in here.</summary>
    public static ITargetSolver Targets { get; set; } = new PendingTargetSolver();

    /// <summary>SVG/PNG export hook: src/LevelDesign.Plots plugs in here.</summary>
    public static IPlotExporter? Plots { get; set; }

    public static int Run(DeviceDocument? document, string? path)
    {
        var session = new EditSession(ChooseStore());
        if (document is not null) session.OpenDocument(document, path ?? (document.Path.Length > 0 ? document.Path : null));
        else if (path is not null) session.OpenFile(path);
        else session.OpenDemo();

        using IApplication app = Application.Create();
        app.Init();
        using var window = new MainWindow(session, new AppScheduler(app), new SweepService(), Targets, Plots);
        app.Run(window);
        return 0;
    }

    /// <summary>
    /// The DeviceDocument contract when it is implemented; until then the development edit-log store, so the
    /// screens can be used and tested before the device-file work is merged.
    /// </summary>
    public static IDocumentStore ChooseStore()
    {
        try
        {
            DeviceDocument.Demo();
            return new DeviceDocumentStore();
        }
        catch (NotImplementedException)
        {
            return new EditLogDocumentStore();
        }
    }
}
