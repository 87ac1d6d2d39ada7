using System.Globalization;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads typed fields from one table, reporting each problem at the value's line and column with the field's
/// full path (e.g. "elements.qa.ec"). Keys not in the allowed list are reported with the nearest valid key.
/// </summary>
public sealed class TableReader
{
    private readonly SourceTable _table;
    private readonly ErrorList _errors;

    public TableReader(SourceTable table, string path, ErrorList errors, IReadOnlyCollection<string> allowedKeys)
    {
        _table = table;
        Path = path;
        _errors = errors;
        foreach (var group in table.Entries.GroupBy(e => e.Key).Where(g => g.Count() > 1))
        {
            var first = group.First();
            foreach (var again in group.Skip(1))
                errors.At(again, Field(again.Key), $"key '{again.Key}' is given twice (first at line {first.Line})");
        }
        foreach (var entry in table.Entries)
            if (!allowedKeys.Contains(entry.Key))
                errors.At(entry, Field(entry.Key),
                    $"unknown key '{entry.Key}'{EditDistance.Suggestion(entry.Key, allowedKeys)} (allowed here: {string.Join(", ", allowedKeys)})");
    }

    public string Path { get; }
    public SourceTable Table => _table;
    public ErrorList Errors => _errors;

    public string Field(string key) => Path.Length == 0 ? key : $"{Path}.{key}";

    public bool Has(string key) => _table.Find(key) is not null;

    public SourceEntry? Entry(string key) => _table.Find(key);

    public void Error(string key, string message)
    {
        if (_table.Find(key) is SourceEntry e) _errors.At(e.Value, Field(key), message);
        else _errors.At(_table, Field(key), message);
    }

    public void Missing(string key, string what) =>
        _errors.At(_table, Field(key), $"missing required value '{key}' ({what}) in [{_table.Name}]");

    /// <summary>A quantity of the given kind in its base unit (GHz for frequency); numbers without units only where the kind allows them.</summary>
    public double? Quantity(string key, UnitKind kind, bool required = false, string? what = null)
    {
        var entry = _table.Find(key);
        if (entry is null)
        {
            if (required) Missing(key, what ?? kind.WithArticle());
            return null;
        }
        return QuantityOf(entry.Value, Field(key), kind);
    }

    /// <summary>Reads one value (a string with a unit or a plain number) as a quantity; null after reporting an error.</summary>
    public double? QuantityOf(SourceValue value, string field, UnitKind kind)
    {
        string? text = value.Kind switch
        {
            SourceValueKind.String => value.Text,
            SourceValueKind.Integer or SourceValueKind.Float => value.Number.ToString("R", CultureInfo.InvariantCulture),
            _ => null,
        };
        if (text is null)
        {
            _errors.At(value, field, $"expected {kind.WithArticle()} such as {kind.ExampleText()}, found {value.Describe()}");
            return null;
        }
        if (!QuantityParser.TryParseModelValue(text, kind, out double result, out string error))
        {
            _errors.At(value, field, error);
            return null;
        }
        return result;
    }

    /// <summary>A quantity that must satisfy <paramref name="valid"/>; <paramref name="rule"/> says what is expected.</summary>
    public double? Checked(string key, UnitKind kind, Func<double, bool> valid, string rule, bool required = false, string? what = null)
    {
        double? v = Quantity(key, kind, required, what);
        if (v is double x && !valid(x))
        {
            Error(key, $"{Display(key, x, kind)} is out of range: {rule}");
            return null;
        }
        return v;
    }

    public int? Integer(string key, int min, int max, bool required = false, string? what = null)
    {
        var entry = _table.Find(key);
        if (entry is null)
        {
            if (required) Missing(key, what ?? "a whole number");
            return null;
        }
        var v = entry.Value;
        if (v.Kind != SourceValueKind.Integer)
        {
            _errors.At(v, Field(key), $"expected a whole number (e.g. {min}), found {v.Describe()}");
            return null;
        }
        if (v.Number < min || v.Number > max)
        {
            _errors.At(v, Field(key), $"{v.Number} is out of range: expected {min} ≤ {key} ≤ {max}");
            return null;
        }
        return (int)v.Number;
    }

    public bool? Boolean(string key)
    {
        var entry = _table.Find(key);
        if (entry is null) return null;
        if (entry.Value.Kind != SourceValueKind.Boolean)
        {
            _errors.At(entry.Value, Field(key), $"expected true or false, found {entry.Value.Describe()}");
            return null;
        }
        return entry.Value.Boolean;
    }

