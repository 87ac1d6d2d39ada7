using System.Text;
using System.Text.RegularExpressions;

namespace LevelDesign.Tests.Support;

/// <summary>
/// Seeded mutations of device files for the fuzz tests. Our own mutator rather than FsCheck or SharpFuzz: the useful
/// inputs are TOML-shaped (extreme numbers in value positions, control characters in strings, repeated or swapped
/// tables, truncated text), which a generic generator would have to be taught anyway, and SharpFuzz needs an
/// instrumented build driven by an external AFL/libFuzzer process, which does not run inside `dotnet test`.
/// The same seed always gives the same inputs, so a failure is reproduced from its seed and index.
/// </summary>
public sealed class DeviceFileMutator(IReadOnlyList<string> seeds, int seed)
{
    private readonly Random _random = new(seed);

    private static readonly string[] Extremes =
    [
        "1.797e308", "-1.797e308", "1e308", "-1e308", "4.9e-324", "0", "-0", "1e15", "1e16", "nan", "inf", "-inf",
        "4001", "1000000000", "65536", "46341", "2147483648", "-1", "\"1e308 GHz\"", "\"1.797e308 MHz\"", "\"-0 fF\"",
        "\"1e-300 nH\"", "\"\\u001b[2J\"", "\"\\u202e\"", "[]", "[[]]", "{}", "true", "\"\"",
    ];

    private static readonly string[] Headers =
    [
        "[device]", "[truncation]", "[capacitance_matrix]", "[elements.x]", "[elements.qa]", "[elements.qa.operators]",
        "[couplers.c]", "[biases.b]", "[points.p]", "[sweeps.s]", "[[elements]]", "[elements.\"\\u001b\"]",
    ];

    private static readonly string[] Lines =
    [
        "kind = \"fluxonium\"", "kind = \"level_list\"", "basis_size = 4001", "levels = 1000", "count = 1000000",
        "second = { vary = \"qa.flux\", from = 0, to = 1, count = 1000000 }", "energies = [0, 1e308, -1e308]",
        "hamiltonian = [[1, 2], [2, 1e308]]", "between = [\"qa\", \"qa\"]", "max_excitations = 0", "allow_large = true",
        "name = \"\\u001b[31mred\"", "ej = 1.797e308", "flux = 1e308", "links = [{ path = \"qb.flux\", scale = 1e308 }]",
    ];

    public string Next()
    {
        string text = seeds[_random.Next(seeds.Count)];
        // half the inputs change values only, so many still load and reach the range checks and the solver
        bool valuesOnly = _random.Next(2) == 0;
        int mutations = 1 + _random.Next(valuesOnly ? 2 : 4);
        for (int i = 0; i < mutations; i++) text = valuesOnly ? ReplaceValue(text) : Mutate(text);
        return text;
    }

    private string Mutate(string text)
    {
        if (text.Length == 0) return Headers[_random.Next(Headers.Length)];
        int at = _random.Next(text.Length);
        switch (_random.Next(10))
        {
            case 0:
                return ReplaceValue(text);
            case 1:
                return text.Remove(at, Math.Min(text.Length - at, 1 + _random.Next(40)));
            case 2:
            {
                var lines = text.Split('\n').ToList();
                int l = _random.Next(lines.Count);
                lines.Insert(l, lines[_random.Next(lines.Count)]);
                return string.Join('\n', lines);
            }
            case 3:
                return text.Insert(at, RandomChars(1 + _random.Next(8)));
            case 4:
            {
                var lines = text.Split('\n');
                int a = _random.Next(lines.Length), b = _random.Next(lines.Length);
                (lines[a], lines[b]) = (lines[b], lines[a]);
                return string.Join('\n', lines);
            }
            case 5:
                return text[..at];
            case 6:
                return text.Insert(LineStart(text, at), Headers[_random.Next(Headers.Length)] + "\n");
            case 7:
                return text.Insert(LineStart(text, at), Lines[_random.Next(Lines.Length)] + "\n");
            case 8:
            {
                string other = seeds[_random.Next(seeds.Count)];
                int from = _random.Next(other.Length);
                return text[..at] + other[from..Math.Min(other.Length, from + _random.Next(400))] + text[at..];
            }
            default:
            {
                var chars = text.ToCharArray();
                chars[at] = (char)(chars[at] ^ (1 << _random.Next(7)));
                return new string(chars);
            }
        }
    }

    /// <summary>A number or quoted value after '=' replaced by an extreme one (or, sometimes, by a scaled copy of itself).</summary>
    private string ReplaceValue(string text)
    {
        var values = Regex.Matches(text, "(?<==\\s*)(\"[^\"\\n]*\"|[-+0-9.eE]+)");
        if (values.Count == 0) return text + "\n" + Lines[_random.Next(Lines.Length)];
        var m = values[_random.Next(values.Count)];
        string replacement = _random.Next(2) == 0 && double.TryParse(m.Value, System.Globalization.CultureInfo.InvariantCulture, out double x)
            ? (x * Math.Pow(10, _random.Next(-3, 4)) * (0.5 + _random.NextDouble())).ToString("R", System.Globalization.CultureInfo.InvariantCulture)
            : Extremes[_random.Next(Extremes.Length)];
        return text[..m.Index] + replacement + text[(m.Index + m.Length)..];
    }

    private static int LineStart(string text, int at) => at == 0 ? 0 : text.LastIndexOf('\n', at - 1) + 1;

    private string RandomChars(int n)
    {
        const string alphabet = "=[]{}\"'#.,\n\t\r\\ abcxyz019-+eE\u001b\u0000\u007f\u0085\u202e\u00e9\u03a6";
        var s = new StringBuilder(n);
        for (int i = 0; i < n; i++) s.Append(alphabet[_random.Next(alphabet.Length)]);
        return s.ToString();
    }
}
