using System.Globalization;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Composite;

/// <summary>
/// Which dressed states a single point computes. Each choice names the product states it needs; the solver then finds
/// the lowest eigenpairs up to the highest of them (every state below it is needed to find it) plus a margin of
/// <see cref="Margin"/>, so the choice sets the count. Choices: <c>auto</c>; <c>excitations:N</c> (every state with at
/// most N excitations); <c>below:E</c> (every state with bare energy up to E above the bare ground); <c>neighbours</c>
/// (each element's 1, each qubit's 2, both qubits of each coupled pair of neighbours); or a comma-separated list of
/// quantity names (<c>zz:q1:q2</c>, <c>chi2:q1:r1</c>, <c>q1.anharmonicity</c>, <c>q1.f01</c>) and groups
/// (<c>zz</c> for every neighbouring pair, <c>chi2</c> for every qubit with its own resonator).
/// </summary>
public sealed record StateSelection(string Text)
{
    /// <summary>States computed above the highest needed one: the top of the computed block mixes with states not computed.</summary>
    public const int Margin = 4;

    /// <summary>
    /// With <c>auto</c>, every state up to two excitations is computed while that is at most this many states (all
    /// pairs get ZZ and 2χ, as for the demo devices); above it, only <c>neighbours</c>. The iterative solver's cost
    /// grows with the square of the states asked for (orthogonalising the search space), so the whole two-excitation
    /// manifold of a 3×3 lattice (about 500 of 46,000 states) would take minutes where the neighbours take seconds.
    /// </summary>
    public const int AutoManifoldLimit = 200;

    public static readonly StateSelection Auto = new("auto");

    /// <summary>
    /// An element named by a quantity of this selection that the device does not have, as a message; null when every name
    /// is known. Commands check this before computing, so a wrong name is an input error, not a failed computation.
    /// </summary>
    public string? UnknownElement(Model.Device device)
    {
        if (Text is "auto" or "neighbours" || Text.StartsWith("excitations:", StringComparison.Ordinal) || Text.StartsWith("below:", StringComparison.Ordinal))
            return null;
        foreach (string name in Text.Split(','))
        {
            var ids = name.Split(':') is [_, var first, var second] ? [first, second]
                : name.Contains('.') ? new[] { name[..name.IndexOf('.')] } : [];
            foreach (string id in ids)
                if (device.IndexOf(id) < 0)
                    return $"--states {Text}: no element '{id}'{DeviceFiles.EditDistance.Suggestion(id, device.Elements.Select(e => e.Id))} in this device";
        }
        return null;
    }

    /// <summary>Reads a selection as written after --states; false with a message naming what is accepted.</summary>
    public static bool TryParse(string text, out StateSelection selection, out string error)
    {
        selection = Auto;
        error = "";
        string t = text.Trim();
        if (t is "auto" or "neighbours" or "neighbors") { selection = new(t == "neighbors" ? "neighbours" : t); return true; }
        if (t.StartsWith("excitations:", StringComparison.Ordinal))
        {
            if (int.TryParse(t["excitations:".Length..], NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n is >= 0 and <= 64)
            {
                selection = new(t);
                return true;
            }
            error = $"'{t}': write excitations:N with N a whole number from 0 to 64";
            return false;
        }
        if (t.StartsWith("below:", StringComparison.Ordinal))
        {
            if (QuantityParser.TryParse(t["below:".Length..], UnitKind.Frequency, out double e, out string why) && e >= 0 && double.IsFinite(e))
            {
                selection = new(t);
                return true;
            }
            error = $"'{t}': write below:ENERGY, e.g. below:12GHz{(why.Length > 0 ? " (" + why + ")" : "")}";
            return false;
        }
        var parts = t.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);
        foreach (var p in parts)
        {
            bool pair = (p.StartsWith("zz:", StringComparison.Ordinal) || p.StartsWith("chi2:", StringComparison.Ordinal)) && p.Split(':').Length == 3;
            bool single = p.Contains('.') && p.Split('.').Length == 2;
            if (p is "zz" or "chi2" || pair || single) continue;
            error = $"'{p}': --states takes auto, neighbours, excitations:N, below:ENERGY, or quantity names separated by commas " +
                "(zz, chi2, zz:A:B, chi2:Q:R, Q.anharmonicity, Q.f01)";
            return false;
        }
        if (parts.Length == 0) { error = "--states is empty"; return false; }
        selection = new(string.Join(",", parts));
        return true;
    }

