using System.Diagnostics;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Views;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Drives the real main window headlessly: ANSI driver, fixed screen size, injected keys, and assertions on
/// the driver's text. Background results arrive through <see cref="ManualScheduler"/>, pumped by <see cref="WaitFor"/>.
/// </summary>
public sealed class UiHarness : IDisposable
{
    public IApplication App { get; }
    public ManualScheduler Scheduler { get; } = new();
    public EditSession Session { get; }
    public MainWindow Window { get; }

    public UiHarness(int width = 80, int height = 24, Action<EditSession>? open = null, ITargetSolver? targets = null)
    {
        App = Application.Create();
        App.Init(DriverRegistry.Names.ANSI);
        App.Driver!.SetScreenSize(width, height);
        Session = new EditSession(new EditLogDocumentStore());
        if (open is null) Session.OpenDemo(); else open(Session);
        Window = new MainWindow(Session, Scheduler, new SweepService(), targets);
        App.Begin(Window);
        Draw();
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
        for (int i = 0; i < 40; i++) App.InjectKey(Key.Backspace);
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
    }
}
