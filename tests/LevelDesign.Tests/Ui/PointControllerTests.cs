using LevelDesign.Ui.Controllers;
using LevelDesign.Ui.Session;

namespace LevelDesign.Tests.Ui;

/// <summary>The point controller without a screen: which document changes compute the device again.</summary>
public sealed class PointControllerTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("ld-point-").FullName;
    private readonly ManualScheduler _scheduler = new();
    private readonly EditSession _session = new();
    private readonly PointController _point;

    public PointControllerTests()
    {
        _session.OpenFile(UiHarness.CopyDevice("single.toml", _folder));
        _point = new PointController(_scheduler);
    }

    public void Dispose()
    {
        _point.Stop();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void Only_a_change_of_the_model_computes_the_device_again()
    {
        Assert.True(_point.Follow(_session.Document!, out _));
        Assert.True(_point.IsComputing);
        _scheduler.PumpUntil(() => !_point.IsComputing, "the first computation");
        var first = _point.Snapshot!;

        Assert.False(_point.Follow(_session.Document!, out _));   // the same document
        Assert.True(_session.AddPoint("p1", [("q_flux", "0.2")]).Accepted);
        Assert.False(_point.Follow(_session.Document!, out var before));   // an operating point leaves the device
        Assert.NotSame(_session.Document, before);
        Assert.True(_session.Save().Accepted);
        Assert.False(_point.Follow(_session.Document!, out _));   // a save changes only the unsaved mark
        Assert.False(_point.IsComputing);
        Assert.Same(first, _point.Snapshot);

        Assert.True(_session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        Assert.True(_point.Follow(_session.Document!, out _));
        _scheduler.PumpUntil(() => !_point.IsComputing, "the second computation");
        Assert.Equal(7.0, _point.Snapshot!.Spectrum.Device.GetParameter("r.frequency"), 12);
    }
}
