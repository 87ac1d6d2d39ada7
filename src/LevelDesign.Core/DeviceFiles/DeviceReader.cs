using System.Text.RegularExpressions;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Turns device-file text into a <see cref="Device"/> with biases, operating points and sweeps, collecting every
/// problem (never throwing for bad input). The format is described in docs/device-format.md.
/// </summary>
public static partial class DeviceReader
{
    public static readonly IReadOnlyList<string> Sections =
        ["device", "truncation", "capacitance_matrix", "elements", "couplers", "biases", "points", "sweeps", "coherence", "spread", "rules"];

    private static readonly IReadOnlyList<string> DeviceKeys = ["name", "description", "purity_threshold"];

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_-]*$")]
    private static partial Regex IdPattern();

    public static (DeviceFileContent? Content, IReadOnlyList<DeviceFileError> Errors) Read(string text, string path, DeviceLoadOptions options)
    {
        var errors = new ErrorList(path);
        SourceDocument source;
        try
        {
            source = SourceReader.Read(text, path);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            errors.Add(1, 1, "syntax", "the file could not be read as TOML: " + e.Message);
            return (null, errors.Items);
        }
        if (source.SyntaxErrors.Count > 0) return (null, ErrorList.Capped(source.SyntaxErrors));

        foreach (var entry in source.Root.Entries)
            errors.At(entry, entry.Key, $"unknown top-level key '{entry.Key}'; values belong inside a table such as [device] or [elements.<id>]");

        var sections = Sections.ToDictionary(s => s, _ => new List<(string Id, SourceTable Table)>());
        SourceTable? deviceTable = null, truncationTable = null, matrixTable = null, coherenceTable = null;
        var operatorTables = new Dictionary<string, SourceTable>();
        var seen = new Dictionary<string, SourceTable>();
        foreach (var table in source.Tables)
        {
            if (seen.TryGetValue(table.Name, out var earlier))
            {
                string what = table.Name.Contains('.') ? $"duplicate id: [{table.Name}] is already defined at line {earlier.Line}" : $"[{table.Name}] appears twice (first at line {earlier.Line})";
                errors.At(table, table.Name, what);
                continue;
            }
            seen[table.Name] = table;
            var parts = table.Name.Split('.');
            string head = parts[0];
            if (!Sections.Contains(head))
            {
                errors.At(table, table.Name, $"unknown table [{table.Name}]{EditDistance.Suggestion(head, Sections)} (tables: {string.Join(", ", Sections)})");
                continue;
            }
            // read against the finished document by Spread.SpreadReader (DeviceDocument.Parse)
            if (head is "spread" or "rules") continue;
            bool single = head is "device" or "truncation" or "capacitance_matrix" or "coherence";
            if (single)
            {
                if (parts.Length != 1) { errors.At(table, table.Name, $"[{head}] takes no id; write [{head}]"); continue; }
                if (head == "device") deviceTable = table;
                else if (head == "truncation") truncationTable = table;
                else if (head == "coherence") coherenceTable = table;
                else matrixTable = table;
                continue;
            }
            if (parts.Length == 1)
            {
                foreach (var e in table.Entries)
                    errors.At(e, $"{head}.{e.Key}", $"write each of the {head} as its own table, e.g. [{head}.{e.Key}]");
                continue;
            }
            if (head == "elements" && parts.Length == 3 && parts[2] == "operators")
            {
                operatorTables[parts[1]] = table;
                continue;
            }
            if (parts.Length != 2 || !IdPattern().IsMatch(parts[1]))
            {
                errors.At(table, table.Name, $"'{string.Join(".", parts.Skip(1))}' is not a valid id: use letters, digits, '_' or '-', starting with a letter, as in [{head}.qa]");
                continue;
            }
            sections[head].Add((parts[1], table));
        }

        string name = "device";
        double purityThreshold = Analysis.Conventions.DefaultPurityThreshold;
        if (deviceTable is not null)
        {
            var r = new TableReader(deviceTable, "device", errors, DeviceKeys.ToHashSet());
            name = r.Text("name") ?? name;
            r.Text("description");
            purityThreshold = r.Checked("purity_threshold", UnitKind.Dimensionless, x => x > 0 && x <= 1,
                "purity_threshold must be in (0, 1], e.g. 0.9") ?? purityThreshold;
        }
        var truncation = TruncationReader.Read(truncationTable, errors);
        var coherence = CoherenceReader.Read(coherenceTable, errors);
        var matrix = CapacitanceMatrixReader.Read(matrixTable, errors);

        var elementIds = sections["elements"].Select(e => e.Id).ToHashSet();
        if (sections["elements"].Count == 0)
            errors.Add(1, 1, "elements", "a device needs at least one element, e.g. [elements.qa] with kind = \"transmon\"");
        foreach (var id in operatorTables.Keys.Where(id => !elementIds.Contains(id)))
            errors.At(operatorTables[id], $"elements.{id}.operators", $"operators for an unknown element '{id}'");
        if (matrix is not null)
            for (int i = 0; i < matrix.Nodes.Count; i++)
                if (!elementIds.Contains(matrix.Nodes[i]))
                    errors.At(matrix.NodeValues[i], "capacitance_matrix.nodes",
                        $"no element '{matrix.Nodes[i]}'{EditDistance.Suggestion(matrix.Nodes[i], elementIds)} (elements: {string.Join(", ", elementIds)})");

        var elements = new List<Element>();
        var levels = new Dictionary<string, int>();
        var basisSizes = new Dictionary<string, int>();
        foreach (var (id, table) in sections["elements"])
        {
            int node = matrix?.Nodes.ToList().IndexOf(id) ?? -1;
            double? ec = node >= 0 ? matrix!.Charging.ChargingEnergyGHz(node) : null;
            var result = ElementReader.Read(id, table, operatorTables.GetValueOrDefault(id), errors, ec);
            if (result.Element is not null) elements.Add(result.Element);
            if (result.Levels is int l) levels[id] = l;
            // a level list with fewer states than [truncation] default_levels keeps all of its states
            else if (result.Element?.MaxLevels is int most && most < truncation.DefaultLevels) levels[id] = most;
            if (result.BasisSize is int b) basisSizes[id] = b;
        }
        var byId = elements.ToDictionary(e => e.Id);

        var couplers = new List<Coupler>();
        foreach (var (id, table) in sections["couplers"])
        {
            if (elementIds.Contains(id))
                errors.At(table, "couplers." + id, $"id '{id}' is already used by an element; ids must be unique");
            if (CouplerReader.Read(id, table, errors, byId, elementIds) is Coupler c) couplers.Add(c);
        }
        if (matrix is not null)
            couplers.AddRange(MatrixCouplers(matrix, byId, errors, matrixTable!));

        var device = new Device(name, elements, couplers, new Truncation
        {
            Levels = levels,
            BasisSizes = basisSizes,
            DefaultLevels = truncation.DefaultLevels,
            MaxExcitations = truncation.MaxExcitations,
            MaxBareEnergyGHz = truncation.MaxBareEnergyGHz,
        });
        if (errors.Count > 0) return (null, errors.Items);

        // Backstop: the model's own checks, reported at the table they concern.
        foreach (var problem in device.Validate())
            Report(errors, seen, problem, "device");

        var biases = new List<BiasDefinition>();
        var targets = new Dictionary<string, string>();
        foreach (var (id, table) in sections["biases"])
        {
            if (BiasReader.Read(id, table, errors, device) is not BiasDefinition bias) continue;
            if (targets.TryGetValue(bias.Target, out var other))
            {
                errors.At(table, $"biases.{id}.target", $"'{bias.Target}' is already moved by bias '{other}'; one bias per parameter");
                continue;
            }
            targets[bias.Target] = id;
            biases.Add(bias);
            device = device.WithParameter(bias.Target, bias.ToParameter(bias.Value));
        }
        foreach (var e in device.Elements)
            foreach (var problem in e.Validate())
                Report(errors, seen, ModelProblem.OfElement(e.Id, $"at the bias values, element '{e.Id}': {problem}"), "biases." + biases.FirstOrDefault(b => b.Target.StartsWith(e.Id + "."))?.Name);
        var biasMap = biases.ToDictionary(b => b.Name);
        var points = new List<OperatingPoint>();
        foreach (var (id, table) in sections["points"])
            if (PointReader.Read(id, table, errors, biasMap) is OperatingPoint p) points.Add(p);
        var sweeps = new List<SweepDefinition>();
        foreach (var (id, table) in sections["sweeps"])
            if (SweepReader.Read(id, table, errors, device, biasMap) is SweepDefinition s) sweeps.Add(s);
        if (errors.Count > 0) return (null, errors.Items);

        // the path a point of this size takes (dense when small, sparse iterative when large) and what it needs
        const int iterativeFrom = DeviceSolver.DefaultIterativeMinimumDimension;
        long limitDimension = CompositeSizeEstimate.MaxDimension(options.LimitBytes, device.Couplers.Count, iterativeFrom);
        long dimension = CompositeSizeEstimate.Dimension(device, limitDimension);
        if (dimension > limitDimension && !options.AllowLarge && !truncation.AllowLarge)
        {
            double counted = dimension >= long.MaxValue / 2 ? CompositeSizeEstimate.Count(device) : dimension;
            // the bare-energy window is counted only up to the limit: then all that is known is "more than"
            bool stopped = dimension < CompositeSizeEstimate.UpperBound(device);
            double gib = CompositeSizeEstimate.PathBytes(counted, device.Couplers.Count, iterativeFrom) / (1L << 30);
            string need = stopped ? "more than the limit" : double.IsFinite(gib) && gib < 1e9 ? $"about {gib:N1} GiB" : "far more memory than any machine has";
            string states = stopped ? $"more than {limitDimension:N0}" : CompositeSizeEstimate.CountText(counted);
            var at = truncationTable ?? sections["elements"][0].Table;
            errors.At(at, "truncation",
                $"the composite space would have {states} states; the sparse eigen solve (matrix, search space and " +
                $"{CompositeSizeEstimate.NominalStates} kept states) would need {need} (limit {options.LimitBytes / (double)(1L << 30):N1} GiB, " +
                $"about {limitDimension:N0} states for this device); lower 'levels' or set max_excitations / max_bare_energy in [truncation], " +
                "or override with allow_large = true in [truncation] (command line: --allow-large)");
            return (null, errors.Items);
        }
        // after the size guard, so a device refused for its size is refused at once
        var bare = BareSpectrumCheck.Run(device, sections["elements"], errors);
        if (errors.Count == 0) device = GReferenceReader.Fix(device, sections["couplers"], points, biases, errors, bare);
        if (errors.Count > 0) return (null, errors.Items);
        return (new DeviceFileContent(source, device, biases, points, sweeps, dimension) { PurityThreshold = purityThreshold, Coherence = coherence }, errors.Items);
    }

    /// <summary>Puts a model-level problem at the table of the element or coupler it names.</summary>
    private static void Report(ErrorList errors, IReadOnlyDictionary<string, SourceTable> tables, ModelProblem problem, string field)
    {
        string table = problem.Table;
        if (tables.TryGetValue(field, out var fieldTable) || tables.TryGetValue(table, out fieldTable))
            errors.At(fieldTable, field == "device" ? table : field, problem.Message);
        else errors.Add(1, 1, field, problem.Message);
    }

    /// <summary>One n·n coupler per node pair with coefficient 4e²(C⁻¹)_ij/h, the exact charging cross terms.</summary>
    private static IEnumerable<Coupler> MatrixCouplers(CapacitanceMatrixReader.Result matrix, IReadOnlyDictionary<string, Element> elements, ErrorList errors, SourceTable table)
    {
        var result = new List<Coupler>();
        for (int i = 0; i < matrix.Nodes.Count; i++)
        {
            if (elements.TryGetValue(matrix.Nodes[i], out var e) && !e.OperatorNames.Contains("n"))
                errors.At(matrix.NodeValues[i], "capacitance_matrix.nodes", $"element '{e.Id}' has no charge operator 'n', so it cannot be a node of the capacitance matrix");
            for (int j = i + 1; j < matrix.Nodes.Count; j++)
            {
                string id = $"cmatrix_{matrix.Nodes[i]}_{matrix.Nodes[j]}";
                result.Add(Coupler.Create(id, CouplerKind.Capacitive, matrix.Nodes[i], matrix.Nodes[j],
                    new CouplingStrength.Coefficient(matrix.Charging.CouplingGHz(i, j))));
            }
        }
        return result;
    }
}