    public string? Text(string key, bool required = false, string? what = null)
    {
        var entry = _table.Find(key);
        if (entry is null)
        {
            if (required) Missing(key, what ?? "a text in quotes");
            return null;
        }
        if (entry.Value.Kind != SourceValueKind.String)
        {
            _errors.At(entry.Value, Field(key), $"expected a text in quotes, found {entry.Value.Describe()}");
            return null;
        }
        if (entry.Value.Text is string t && t.Any(TerminalText.Unsafe))
        {
            // they would reach terminals (names and kinds are printed) as escape sequences
            _errors.At(entry.Value, Field(key), $"control characters are not allowed in a text value (found in \"{TerminalText.Clean(t)}\")");
            return null;
        }
        return entry.Value.Text;
    }

    /// <summary>One of a fixed set of words; a misspelling gets the nearest word suggested.</summary>
    public string? Choice(string key, IReadOnlyCollection<string> choices, bool required = false)
    {
        string? text = Text(key, required, "one of: " + string.Join(", ", choices));
        if (text is null) return null;
        if (!choices.Contains(text))
        {
            Error(key, $"unknown {key} '{text}'{EditDistance.Suggestion(text, choices)} (expected one of: {string.Join(", ", choices)})");
            return null;
        }
        return text;
    }

    /// <summary>An array of exactly <paramref name="count"/> texts (count 0: any length).</summary>
    public IReadOnlyList<(string Text, SourceValue Value)>? TextArray(string key, int count, bool required = false, string? what = null)
    {
        var entry = _table.Find(key);
        if (entry is null)
        {
            if (required) Missing(key, what ?? "an array of texts");
            return null;
        }
        var v = entry.Value;
        if (v.Kind != SourceValueKind.Array || v.Items.Any(i => i.Kind != SourceValueKind.String) || (count > 0 && v.Items.Count != count))
        {
            string shape = count > 0 ? $"an array of {count} texts, e.g. [{string.Join(", ", Enumerable.Range(0, count).Select(i => $"\"{(char)('a' + i)}\""))}]" : "an array of texts";
            _errors.At(v, Field(key), $"expected {shape}, found {(v.Kind == SourceValueKind.Array ? $"an array of {v.Items.Count} value(s)" : v.Describe())}");
            return null;
        }
        return v.Items.Select(i => (i.Text!, i)).ToList();
    }

    /// <summary>A list of quantities, e.g. energies = ["0 GHz", "4.9 GHz"].</summary>
    public double[]? QuantityArray(string key, UnitKind kind, bool required = false)
    {
        var entry = _table.Find(key);
        if (entry is null)
        {
            if (required) Missing(key, $"an array of values ({kind.HumanName()})");
            return null;
        }
        var v = entry.Value;
        if (v.Kind != SourceValueKind.Array)
        {
            _errors.At(v, Field(key), $"expected an array such as [{kind.ExampleText()}], found {v.Describe()}");
            return null;
        }
        var result = new double[v.Items.Count];
        bool ok = true;
        for (int i = 0; i < result.Length; i++)
        {
            if (QuantityOf(v.Items[i], $"{Field(key)}[{i}]", kind) is double x) result[i] = x;
            else ok = false;
        }
        return ok ? result : null;
    }

    /// <summary>A square matrix written as an array of rows of quantities.</summary>
    public double[,]? Matrix(string key, UnitKind kind, bool required = false, int? size = null) =>
        _table.Find(key) is SourceEntry e ? MatrixOf(e.Value, Field(key), kind, size) : RequiredMissing(key, required);

    private double[,]? RequiredMissing(string key, bool required)
    {
        if (required) Missing(key, "a square matrix written as an array of rows");
        return null;
    }

    public double[,]? MatrixOf(SourceValue v, string field, UnitKind kind, int? size)
    {
        int n = v.Items.Count;
        if (v.Kind != SourceValueKind.Array || n == 0 || v.Items.Any(r => r.Kind != SourceValueKind.Array || r.Items.Count != n))
        {
            _errors.At(v, field, $"expected a square matrix written as an array of rows, e.g. [[1, 0], [0, 1]], found {v.Describe()} that is not square");
            return null;
        }
        if (size is int s && n != s)
        {
            _errors.At(v, field, $"expected a {s}×{s} matrix, found {n}×{n}");
            return null;
        }
        var m = new double[n, n];
        bool ok = true;
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                if (QuantityOf(v.Items[i].Items[j], $"{field}[{i}][{j}]", kind) is double x) m[i, j] = x;
                else ok = false;
        return ok ? m : null;
    }

    private static string Display(string key, double value, UnitKind kind) =>
        $"{key} = {QuantityFormatter.Format(value, kind)}";
}
