using LevelDesign.Core.DeviceFiles;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>Load, change one value, save, and compare line by line: only that value may change.</summary>
public sealed class RoundTripTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("leveldesign-roundtrip-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Copy(string device)
    {
        string path = Path.Combine(_dir, device);
        File.Copy(Path.Combine(RepositoryPaths.Devices, device), path);
        return path;
    }

    [Fact]
    public void ChangingOneValueChangesOnlyThatValueAndKeepsCommentsAndWritesBackup()
    {
        string path = Copy("pair.toml");
        string original = File.ReadAllText(path);
        var document = DeviceDocument.Load(path).Document!;

        var edited = document.WithValue("elements.qa.ec", "210 MHz", out var error);
        Assert.Null(error);
        edited.Save();

        string saved = File.ReadAllText(path);
        var before = original.Split('\n');
        var after = saved.Split('\n');
        Assert.Equal(before.Length, after.Length);
        var changed = Enumerable.Range(0, before.Length).Where(i => before[i] != after[i]).ToList();
        int line = Assert.Single(changed);
        Assert.Equal(before[line].Replace("\"215 MHz\"", "\"210 MHz\""), after[line]);
        Assert.Contains("# α ≈ −E_C", after[line]); // the inline comment on the edited line survives
        Assert.Equal(original, File.ReadAllText(path + ".bak"));
        Assert.Equal(0.210, DeviceDocument.Load(path).Document!.Device.GetParameter("qa.ec"), 12);
        Assert.Empty(Directory.GetFiles(_dir, "*.tmp"));
    }

    [Fact]
    public void UnchangedDocumentWritesTheSameBytes()
    {
        string path = Copy("capmatrix.toml");
        byte[] original = File.ReadAllBytes(path);
        DeviceDocument.Load(path).Document!.Save();
        Assert.Equal(original, File.ReadAllBytes(path));
    }

    [Fact]
    public void NumberReplacedByQuantityAndMissingKeyAdded()
    {
        var document = DeviceDocument.Load(Copy("single.toml")).Document!;
        var edited = document.WithValue("elements.q.flux", "0.25", out var error);
        Assert.Null(error);
        // Only the value's characters change; the spacing and the comment after it stay.
        Assert.Contains("flux = 0.25                 # a little off the sweet spot\n", edited.ToText());
        Assert.Equal(document.ToText().Replace("flux = 0.1 ", "flux = 0.25 "), edited.ToText());
        // The bias q_flux sets the flux (docs/device-format.md: a bias overrides the element's own value).
        Assert.Equal(0.1, edited.Device.GetParameter("q.flux"), 12);
        var biased = edited.WithValue("biases.q_flux.value", "0.25", out error);
        Assert.Null(error);
        Assert.Equal(0.25, biased.Device.GetParameter("q.flux"), 12);

        var withNg = edited.WithValue("elements.q.ng", "0.5", out error);
        Assert.Null(error);
        Assert.Equal(0.5, withNg.Device.GetParameter("q.ng"), 12);
        Assert.Equal(edited.ToText().Split('\n').Length + 1, withNg.ToText().Split('\n').Length);
    }

    [Theory]
    [InlineData("elements.qa.ec", "92 fF", "capacitance")]       // wrong kind of unit
    [InlineData("elements.ra.frequency", "-7 GHz", "out of range")]
    [InlineData("elements.qa.levels", "1", "out of range")]
    [InlineData("elements.qa.ej_sum", "nan", "finite")]
    [InlineData("couplers.qa_ra.g", "90 MHz extra", "unknown unit")]
    [InlineData("elements.qa.ejsum", "20 GHz", "did you mean 'ej_sum'")]
    [InlineData("nothing.here.x", "1", "no table")]
    public void InvalidEditIsRefusedWithAClearMessage(string field, string text, string fragment)
    {
        var document = DeviceDocument.Demo();
        var same = document.WithValue(field, text, out var error);
        Assert.NotNull(error);
        Assert.Contains(fragment, error!.Message);
        Assert.Same(document, same);
    }
}