    /// <summary>The states this selection needs on one point's basis, with how many eigenpairs that takes.</summary>
    public SelectedStates Resolve(CompositeProblem problem)
    {
        var basis = problem.Basis;
        if (Text == "auto")
        {
            var manifold = Manifold(basis, 2, "auto: every state up to 2 excitations");
            if (manifold.Count <= AutoManifoldLimit || manifold.Count >= basis.Dimension) return manifold;
            return Neighbours(problem, "auto (the module is large): each element's first excitation, each qubit's second, ZZ of neighbouring qubits");
        }
        if (Text == "neighbours") return Neighbours(problem, "each element's first excitation, each qubit's second, ZZ of neighbouring qubits");
        if (Text.StartsWith("excitations:", StringComparison.Ordinal))
        {
            int n = int.Parse(Text["excitations:".Length..], CultureInfo.InvariantCulture);
            return Manifold(basis, n, $"every state up to {n} excitations");
        }
        if (Text.StartsWith("below:", StringComparison.Ordinal))
        {
            double e = QuantityParser.Parse(Text["below:".Length..], UnitKind.Frequency);
            return Upto(basis, e, 0, $"every state with bare energy up to {e.ToString("0.###", CultureInfo.InvariantCulture)} GHz", null);
        }
        return Quantities(problem, Text.Split(','));
    }

    private static SelectedStates Manifold(CompositeBasis basis, int excitations, string description)
    {
        double highest = 0;
        for (int i = 0; i < basis.Dimension; i++)
            if (basis.States[i].Sum() <= excitations) highest = Math.Max(highest, basis.BareEnergies[i]);
        return Upto(basis, highest, Margin, description, null);
    }

    /// <summary>Every state with bare energy ≤ <paramref name="highest"/>, plus <paramref name="margin"/>.</summary>
    private static SelectedStates Upto(CompositeBasis basis, double highest, int margin, string description, ISet<(int, int)>? pairs)
    {
        int count = 0;
        for (int i = 0; i < basis.Dimension; i++) if (basis.BareEnergies[i] <= highest + 1e-9) count++;
        return new SelectedStates(Math.Min(basis.Dimension, Math.Max(1, count + margin)), description, pairs);
    }

    private static SelectedStates Neighbours(CompositeProblem problem, string description)
    {
        var (qubits, zz, chi) = Graph(problem.Device);
        var needed = new List<(int, int)[]>();
        for (int e = 0; e < problem.Device.Elements.Count; e++) needed.Add([(e, 1)]);
        foreach (int q in qubits) needed.Add([(q, 2)]);
        foreach (var (a, b) in zz) needed.Add([(a, 1), (b, 1)]);
        // own-resonator pairs are reported (their Purcell estimate needs only the qubit's 1); their 2χ only when its
        // states happen to lie in the computed block, else it shows as not computed
        var pairs = zz.Concat(chi).ToHashSet();
        return Needed(problem.Basis, needed, description + (chi.Count > 0 ? "; 2χ with --states chi2" : ""), pairs);
    }

    private static SelectedStates Quantities(CompositeProblem problem, string[] names)
    {
        var device = problem.Device;
        var (_, zz, chi) = Graph(device);
        var needed = new List<(int, int)[]>();
        var pairs = new HashSet<(int, int)>();
        foreach (var name in names)
        {
            if (name == "zz") foreach (var (a, b) in zz) AddPair(a, b);
            else if (name == "chi2") foreach (var (q, r) in chi) AddPair(q, r);
            else if (name.Split(':') is [_, var first, var second]) AddPair(Index(first), Index(second));
            else
            {
                var (id, quantity) = (name[..name.IndexOf('.')], name[(name.IndexOf('.') + 1)..]);
                int e = Index(id);
                needed.Add([(e, 1)]);
                if (quantity is "anharmonicity" or "f12") needed.Add([(e, 2)]);
            }
        }
        return Needed(problem.Basis, needed, string.Join(", ", names), pairs);

        void AddPair(int a, int b)
        {
            needed.Add([(a, 1)]);
            needed.Add([(b, 1)]);
            needed.Add([(a, 1), (b, 1)]);
            pairs.Add((Math.Min(a, b), Math.Max(a, b)));
        }

        int Index(string id)
        {
            int i = device.IndexOf(id);
            return i >= 0 ? i : throw new ArgumentException($"--states: no element '{id}' in this device");
        }
    }

    private static SelectedStates Needed(CompositeBasis basis, List<(int Element, int Level)[]> needed, string description, ISet<(int, int)> pairs)
    {
        double highest = 0;
        foreach (var state in needed)
        {
            int index = basis.IndexOfExcitation(state);
            if (index >= 0) highest = Math.Max(highest, basis.BareEnergies[index]);
        }
        return Upto(basis, highest, Margin, description, pairs);
    }

    /// <summary>
    /// The device's qubits (qubit-like elements coupled to a resonator; all qubit-like ones when there is no resonator),
    /// neighbouring qubit pairs (coupled directly or through one qubit-like element that is not a qubit, i.e. a
    /// coupler), and each qubit with the resonators coupled to it. Pairs are (lower index, higher index).
    /// </summary>
    public static (List<int> Qubits, List<(int, int)> ZZ, List<(int, int)> Chi) Graph(Device device)
    {
        var elements = device.Elements;
        var links = elements.Select(_ => new HashSet<int>()).ToArray();
        foreach (var c in device.Couplers)
        {
            int a = device.IndexOf(c.ElementA), b = device.IndexOf(c.ElementB);
            if (a < 0 || b < 0 || a == b) continue;
            links[a].Add(b);
            links[b].Add(a);
        }
        bool anyResonator = elements.Any(e => e is Resonator);
        var qubits = Enumerable.Range(0, elements.Count)
            .Where(i => elements[i].IsQubitLike && elements[i] is not Resonator && (!anyResonator || links[i].Any(j => elements[j] is Resonator)))
            .ToList();
        var isQubit = new bool[elements.Count];
        foreach (int q in qubits) isQubit[q] = true;
        var zz = new SortedSet<(int, int)>();
        var chi = new List<(int, int)>();
        foreach (int q in qubits)
        {
            foreach (int j in links[q])
            {
                if (isQubit[j]) zz.Add((Math.Min(q, j), Math.Max(q, j)));
                else if (elements[j] is Resonator) chi.Add((Math.Min(q, j), Math.Max(q, j)));
                else if (elements[j].IsQubitLike)
                    foreach (int k in links[j])
                        if (k != q && isQubit[k]) zz.Add((Math.Min(q, k), Math.Max(q, k)));
            }
        }
        return (qubits, zz.ToList(), chi);
    }
}
