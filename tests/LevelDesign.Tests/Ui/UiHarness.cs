using System.Diagnostics;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Views;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Drives the real main window headlessly: ANSI driver, fixed screen size, injected keys, and assertions on
/// the driver's text. The device is a copy of an example file (devices/*.toml) in a temporary folder.
/// Background results arrive through <see cref="ManualScheduler"/>, pumped by <see cref="WaitFor"/>.
/// </summary>
public sealed class UiHarness : IDisposable
{
    private readonly string? _folder;

    public IApplication App { get; }
    public ManualScheduler Scheduler { get; } = new();
    public EditSession Session { get; }
    public MainWindow Window { get; }

    /// <summary>The copied device file (null when <paramref name="open"/> chose what to open).</summary>
    public string? FilePath { get; }

    public UiHarness(int width = 80, int height = 24, Action<EditSession>? open = null, string device = "single.toml", IPlotExporter? plots = null)
    {
        App = Application.Create();
        App.Init(DriverRegistry.Names.ANSI);
        App.Driver!.SetScreenSize(width, height);
        Session = new EditSession();
        if (open is null)
        {
            _folder = Directory.CreateTempSubdirectory("ld-ui-").FullName;
            FilePath = CopyDevice(device, _folder);
            Session.OpenFile(FilePath);
        }
        else open(Session);
        Window = new MainWindow(Session, Scheduler, new SweepService(), new TargetSearch(), plots);
        App.Begin(Window);
        Draw();
    }

    /// <summary>Copies devices/NAME into a folder and returns the copy's path.</summary>
    public static string CopyDevice(string name, string folder)
    {
        string path = Path.Combine(folder, name);
        File.Copy(Path.Combine(RepositoryPaths.Devices, name), path, overwrite: true);
        return path;
    }

    public void Draw() => App.LayoutAndDraw();

    public string Screen
    {
        get
        {
            Scheduler.Pump();
            Draw();
            return App.Driver!.ToString() ?? "";
        }
    }

    public void Press(params Key[] keys)
    {
        foreach (var key in keys)
        {
            App.InjectKey(key);
            Scheduler.Pump();
        }
        Draw();
    }

    public void Type(string text)
    {
        foreach (char c in text) App.InjectKey(new Key(c));
        Draw();
    }

    /// <summary>Selects all text in the focused field and replaces it by typing.</summary>
    public void Replace(string text)
    {
        Press(Key.End);
        for (int i = 0; i < 200; i++) App.InjectKey(Key.Backspace);
        Type(text);
    }

    public void WaitFor(Func<bool> condition, string what, int timeoutMs = 30000)
    {
        var clock = Stopwatch.StartNew();
        while (clock.ElapsedMilliseconds < timeoutMs)
        {
            Scheduler.Pump();
            if (condition()) { Draw(); return; }
            Thread.Sleep(20);
        }
        throw new TimeoutException($"timed out waiting for {what}; screen:\n{Screen}");
    }

    public void WaitForScreen(string text, int timeoutMs = 30000) => WaitFor(() => { Draw(); return App.Driver!.ToString()!.Contains(text); }, $"'{text}' on screen", timeoutMs);

    public void WaitIdle() => WaitFor(() => !Window.IsComputing, "computation to finish");

    public void Dispose()
    {
        Window.Dispose();
        App.Dispose();
        if (_folder is not null) try { Directory.Delete(_folder, recursive: true); } catch (IOException) { }
    }
}
