using System.Reflection;
using System.Text;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A device file as loaded: the resolved <see cref="Device"/> plus biases, operating points and sweeps, and the
/// text it came from, so that edits can be written back keeping comments, key order and layout.
/// Edits replace only the characters of the edited value in the original text and re-read the whole file, so
/// a new value is checked exactly as loading would check it. See docs/device-format.md.
/// This file reads; DeviceDocument.Editing.cs changes values, DeviceDocument.Structure.cs adds, removes and renames,
/// DeviceDocument.Resolving.cs gives the device at biases, sweep points and operating points.
/// </summary>
public sealed partial class DeviceDocument
{
    /// <summary>Name of the embedded copy of devices/pair.toml.</summary>
    public const string DemoResourceName = "LevelDesign.Core.DeviceFiles.pair.toml";

    /// <summary>Path reported for the built-in demo device.</summary>
    public const string DemoPath = "demo:pair.toml";

    private SourceDocument _source = null!;
    private DeviceLoadOptions _options = DeviceLoadOptions.Default;

    /// <summary>Parses text; never throws for bad input — problems come back as errors with line and column.</summary>
    public static DeviceLoadResult Parse(string text, string path) => Parse(text, path, DeviceLoadOptions.Default);

    public static DeviceLoadResult Parse(string text, string path, DeviceLoadOptions options)
    {
        var (content, errors) = DeviceReader.Read(text, path, options);
        if (content is null) return new DeviceLoadResult(null, errors);
        var document = new DeviceDocument
        {
            Path = path,
            Text = text,
            Device = content.Device,
            Biases = content.Biases,
            Points = content.Points,
            Sweeps = content.Sweeps,
            CompositeDimension = content.CompositeDimension,
            PurityThreshold = content.PurityThreshold,
            Coherence = content.Coherence,
            _source = content.Source,
            _options = options,
        };
        var spreadErrors = new ErrorList(path);
        document.Spread = Core.Spread.SpreadReader.Read(document, content.Source.Tables, spreadErrors);
        if (spreadErrors.Count > 0) return new DeviceLoadResult(null, spreadErrors.Items);
        return new DeviceLoadResult(document, errors);
    }

    /// <summary>Reads and parses a file; a missing or unreadable file is an error, not an exception.</summary>
    public static DeviceLoadResult Load(string path) => Load(path, DeviceLoadOptions.Default);

    public static DeviceLoadResult Load(string path, DeviceLoadOptions options)
    {
        string? text = DeviceFileText.Read(path, out var error);
        return text is null ? new DeviceLoadResult(null, [error!]) : Parse(text, path, options);
    }

    /// <summary>The built-in demo device (text of devices/pair.toml embedded in the assembly).</summary>
    public static DeviceDocument Demo()
    {
        var result = Parse(DemoText(), DemoPath);
        return result.Document ?? throw new InvalidOperationException("the embedded demo device is invalid: " + string.Join("; ", result.Errors));
    }

    /// <summary>The text of the embedded demo device.</summary>
    public static string DemoText()
    {
        using var stream = typeof(DeviceDocument).Assembly.GetManifestResourceStream(DemoResourceName)
                           ?? throw new InvalidOperationException($"resource {DemoResourceName} is missing from {Assembly.GetExecutingAssembly().GetName().Name}");
        using var reader = new StreamReader(stream, Encoding.UTF8);
        return reader.ReadToEnd();
    }

    public string Path { get; init; } = "";

    /// <summary>The text this document stands for (the original with any edits).</summary>
    public string Text { get; private init; } = "";

    /// <summary>The device with every bias at its value in the file.</summary>
    public Device Device { get; init; } = null!;

    public IReadOnlyList<BiasDefinition> Biases { get; init; } = [];
    public IReadOnlyList<OperatingPoint> Points { get; init; } = [];
    public IReadOnlyList<SweepDefinition> Sweeps { get; init; } = [];

    /// <summary>The fabrication-spread study of [spread] and [rules], or null when the file has none.</summary>
    public Core.Spread.SpreadDefinition? Spread { get; private set; }

    /// <summary>The noise and loss figures of the coherence budget from [coherence] (common-practice defaults where absent).</summary>
    public Analysis.CoherenceInputs Coherence { get; private init; } = new();

    /// <summary>Number of product states in the composite basis (computed before anything large is built).</summary>
    public long CompositeDimension { get; private init; }

    /// <summary>Below this purity a quantity's labels count as hybridized (the file's [device] purity_threshold, default 0.9).</summary>
    public double PurityThreshold { get; private init; } = Analysis.Conventions.DefaultPurityThreshold;
}
