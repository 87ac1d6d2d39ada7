using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A device file as loaded: the resolved <see cref="Device"/> plus biases, operating points and sweeps, and the
/// text it came from, so that edits can be written back keeping comments, key order and layout.
/// CONTRACT (implemented by the device-files work): see docs/device-format.md.
/// </summary>
public sealed class DeviceDocument
{
    /// <summary>Parses text; never throws for bad input — problems come back as errors with line and column.</summary>
    public static DeviceLoadResult Parse(string text, string path) => throw new NotImplementedException();

    /// <summary>Reads and parses a file; a missing or unreadable file is an error, not an exception.</summary>
    public static DeviceLoadResult Load(string path) => throw new NotImplementedException();

    /// <summary>The built-in demo device (text of devices/pair.toml embedded in the assembly).</summary>
    public static DeviceDocument Demo() => throw new NotImplementedException();

    public string Path { get; init; } = "";

    /// <summary>The device with every bias at its value in the file.</summary>
    public Device Device { get; init; } = null!;

    public IReadOnlyList<BiasDefinition> Biases { get; init; } = [];
    public IReadOnlyList<OperatingPoint> Points { get; init; } = [];
    public IReadOnlyList<SweepDefinition> Sweeps { get; init; } = [];

    /// <summary>The device with the named biases (control values) or parameter paths ("qa.flux") set.</summary>
    public Device At(IReadOnlyDictionary<string, double> values) => throw new NotImplementedException();

    /// <summary>
    /// Changes one value by its field path (e.g. "elements.qa.ec", "couplers.g_qa_ra.g", "biases.qa_flux.value")
    /// to the text a user typed ("210 MHz"); on success returns a new document (this one is unchanged).
    /// </summary>
    public DeviceDocument WithValue(string fieldPath, string text, out DeviceFileError? error) => throw new NotImplementedException();

    /// <summary>The file text, with comments and layout of the original and only edited values changed.</summary>
    public string ToText() => throw new NotImplementedException();

    /// <summary>Writes atomically (temporary file, flush, rename), keeping the previous file as PATH.bak.</summary>
    public void Save(string? path = null) => throw new NotImplementedException();
}
