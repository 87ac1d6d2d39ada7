using System.Text.RegularExpressions;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Kinds;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Structural edits: add an element or coupler, remove or rename anything with an id. Like
/// <see cref="WithValue"/> they change only the characters concerned (a new table is inserted after the last
/// one of its section; a removed table takes its lines and one blank line after it), then re-read the whole
/// text exactly as loading does, so the result is either a valid document or an error naming the field.
/// </summary>
public sealed partial class DeviceDocument
{
    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_-]*$")]
    private static partial Regex IdShape();

    private static readonly string[] IdSections = ["elements", "couplers", "biases", "points", "sweeps"];

    /// <summary>
    /// Appends [elements.ID] with the kind's default values (marked as defaults in a comment), after the last
    /// element table.
    /// </summary>
    public DeviceDocument WithElement(string id, ElementKindInfo kind, out DeviceFileError? error)
    {
        string field = "elements." + id;
        if (NewIdProblem(id, "elements") is string problem) { error = Error(field, problem); return this; }
        string block = $"[elements.{id}]\n# default values for a new {kind.InsertName}, not a design: set your own\nkind = \"{kind.Name}\"\n{kind.NewElementValues}";
        return Inserted(block, AfterLastTable("elements"), field, out error);
    }

    /// <summary>
    /// Appends [couplers.ID] linking elements a and b with strength g (text such as "10 MHz"; the default is
    /// marked as such), after the last coupler table. A kind that needs operators (custom) takes them as
    /// (operator of a, operator of b).
    /// </summary>
    public DeviceDocument WithCoupler(string id, CouplerKindInfo kind, string a, string b, out DeviceFileError? error, string? g = null,
        (string A, string B)? operators = null)
    {
        string field = "couplers." + id;
        if (NewIdProblem(id, "couplers") is string problem) { error = Error(field, problem); return this; }
        if (kind.NeedsOperators && operators is null)
        {
            error = Error(field, $"a {kind.Name} coupler names an operator of each element, e.g. n and sx");
            return this;
        }
        string strength = g is null ? "g = \"10 MHz\"   # default strength, not a design: set your own\n" : $"g = {Literal(g, false)}\n";
        string ops = operators is var (opA, opB) ? $"operators = [{Quote(opA)}, {Quote(opB)}]\n" : "";
        string block = $"[couplers.{id}]\nkind = \"{kind.Name}\"\nbetween = [{Quote(a)}, {Quote(b)}]\n{ops}{strength}";
        int at = HasTables("couplers") ? AfterLastTable("couplers") : AfterLastTable("elements");
        return Inserted(block, at, field, out error);
    }

    /// <summary>
    /// Appends [points.NAME] setting each given bias to its control value (text such as "0.7 mA", written as typed),
    /// after the last point table (or the last bias table). The bias names must exist; the values are read back as
    /// loading does, so a value outside the bias's unit is refused with the field named.
    /// </summary>
    public DeviceDocument WithPoint(string name, IReadOnlyList<(string Bias, string Value)> values, out DeviceFileError? error)
    {
        string field = "points." + name;
        if (NewIdProblem(name, "points") is string problem) { error = Error(field, problem); return this; }
        if (values.Count == 0) { error = Error(field, "an operating point sets at least one bias"); return this; }
        if (values.FirstOrDefault(v => Bias(v.Bias) is null) is { Bias: not null } unknown)
        {
            error = Error(field, $"no bias '{unknown.Bias}'{EditDistance.Suggestion(unknown.Bias, Biases.Select(b => b.Name))}");
            return this;
        }
        string block = $"[points.{name}]\n" + string.Concat(values.Select(v => $"{QuoteKeyIfNeeded(v.Bias)} = {Literal(v.Value, false)}\n"));
        int at = HasTables("points") ? AfterLastTable("points") : HasTables("biases") ? AfterLastTable("biases") : Text.Length;
        return Inserted(block, at, field, out error);
    }

    /// <summary>Sections that do not change the device at the file's biases: named points, sweeps and the spread study.</summary>
    private static readonly string[] OutsideTheModel = ["points", "sweeps", "spread", "rules"];

    /// <summary>
    /// The text without its operating points, sweeps and spread study. Two documents with the same model text give the
    /// same device and biases, so the screen need not compute again when only those tables changed (saving a point).
    /// </summary>
    public string ModelText() =>
        TextEdit.Apply(Text, _source.Tables.Where(t => OutsideTheModel.Contains(t.Name.Split('.')[0])).Select(TableRemoval));

    /// <summary>An unused id for a new element: the stem with the first free number ("d1", "d2", …).</summary>
    public string NewElementId(string stem)
    {
        for (int n = 1; n < 1000; n++)
            if (NewIdProblem($"{stem}{n}", "elements") is null) return $"{stem}{n}";
        return stem + "_new";
    }

    /// <summary>
    /// An id for a new coupler: "A_B" for the first two elements not yet coupled to each other (or the first two), with
    /// a number added while it is taken.
    /// </summary>
    public string NewCouplerId(out string a, out string b)
    {
        var ids = Device.Elements.Select(e => e.Id).ToList();
        (a, b) = (ids.ElementAtOrDefault(0) ?? "a", ids.ElementAtOrDefault(1) ?? "b");
        var linked = Device.Couplers.Select(c => (c.ElementA, c.ElementB)).ToHashSet();
        bool found = false;
        for (int i = 0; i < ids.Count && !found; i++)
            for (int j = i + 1; j < ids.Count && !found; j++)
                if (!linked.Contains((ids[i], ids[j])) && !linked.Contains((ids[j], ids[i]))) { (a, b) = (ids[i], ids[j]); found = true; }
        string stem = $"{a}_{b}", id = stem;
        for (int n = 2; n < 1000 && NewIdProblem(id, "couplers") is not null; n++) id = $"{stem}_{n}";
        return id;
    }

    /// <summary>
    /// What else goes when <paramref name="id"/> is removed (see <see cref="Without"/>), as short descriptions
    /// such as "coupler qa_ra", "bias qa_flux", "qa_flux in point idle", "sweep coupler_scan".
    /// </summary>
    public IReadOnlyList<string> AlsoRemoved(string id) => PlanRemoval(id, out _) is { } plan ? plan.Descriptions : [];

    /// <summary>
    /// Removes an element, coupler, bias, operating point or sweep by id, together with everything that would
    /// otherwise name something missing: an element takes its couplers with it; an element or coupler takes the
    /// biases targeting its parameters; a removed bias leaves the points (a point left empty goes) and takes
    /// the sweeps moving it or a removed element's parameters. An element listed in [capacitance_matrix] is
    /// refused: the matrix row and column must be removed by hand first.
    /// </summary>
    public DeviceDocument Without(string id, out DeviceFileError? error)
    {
        var plan = PlanRemoval(id, out string? problem);
        if (plan is null) { error = Error(id, problem!); return this; }
        var edits = plan.Tables.Select(TableRemoval).Concat(plan.Lines.Select(LineRemoval));
        return Reparsed(TextEdit.Apply(Text, edits), id, out error);
    }

    /// <summary>
    /// Renames an element, coupler, bias, point or sweep: the table header (and an element's operators table)
    /// and every reference — couplers' between, [capacitance_matrix] nodes, bias targets and sweep paths
    /// ("qa.flux"), point keys and sweep paths naming a bias. Levels are kept in the element tables, so
    /// [truncation] names no element. An id used both by an element or coupler and by a bias is taken as the element or coupler.
    /// </summary>
    public DeviceDocument Renamed(string oldId, string newId, out DeviceFileError? error)
    {
        string? section = SectionOf(oldId);
        if (section is null) { error = Error(oldId, NotFound(oldId)); return this; }
        if (oldId == newId) { error = Error($"{section}.{oldId}", "the new id is the same as the old one"); return this; }
        if (NewIdProblem(newId, section) is string problem) { error = Error($"{section}.{newId}", problem); return this; }

        var edits = new List<TextEdit>();
        foreach (var table in _source.Tables)
            if (table.Name == $"{section}.{oldId}" || (section == "elements" && table.Name == $"elements.{oldId}.operators"))
                edits.Add(HeaderRename(table, section, oldId, newId));
        foreach (var reference in References())
        {
            switch (reference.Kind)
            {
                case ReferenceKind.Element when section == "elements" && reference.Value.Text == oldId:
                    edits.Add(new TextEdit(reference.Value.Offset, reference.Value.Length, Quote(newId)));
                    break;
                case ReferenceKind.Path or ReferenceKind.BiasOrPath when section is "elements" or "couplers"
                                                                       && reference.Value.Text!.StartsWith(oldId + ".", StringComparison.Ordinal):
                    edits.Add(new TextEdit(reference.Value.Offset, reference.Value.Length, Quote(newId + reference.Value.Text[oldId.Length..])));
                    break;
                case ReferenceKind.BiasOrPath when section == "biases" && reference.Value.Text == oldId:
                    edits.Add(new TextEdit(reference.Value.Offset, reference.Value.Length, Quote(newId)));
                    break;
            }
        }
        if (section == "biases")
            foreach (var point in SectionTables("points"))
                if (point.Find(oldId) is SourceEntry entry)
                {
                    int at = OffsetOf(entry.Line, entry.Column);
                    int length = Text[at] is '"' or '\'' ? oldId.Length + 2 : oldId.Length;
                    edits.Add(new TextEdit(at, length, QuoteKeyIfNeeded(newId)));
                }
        return Reparsed(TextEdit.Apply(Text, edits), $"{section}.{newId}", out error);
    }

    // ---- removal plan ---------------------------------------------------------------------------

    private sealed record RemovalPlan(List<SourceTable> Tables, List<SourceEntry> Lines, List<string> Descriptions);

    private RemovalPlan? PlanRemoval(string id, out string? problem)
    {
        problem = null;
        string? section = SectionOf(id);
        if (section is null) { problem = NotFound(id); return null; }
        var plan = new RemovalPlan([], [], []);
        var owners = new HashSet<string>();      // elements and couplers whose parameters disappear
        var biases = new HashSet<string>();
        void Take(string tableName, string what)
        {
            var table = _source.Tables.First(t => t.Name == tableName);
            if (plan.Tables.Contains(table)) return;
            plan.Tables.Add(table);
            if (what.Length > 0) plan.Descriptions.Add(what);
        }

        Take($"{section}.{id}", "");
        if (section == "elements")
        {
            if (MatrixNodes().Contains(id))
            {
                problem = $"element '{id}' is a node of [capacitance_matrix]; remove its row and column there first";
                return null;
            }
            owners.Add(id);
            if (_source.Tables.Any(t => t.Name == $"elements.{id}.operators")) Take($"elements.{id}.operators", "");
            foreach (var coupler in SectionTables("couplers"))
                if (coupler.Find("between")?.Value.Items.Any(v => v.Text == id) == true)
                {
                    string couplerId = coupler.Name["couplers.".Length..];
                    owners.Add(couplerId);
                    Take(coupler.Name, "coupler " + couplerId);
                }
        }
        if (section == "couplers") owners.Add(id);
        if (section == "biases") biases.Add(id);
        foreach (var bias in SectionTables("biases"))
            if (bias.Find("target")?.Value.Text is string target && owners.Any(o => target.StartsWith(o + ".", StringComparison.Ordinal)))
            {
                string name = bias.Name["biases.".Length..];
                biases.Add(name);
                Take(bias.Name, "bias " + name);
            }
        if (section is "elements" or "couplers" or "biases")
        {
            foreach (var reference in References().Where(r => r.Kind == ReferenceKind.BiasOrPath))
            {
                string path = reference.Value.Text!;
                if (biases.Contains(path) || owners.Any(o => path.StartsWith(o + ".", StringComparison.Ordinal)))
                    Take(reference.Table.Name, "sweep " + reference.Table.Name["sweeps.".Length..]);
            }
            foreach (var point in SectionTables("points"))
            {
                var gone = point.Entries.Where(e => biases.Contains(e.Key)).ToList();
                if (gone.Count == 0) continue;
                string name = point.Name["points.".Length..];
                if (gone.Count == point.Entries.Count) Take(point.Name, "point " + name);
                else
                    foreach (var entry in gone)
                    {
                        plan.Lines.Add(entry);
                        plan.Descriptions.Add($"{entry.Key} in point {name}");
                    }
            }
        }
        return plan;
    }

    // ---- references -----------------------------------------------------------------------------

    private enum ReferenceKind { Element, Path, BiasOrPath }

    /// <summary>A text value naming something by id; Table is the top-level table holding it.</summary>
    private sealed record Reference(ReferenceKind Kind, SourceTable Table, SourceValue Value);

    private IEnumerable<Reference> References()
    {
        foreach (var coupler in SectionTables("couplers"))
            if (coupler.Find("between")?.Value is { Kind: SourceValueKind.Array } between)
                foreach (var item in between.Items.Where(i => i.Kind == SourceValueKind.String))
                    yield return new Reference(ReferenceKind.Element, coupler, item);
        if (_source.Tables.FirstOrDefault(t => t.Name == "capacitance_matrix")?.Find("nodes")?.Value is { Kind: SourceValueKind.Array } nodes)
            foreach (var item in nodes.Items.Where(i => i.Kind == SourceValueKind.String))
                yield return new Reference(ReferenceKind.Element, _source.Tables.First(t => t.Name == "capacitance_matrix"), item);
        foreach (var bias in SectionTables("biases"))
            if (bias.Find("target")?.Value is { Kind: SourceValueKind.String } target)
                yield return new Reference(ReferenceKind.Path, bias, target);
        foreach (var sweep in SectionTables("sweeps"))
            foreach (var value in AxisPaths(sweep))
                yield return new Reference(ReferenceKind.BiasOrPath, sweep, value);
    }

    /// <summary>The vary and link path values of a sweep table and of its second axis.</summary>
    private static IEnumerable<SourceValue> AxisPaths(SourceTable axis)
    {
        if (axis.Find("vary")?.Value is { Kind: SourceValueKind.String } vary) yield return vary;
        if (axis.Find("links")?.Value is { Kind: SourceValueKind.Array } links)
            foreach (var link in links.Items.Where(l => l.Kind == SourceValueKind.Table))
                if (link.Table!.Find("path")?.Value is { Kind: SourceValueKind.String } path) yield return path;
        if (axis.Find("second")?.Value is { Kind: SourceValueKind.Table } second)
            foreach (var value in AxisPaths(second.Table!)) yield return value;
    }

    private IEnumerable<string> MatrixNodes() =>
        _source.Tables.FirstOrDefault(t => t.Name == "capacitance_matrix")?.Find("nodes")?.Value.Items.Select(i => i.Text ?? "") ?? [];

    private IEnumerable<SourceTable> SectionTables(string section) =>
        _source.Tables.Where(t => t.Name.StartsWith(section + ".", StringComparison.Ordinal) && t.Name.Count(c => c == '.') == 1);

    private bool HasTables(string section) => SectionTables(section).Any();

    /// <summary>The section holding a table for this id; elements and couplers first.</summary>
    private string? SectionOf(string id) => IdSections.FirstOrDefault(s => _source.Tables.Any(t => t.Name == $"{s}.{id}"));

    private string NotFound(string id)
    {
        var ids = IdSections.SelectMany(SectionTables).Select(t => t.Name[(t.Name.IndexOf('.') + 1)..]).ToList();
        string fromMatrix = id.StartsWith("cmatrix_", StringComparison.Ordinal) ? " (couplers named cmatrix_… come from [capacitance_matrix])" : "";
        return $"no element, coupler, bias, point or sweep '{id}' is written in this file{fromMatrix}{EditDistance.Suggestion(id, ids)}";
    }

    /// <summary>Why an id cannot be used for a new table in the section, or null when it can.</summary>
    private string? NewIdProblem(string id, string section)
    {
        if (!IdShape().IsMatch(id)) return $"'{id}' is not a valid id: use letters, digits, '_' or '-', starting with a letter";
        var shared = section is "elements" or "couplers" ? new[] { "elements", "couplers" } : [section];
        foreach (var s in shared)
            if (_source.Tables.Any(t => t.Name == $"{s}.{id}")) return $"id '{id}' is already used by [{s}.{id}]; ids must be unique";
        if (section is "elements" or "couplers" && Device.Couplers.Any(c => c.Id == id)) return $"id '{id}' is already used by a coupler from [capacitance_matrix]";
        return null;
    }

    // ---- text positions -------------------------------------------------------------------------

    private int OffsetOf(int line, int column)
    {
        int offset = 0;
        for (int l = 1; l < line; l++) offset = Text.IndexOf('\n', offset) + 1;
        return offset + column - 1;
    }

    /// <summary>The start of the line after the one holding <paramref name="offset"/> (or the offset itself at a line start).</summary>
    private int LineEndAt(int offset)
    {
        offset = Math.Min(offset, Text.Length);
        if (offset == 0 || Text[offset - 1] == '\n') return offset;
        int newline = Text.IndexOf('\n', offset);
        return newline < 0 ? Text.Length : newline + 1;
    }

    private int AfterLastTable(string section)
    {
        var tables = _source.Tables.Where(t => t.Name.StartsWith(section + ".", StringComparison.Ordinal)).ToList();
        return tables.Count == 0 ? Text.Length : tables.Max(t => LineEndAt(t.InsertOffset));
    }

    private TextEdit TableRemoval(SourceTable table)
    {
        int start = OffsetOf(table.Line, 1);
        int end = LineEndAt(Math.Max(table.InsertOffset, OffsetOf(table.Line, table.Column)));
        if (end < Text.Length && Text[end] == '\n') end++;                          // the blank line after it
        else if (end + 1 < Text.Length && Text[end] == '\r' && Text[end + 1] == '\n') end += 2;
        return new TextEdit(start, end - start, "");
    }

    private TextEdit LineRemoval(SourceEntry entry)
    {
        int start = OffsetOf(entry.Line, 1);
        return new TextEdit(start, LineEndAt(entry.Value.Offset + entry.Value.Length) - start, "");
    }

    private TextEdit HeaderRename(SourceTable table, string section, string oldId, string newId)
    {
        int start = OffsetOf(table.Line, table.Column);
        int end = Text.IndexOf('\n', start);
        string header = Text[start..(end < 0 ? Text.Length : end)];
        var match = Regex.Match(header, $@"^\[\s*{section}\s*\.\s*(""?)({Regex.Escape(oldId)})\1\s*[.\]]");
        if (!match.Success) throw new InvalidOperationException($"cannot find the id in the header '{header}'");
        int quotes = match.Groups[1].Length;
        return new TextEdit(start + match.Groups[2].Index - quotes, oldId.Length + 2 * quotes, newId);
    }

    private DeviceDocument Inserted(string block, int at, string field, out DeviceFileError? error)
    {
        string newline = Text.Contains("\r\n") ? "\r\n" : "\n";
        if (newline != "\n") block = block.Replace("\n", newline);
        string prefix = at > 0 && Text[at - 1] != '\n' ? newline + newline : newline;
        string suffix = at < Text.Length && Text[at] != '\n' && Text[at] != '\r' ? newline : "";
        return Reparsed(Text[..at] + prefix + block + suffix + Text[at..], field, out error);
    }

    private DeviceDocument Reparsed(string newText, string field, out DeviceFileError? error)
    {
        var result = Parse(newText, Path, _options);
        if (result.Document is null)
        {
            error = result.Errors.FirstOrDefault(e => e.Field.StartsWith(field, StringComparison.Ordinal)) ?? result.Errors.FirstOrDefault()
                ?? Error(field, "the edited file does not read back");
            return this;
        }
        error = null;
        return result.Document;
    }

    private DeviceFileError Error(string field, string message) => new(Path, 0, 0, field, message);
}
