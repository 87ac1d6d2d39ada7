using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Kinds;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Tests.Support;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Kinds;

/// <summary>
/// Every element kind, through everything that is derived from its description: reading a new element with its
/// default values, `describe`, the keys it accepts and refuses, and its row in the file-format manual.
/// (Insert in the terminal UI and the save round trip are covered per kind in the app's tests.)
/// </summary>
public class ElementKindCatalogTests
{
    public static TheoryData<string> KindNames => new(ElementKindCatalog.Names);

    private static string Manual => File.ReadAllText(Path.Combine(ReferenceData.Directory, "..", "..", "..", "docs", "device-format.md"));

    private static string DeviceWith(ElementKindInfo kind, string extra = "") =>
        $"[device]\nname = \"one\"\n\n[elements.x]\nkind = \"{kind.Name}\"\n{kind.NewElementValues}{extra}";

    [Fact]
    public void The_catalog_finds_six_kinds_in_a_fixed_order_with_distinct_names_types_and_insert_letters()
    {
        Assert.Equal(["transmon", "tunable_transmon", "fluxonium", "kerr", "resonator", "level_list"], ElementKindCatalog.Names);
        Assert.Equal(ElementKindCatalog.All.Count, ElementKindCatalog.All.Select(k => k.ElementType).Distinct().Count());
        var letters = ElementKindCatalog.All.Select(k => k.InsertLetter).Concat(CouplerKindInfo.All.Select(k => k.InsertLetter)).ToArray();
        Assert.Equal(letters.Length, letters.Distinct().Count());
    }

    [Fact]
    public void Every_concrete_kind_description_in_the_assembly_is_listed_in_the_catalog()
    {
        // The catalog is an explicit list (the ahead-of-time build cannot find types by reflection); this is the
        // check that a new kind's file was also added to it.
        var defined = typeof(ElementKindInfo).Assembly.GetTypes()
            .Where(t => t.IsSubclassOf(typeof(ElementKindInfo)) && !t.IsAbstract)
            .Select(t => t.Name).Order().ToArray();
        Assert.Equal(defined, ElementKindCatalog.All.Select(k => k.GetType().Name).Order().ToArray());
    }

    [Theory]
    [MemberData(nameof(KindNames))]
    public void A_new_element_of_every_kind_reads_and_describes_as_its_kind(string name)
    {
        var kind = ElementKindCatalog.Named(name)!;
        var result = DeviceDocument.Parse(DeviceWith(kind), "one.toml");
        Assert.True(result.Ok, string.Join("\n", result.Errors));
        var element = result.Document!.Device.Element("x");
        Assert.IsType(kind.ElementType, element);
        Assert.Same(kind, ElementKindCatalog.Of(element));
        var model = DescribeFormatter.Describe(new DeviceSolver().Prepare(result.Document.Device));
        Assert.Equal(name, (string?)model["elements"]![0]!["kind"]);
    }

    [Theory]
    [MemberData(nameof(KindNames))]
    public void Every_kind_refuses_a_key_it_does_not_have_at_that_key(string name)
    {
        var kind = ElementKindCatalog.Named(name)!;
        var result = DeviceDocument.Parse(DeviceWith(kind, "no_such_key = 1\n"), "one.toml");
        Assert.False(result.Ok);
        var error = Assert.Single(result.Errors);
        Assert.Equal("elements.x.no_such_key", error.Field);
        Assert.Equal(kind.NewElementValues.Count(c => c == '\n') + 6, error.Line);   // the line after the defaults
    }

    [Theory]
    [MemberData(nameof(KindNames))]
    public void Every_kind_has_its_row_in_the_manual(string name)
    {
        var kind = ElementKindCatalog.Named(name)!;
        Assert.Contains(kind.ManualRow, Manual);
        // and every key of the kind is named in the row
        foreach (var key in kind.Keys.Select(k => k.Name).Where(k => k is not ("operators" or "overlap" or "hamiltonian" or "energies")))
            Assert.Contains($"`{key}`", kind.ManualRow);
    }

    [Fact]
    public void The_manuals_tables_list_exactly_the_known_kinds()
    {
        // the element table: from its header to the first line that is not a table row
        var lines = Manual.Split('\n');
        int header = Array.IndexOf(lines, "| kind | Hamiltonian | keys |");
        Assert.True(header >= 0, "the manual's element table header");
        var rows = lines.Skip(header + 2).TakeWhile(l => l.StartsWith('|')).ToArray();
        Assert.Equal(ElementKindCatalog.All.Select(k => k.ManualRow), rows);
        Assert.Contains($"| `kind` | {CouplerKindInfo.ManualText} |", Manual);
    }

    [Fact]
    public void An_unknown_kind_is_an_error_at_kind_with_a_suggestion()
    {
        var result = DeviceDocument.Parse("[device]\nname = \"one\"\n\n[elements.x]\nkind = \"transmn\"\nec = \"200 MHz\"\nej = \"16 GHz\"\n", "one.toml");
        var error = Assert.Single(result.Errors);
        Assert.Equal("elements.x.kind", error.Field);
        Assert.Contains("transmon", error.Message);
        Assert.Contains(string.Join(", ", ElementKindCatalog.Names), error.Message);
    }

    [Theory]
    [InlineData("flux", UnitKind.Flux)]
    [InlineData("ng", UnitKind.Dimensionless)]
    [InlineData("asymmetry", UnitKind.Dimensionless)]
    [InlineData("ic1", UnitKind.Current)]
    [InlineData("rn", UnitKind.Resistance)]
    [InlineData("inductance", UnitKind.Inductance)]
    [InlineData("capacitance", UnitKind.Capacitance)]
    [InlineData("ec", UnitKind.Frequency)]
    [InlineData("energy_1", UnitKind.Frequency)]
    [InlineData("g", UnitKind.Frequency)]
    [InlineData("value", UnitKind.Dimensionless)]
    public void Parameter_units_come_from_the_kinds_keys(string key, UnitKind expected) =>
        Assert.Equal(expected, ParameterKinds.Of(key));

    [Fact]
    public void Circuit_forms_name_the_parameters_they_give()
    {
        Assert.Equal(["capacitance"], new TransmonKind().CircuitFormsOf("ec"));
        Assert.Equal(["ic", "rn"], new FluxoniumKind().CircuitFormsOf("ej"));
        Assert.Equal(["inductance"], new FluxoniumKind().CircuitFormsOf("el"));
        Assert.Equal(["ej1", "ej2", "ic1", "ic2", "rn1", "rn2"], new TunableTransmonKind().CircuitFormsOf("asymmetry"));
        Assert.Empty(new ResonatorKind().CircuitFormsOf("frequency"));
    }
}
