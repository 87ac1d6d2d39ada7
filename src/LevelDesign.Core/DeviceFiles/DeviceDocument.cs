using System.Reflection;
using System.Text;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Files;
using LevelDesign.Core.Model;
using Tomlyn.Parsing;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A device file as loaded: the resolved <see cref="Device"/> plus biases, operating points and sweeps, and the
/// text it came from, so that edits can be written back keeping comments, key order and layout.
/// Edits replace only the characters of the edited value in the original text and re-read the whole file, so
/// a new value is checked exactly as loading would check it. See docs/device-format.md.
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

    public BiasDefinition? Bias(string name) => Biases.FirstOrDefault(b => b.Name == name);

    /// <summary>
    /// The device with the named biases (control values) or parameter paths ("qa.flux") set, on top of
    /// <paramref name="from"/> (default: the file's device; a spread study passes a drawn chip).
    /// </summary>
    public Device At(IReadOnlyDictionary<string, double> values, Device? from = null)
    {
        var device = from ?? Device;
        foreach (var (key, value) in values)
        {
            if (Bias(key) is BiasDefinition bias) device = device.WithParameter(bias.Target, bias.ToParameter(value));
            else if (key.Contains('.')) device = device.WithParameter(key, value);
            else throw new ArgumentException($"no bias '{key}'{EditDistance.Suggestion(key, Biases.Select(b => b.Name))}; give a bias name or a parameter path such as qa.flux");
        }
        return device;
    }

    /// <summary>
    /// The device at one point of a sweep: each axis's target set to its value and each linked path to
    /// Scale·value + Shift, on top of <paramref name="start"/> (default: the device at the file's bias values).
    /// </summary>
    public Device Resolve(IReadOnlyList<SweepAxis> axes, IReadOnlyList<double> values, IReadOnlyDictionary<string, double>? start = null,
        Device? from = null)
        => At(Core.Sweeps.ParameterResolver.Settings(axes, values, start), from);

    /// <summary>The device at a named operating point.</summary>
    public Device AtPoint(string name)
    {
        var point = Points.FirstOrDefault(p => p.Name == name)
                    ?? throw new ArgumentException($"no operating point '{name}'{EditDistance.Suggestion(name, Points.Select(p => p.Name))}");
        return At(point.BiasValues);
    }

    /// <summary>The value text of a field as written in the file (without quotes for strings), or null if absent.</summary>
    public string? ValueTextOf(string fieldPath)
    {
        if (Locate(fieldPath) is not var (table, key) || table.Find(key) is not SourceEntry e) return null;
        return e.Value.Kind == SourceValueKind.String ? e.Value.Text : Text.Substring(e.Value.Offset, e.Value.Length);
    }

    /// <summary>
    /// Changes one value by its field path (e.g. "elements.qa.ec", "couplers.g_qa_ra.g", "biases.qa_flux.value")
    /// to the text a user typed ("210 MHz"); on success returns a new document (this one is unchanged).
    /// A key missing from an existing table is added on a new line at the end of that table.
    /// </summary>
    public DeviceDocument WithValue(string fieldPath, string text, out DeviceFileError? error)
    {
        error = null;
        if (Locate(fieldPath) is not var (table, key))
        {
            var tables = _source.Tables.Select(t => t.Name);
            error = new DeviceFileError(Path, 0, 0, fieldPath,
                $"no table in this file holds '{fieldPath}'{EditDistance.Suggestion(fieldPath, tables)}; field paths look like elements.qa.ec");
            return this;
        }
        string newText;
        if (table.Find(key) is SourceEntry entry)
        {
            string literal = Literal(text, entry.Value.Kind == SourceValueKind.String);
            newText = Text[..entry.Value.Offset] + literal + Text[(entry.Value.Offset + entry.Value.Length)..];
        }
        else
        {
            if (table.Column == 0) { error = new DeviceFileError(Path, table.Line, 1, fieldPath, "only values in tables can be added"); return this; }
            string newline = Text.Contains("\r\n") ? "\r\n" : "\n";
            int at = Math.Min(table.InsertOffset, Text.Length);
            string line = $"{QuoteKeyIfNeeded(key)} = {Literal(text, false)}{newline}";
            if (at > 0 && Text[at - 1] != '\n') line = newline + line;
            newText = Text[..at] + line + Text[at..];
        }
        var result = Parse(newText, Path, _options);
        if (result.Document is null)
        {
            var errors = result.Errors;
            error = errors.FirstOrDefault(e => e.Field == fieldPath) ?? errors.FirstOrDefault(e => e.Field.StartsWith(fieldPath)) ?? errors[0];
            return this;
        }
        return result.Document;
    }

    /// <summary>The file text, with comments and layout of the original and only edited values changed.</summary>
    public string ToText() => Text;

    /// <summary>Writes atomically (temporary file, flush, rename), keeping the previous file as PATH.bak (see <see cref="AtomicFile"/>).</summary>
    public void Save(string? path = null) => AtomicFile.Write(path ?? Path, Text);

    private (SourceTable Table, string Key)? Locate(string fieldPath)
    {
        SourceTable? best = null;
        foreach (var t in _source.Tables)
            if (fieldPath.StartsWith(t.Name + ".", StringComparison.Ordinal) && (best is null || t.Name.Length > best.Name.Length))
                best = t;
        if (best is null) return null;
        string key = fieldPath[(best.Name.Length + 1)..];
        return (best, key);
    }

    /// <summary>
    /// The TOML text for a typed value: quoted when replacing a text, or when the typed text is not a TOML
    /// value by itself ("210 MHz"); a number, boolean or array typed as such is written as it is.
    /// </summary>
    private static string Literal(string typed, bool replacingText)
    {
        string t = typed.Trim();
        if (!replacingText && t.Length > 0)
        {
            var probe = SyntaxParser.Parse("x = " + t + "\n", "value");
            if (!probe.HasErrors && probe.KeyValues.ChildrenCount == 1 && probe.Tables.ChildrenCount == 0) return t;
        }
        return Quote(t);
    }

    private static string Quote(string s)
    {
        var b = new StringBuilder("\"");
        foreach (char c in s)
            b.Append(c switch { '"' => "\\\"", '\\' => "\\\\", '\n' => "\\n", '\t' => "\\t", '\r' => "\\r", _ => c.ToString() });
        return b.Append('"').ToString();
    }

    private static string QuoteKeyIfNeeded(string key) =>
        key.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-') ? key : Quote(key);
}
