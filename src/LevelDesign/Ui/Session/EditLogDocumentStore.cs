using System.Globalization;
using System.Runtime.CompilerServices;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Ui.Session;

/// <summary>
/// DEVELOPMENT FALLBACK, used only while the DeviceDocument contract is not implemented (it throws
/// NotImplementedException) and by the UI tests. It holds the invented demo device built in code and
/// records every edit in a plain edit log ("set elements.qa.ec = 210 MHz", "rename qa qx", ...), which is
/// its text form: saving writes the log, loading replays it on the demo. It does not read device files.
/// </summary>
public sealed class EditLogDocumentStore : IDocumentStore
{
    public const string Header = "# leveldesign development edit log (replayed on the demo device)";
    private readonly ConditionalWeakTable<DeviceDocument, List<string>> _logs = new();

    public DeviceLoadResult Load(string path)
    {
        if (!File.Exists(path)) return new DeviceLoadResult(null, [new DeviceFileError(path, 0, 0, "", "no such file")]);
        return Parse(File.ReadAllText(path), path);
    }

    public DeviceLoadResult Parse(string text, string path)
    {
        var document = Demo(path);
        var errors = new List<DeviceFileError>();
        var lines = text.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            string line = lines[i].Trim();
            if (line.Length == 0 || line.StartsWith('#')) continue;
            var next = Replay(document, line, out string? error);
            if (next is null)
            {
                string field = line.StartsWith("set ") ? line[4..].Split('=')[0].Trim() : line.Split(' ')[0];
                errors.Add(new DeviceFileError(path, i + 1, 1, field, error ?? "not understood"));
                continue;
            }
            document = next;
        }
        return errors.Count == 0 ? new DeviceLoadResult(document, []) : new DeviceLoadResult(null, errors);
    }

    private DeviceDocument? Replay(DeviceDocument d, string line, out string? error)
    {
        var w = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        error = null;
        switch (w[0])
        {
            case "set" when line.Contains('='):
                int eq = line.IndexOf('=');
                return WithValue(d, line[4..eq].Trim(), line[(eq + 1)..].Trim(), out error);
            case "add-element" when w.Length == 3: return AddElement(d, w[1], w[2], out error);
            case "add-coupler" when w.Length >= 6: return AddCoupler(d, w[1], w[2], w[3], w[4], string.Join(' ', w[5..]), out error);
            case "remove" when w.Length == 2: return Remove(d, w[1], out error);
            case "rename" when w.Length == 3: return Rename(d, w[1], w[2], out error);
            default:
                error = "expected set PATH = VALUE, add-element, add-coupler, remove or rename";
                return null;
        }
    }

    public DeviceDocument Demo() => Demo("");

    private DeviceDocument Demo(string path)
    {
        // Invented two-qubit device: two tunable transmons, each with a readout resonator, coupled capacitively.
        var elements = new Element[]
        {
            new TunableTransmon("qa", Ec: 0.22, EjSum: 24.0, Asymmetry: 0.3, Flux: 0.0),
            new TunableTransmon("qb", Ec: 0.21, EjSum: 20.0, Asymmetry: 0.25, Flux: 0.0),
            new Resonator("ra", Frequency: 6.9, Kappa: 0.0008),
        };
        var couplers = new[]
        {
            Coupler.Create("g_qa_ra", CouplerKind.Capacitive, "qa", "ra", new CouplingStrength.TargetG(0.09)),
            Coupler.Create("g_qb_ra", CouplerKind.Capacitive, "qb", "ra", new CouplingStrength.TargetG(0.08)),
        };
        var truncation = new Truncation { DefaultLevels = 5, MaxExcitations = 4 };
        var device = new Device("pair", elements, couplers, truncation);
        var document = new DeviceDocument
        {
            Path = path,
            Device = device,
            Biases = [new BiasDefinition("qa_flux", "qa.flux", 0.0), new BiasDefinition("qb_flux", "qb.flux", 0.0)],
        };
        _logs.AddOrUpdate(document, []);
        return document;
    }

    public string ToText(DeviceDocument document) =>
        Header + "\n" + string.Concat(Log(document).Select(l => l + "\n"));

    public void Save(DeviceDocument document, string path)
    {
        string temporary = path + ".tmp";
        File.WriteAllText(temporary, ToText(document));
        if (File.Exists(path)) File.Copy(path, path + ".bak", overwrite: true);
        File.Move(temporary, path, overwrite: true);
    }

    public Device At(DeviceDocument document, IReadOnlyDictionary<string, double> values)
    {
        var device = document.Device;
        foreach (var (name, value) in values)
        {
            var bias = document.Biases.FirstOrDefault(b => b.Name == name);
            device = bias is null ? device.WithParameter(name, value) : device.WithParameter(bias.Target, bias.ToParameter(value));
        }
        return device;
    }

    public DeviceDocument? WithValue(DeviceDocument document, string fieldPath, string text, out string? error)
    {
        var parts = fieldPath.Split('.');
        if (parts.Length != 3) { error = $"'{fieldPath}' is not a field path like elements.qa.ec"; return null; }
        var (section, owner, name) = (parts[0], parts[1], parts[2]);
        var unit = FieldUnits.Of(name);
        if (!QuantityParser.TryParse(text, unit, out double value, out string parseError)) { error = parseError; return null; }
        var device = document.Device;
        var biases = document.Biases.ToList();
        try
        {
            switch (section)
            {
                case "elements" or "couplers":
                    device = device.WithParameter($"{owner}.{name}", value);
                    break;
                case "biases":
                    int i = biases.FindIndex(b => b.Name == owner);
                    if (i < 0) { error = $"no bias named '{owner}'"; return null; }
                    biases[i] = name switch
                    {
                        "value" => biases[i] with { Value = value },
                        "period" when value != 0 => biases[i] with { Period = value },
                        "offset" => biases[i] with { Offset = value },
                        _ => throw new ArgumentException(name == "period" ? "period must not be zero" : $"a bias has no field '{name}'"),
                    };
                    device = device.WithParameter(biases[i].Target, biases[i].ToParameter(biases[i].Value));
                    break;
                default:
                    error = $"unknown section '{section}'";
                    return null;
            }
        }
        catch (ArgumentException e) { error = e.Message; return null; }
        return Next(document, device, biases, $"set {fieldPath} = {text}", out error);
    }

    public DeviceDocument? AddElement(DeviceDocument document, string kindKey, string id, out string? error)
    {
        if (!ValidId(document, id, out error)) return null;
        Element? element = kindKey switch
        {
            "transmon" => new Transmon(id, 0.2, 18.0),
            "tunable_transmon" => new TunableTransmon(id, 0.2, 20.0, 0.2, 0.0),
            "fluxonium" => new Fluxonium(id, 1.0, 4.0, 0.9, 0.5),
            "kerr" => new KerrOscillator(id, 5.0, -0.2),
            "resonator" => new Resonator(id, 7.0),
            _ => null,
        };
        if (element is null) { error = $"unknown element kind '{kindKey}'"; return null; }
        var device = document.Device with { Elements = [.. document.Device.Elements, element] };
        return Next(document, device, document.Biases, $"add-element {kindKey} {id}", out error);
    }

    public DeviceDocument? AddCoupler(DeviceDocument document, string kindKey, string id, string elementA, string elementB, string strengthText, out string? error)
    {
        if (!ValidId(document, id, out error)) return null;
        if (!Enum.TryParse<CouplerKind>(kindKey, ignoreCase: true, out var kind)) { error = $"unknown coupler kind '{kindKey}'"; return null; }
        if (!QuantityParser.TryParse(strengthText, UnitKind.Frequency, out double g, out string parseError)) { error = parseError; return null; }
        var coupler = Coupler.Create(id, kind, elementA, elementB, new CouplingStrength.TargetG(g));
        var device = document.Device with { Couplers = [.. document.Device.Couplers, coupler] };
        return Next(document, device, document.Biases, $"add-coupler {kindKey} {id} {elementA} {elementB} {strengthText}", out error);
    }

    public DeviceDocument? Remove(DeviceDocument document, string id, out string? error)
    {
        var d = document.Device;
        bool isElement = d.IndexOf(id) >= 0;
        if (!isElement && d.Couplers.All(c => c.Id != id)) { error = $"no element or coupler named '{id}'"; return null; }
        var device = d with
        {
            Elements = d.Elements.Where(e => e.Id != id).ToArray(),
            Couplers = d.Couplers.Where(c => c.Id != id && c.ElementA != id && c.ElementB != id).ToArray(),
        };
        var biases = document.Biases.Where(b => !b.Target.StartsWith(id + ".", StringComparison.Ordinal)).ToList();
        return Next(document, device, biases, $"remove {id}", out error);
    }

    public DeviceDocument? Rename(DeviceDocument document, string oldId, string newId, out string? error)
    {
        if (!ValidId(document, newId, out error)) return null;
        var d = document.Device;
        Device device;
        var biases = document.Biases.ToList();
        if (d.IndexOf(oldId) >= 0)
        {
            var levels = d.Truncation.Levels.ToDictionary(kv => kv.Key == oldId ? newId : kv.Key, kv => kv.Value);
            device = d with
            {
                Elements = d.Elements.Select(e => e.Id == oldId ? e with { Id = newId } : e).ToArray(),
                Couplers = d.Couplers.Select(c => c with
                {
                    ElementA = c.ElementA == oldId ? newId : c.ElementA,
                    ElementB = c.ElementB == oldId ? newId : c.ElementB,
                }).ToArray(),
                Truncation = d.Truncation with { Levels = levels },
            };
            biases = biases.Select(b => b.Target.StartsWith(oldId + ".", StringComparison.Ordinal) ? b with { Target = newId + b.Target[oldId.Length..] } : b).ToList();
        }
        else if (d.Couplers.Any(c => c.Id == oldId))
            device = d with { Couplers = d.Couplers.Select(c => c.Id == oldId ? c with { Id = newId } : c).ToArray() };
        else { error = $"no element or coupler named '{oldId}'"; return null; }
        return Next(document, device, biases, $"rename {oldId} {newId}", out error);
    }

    private static bool ValidId(DeviceDocument document, string id, out string? error)
    {
        error = null;
        if (id.Length == 0 || !id.All(c => char.IsAsciiLetterOrDigit(c) || c == '_') || !char.IsAsciiLetter(id[0]))
            error = $"'{id}' is not an id: use letters, digits and _ starting with a letter";
        else if (document.Device.IndexOf(id) >= 0 || document.Device.Couplers.Any(c => c.Id == id))
            error = $"'{id}' is already used";
        return error is null;
    }

    private DeviceDocument? Next(DeviceDocument document, Device device, IReadOnlyList<BiasDefinition> biases, string logLine, out string? error)
    {
        var problems = device.Validate();
        if (problems.Count > 0) { error = string.Join("; ", problems); return null; }
        error = null;
        var next = new DeviceDocument { Path = document.Path, Device = device, Biases = biases, Points = document.Points, Sweeps = document.Sweeps };
        _logs.AddOrUpdate(next, [.. Log(document), logLine]);
        return next;
    }

    private List<string> Log(DeviceDocument document) => _logs.TryGetValue(document, out var log) ? log : [];
}
