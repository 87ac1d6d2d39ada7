using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Kinds;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Add, remove and rename on real device files (copies of devices/*.toml): load, operate, compare the text with
/// the original (only the concerned lines may change; comments elsewhere stay), save, and load again.
/// </summary>
public sealed class StructuralEditTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("leveldesign-structure-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private DeviceDocument Load(string device)
    {
        string path = Path.Combine(_dir, device);
        File.Copy(Path.Combine(RepositoryPaths.Devices, device), path, overwrite: true);
        var result = DeviceDocument.Load(path);
        Assert.True(result.Ok, string.Join("\n", result.Errors));
        return result.Document!;
    }

    /// <summary>Saves and loads again: the saved text must read back as a valid device.</summary>
    private static DeviceDocument SaveAndReload(DeviceDocument document)
    {
        document.Save();
        var result = DeviceDocument.Load(document.Path);
        Assert.True(result.Ok, string.Join("\n", result.Errors));
        return result.Document!;
    }

    /// <summary>The lines of <paramref name="part"/> appear in <paramref name="whole"/> in the same order.</summary>
    private static void AssertKeptInOrder(string part, string whole)
    {
        var lines = whole.Split('\n');
        int at = 0;
        foreach (var line in part.Split('\n'))
        {
            while (at < lines.Length && lines[at] != line) at++;
            Assert.True(at < lines.Length, $"line not kept in order: '{line}'");
            at++;
        }
    }

    [Fact]
    public void AddedElementIsAppendedAfterTheLastElementWithMarkedDefaults()
    {
        var document = Load("pair.toml");
        var added = document.WithElement("qd", new TransmonKind(), out var error);
        Assert.Null(error);
        AssertKeptInOrder(document.ToText(), added.ToText());
        string text = added.ToText();
        Assert.True(text.IndexOf("[elements.qd]") > text.IndexOf("[elements.rb]"));
        Assert.True(text.IndexOf("[elements.qd]") < text.IndexOf("[couplers.qa_ra]"));
        Assert.Contains("# default values for a new transmon", text);
        var reloaded = SaveAndReload(added);
        Assert.IsType<Transmon>(reloaded.Device.Element("qd"));
        Assert.Equal(0.2, reloaded.Device.GetParameter("qd.ec"), 12);
        Assert.Equal(document.Device.Elements.Count + 1, reloaded.Device.Elements.Count);
    }

    public static TheoryData<string> KindNames => new(ElementKindCatalog.Names);

    [Theory]
    [MemberData(nameof(KindNames))]
    public void EveryKindCanBeAddedWithItsDefaultsAndReadsBack(string name)
    {
        var kind = ElementKindCatalog.Named(name)!;
        var added = Load("single.toml").WithElement("extra", kind, out var error);
        Assert.Null(error);
        var element = SaveAndReload(added).Device.Element("extra");
        Assert.IsType(kind.ElementType, element);
        Assert.Same(kind, ElementKindCatalog.Of(element));
    }

    [Fact]
    public void A_new_level_list_is_a_two_level_defect_that_a_custom_coupler_can_reach()
    {
        var document = Load("single.toml").WithElement("tls", new LevelListKind(), out var error);
        Assert.Null(error);
        var tls = document.Device.Element("tls");
        Assert.Equal(2, tls.MaxLevels);
        Assert.Contains("sx", tls.OperatorNames);
        string qubit = document.Device.Elements[0].Id;
        var linked = document.WithCoupler("q_tls", CouplerKindInfo.Named("custom")!, qubit, "tls", out error, "3 MHz", ("n", "sx"));
        Assert.Null(error);
        var coupler = SaveAndReload(linked).Device.Couplers.Single(c => c.Id == "q_tls");
        Assert.Equal(("n", "sx"), (coupler.OperatorA, coupler.OperatorB));
        // without operators a custom coupler is refused with the reason
        Assert.Same(document, document.WithCoupler("q_tls2", CouplerKindInfo.Named("custom")!, qubit, "tls", out error));
        Assert.Contains("names an operator of each element", error!.Message);
    }

    [Fact]
    public void A_new_coupler_id_links_the_first_uncoupled_pair_and_is_never_taken()
    {
        var document = Load("pair.toml");
        string id = document.NewCouplerId(out string a, out string b);
        Assert.DoesNotContain(document.Device.Couplers, c => (c.ElementA, c.ElementB) == (a, b) || (c.ElementA, c.ElementB) == (b, a));
        Assert.DoesNotContain(document.Device.Couplers, c => c.Id == id);
        // pair.toml couples qa–ra, qa–qc, qa–qb, qb–rb, qb–qc: qa and rb are the first pair left
        Assert.Equal(("qa", "rb", "qa_rb"), (a, b, id));
        document.WithCoupler(id, CouplerKindInfo.Named("capacitive")!, a, b, out var error);
        Assert.Null(error);
        // every pair of single.toml is coupled already: the first pair again, with a number: a numbered id
        var single = Load("single.toml");
        string first = single.NewCouplerId(out a, out b);
        var once = single.WithCoupler(first, CouplerKindInfo.Named("exchange")!, a, b, out error);
        Assert.Null(error);
        string second = once.NewCouplerId(out string a2, out string b2);
        Assert.Equal(("q_r_2", "q_r_3"), (first, second));
        once.WithCoupler(second, CouplerKindInfo.Named("exchange")!, a2, b2, out error);
        Assert.Null(error);
    }

    [Fact]
    public void BadOrTakenIdsAreRefusedWithAReason()
    {
        var document = Load("pair.toml");
        Assert.Same(document, document.WithElement("qa", new TransmonKind(), out var taken));
        Assert.Contains("already used", taken!.Message);
        document.WithElement("2q", new TransmonKind(), out var shape);
        Assert.Contains("not a valid id", shape!.Message);
        document.WithElement("qa_ra", new TransmonKind(), out var coupler);
        Assert.Contains("already used", coupler!.Message);
    }

    [Fact]
    public void AddedCouplerLinksTwoElementsAndBadEndsAreReportedFromTheReader()
    {
        var document = Load("pair.toml");
        var added = document.WithCoupler("qa_rb", CouplerKindInfo.Named("capacitive")!, "qa", "rb", out var error, "3 MHz");
        Assert.Null(error);
        AssertKeptInOrder(document.ToText(), added.ToText());
        Assert.True(added.ToText().IndexOf("[couplers.qa_rb]") > added.ToText().IndexOf("[couplers.qa_qb]"));
        var coupler = SaveAndReload(added).Device.Couplers.Single(c => c.Id == "qa_rb");
        Assert.Equal(("qa", "rb"), (coupler.ElementA, coupler.ElementB));
        Assert.Equal(0.003, ((CouplingStrength.TargetG)coupler.Strength).GHz, 12);

        var withDefault = document.WithCoupler("g2", CouplerKindInfo.Named("exchange")!, "qa", "qb", out error);
        Assert.Null(error);
        Assert.Contains("default strength", withDefault.ToText());

        Assert.Same(document, document.WithCoupler("bad", CouplerKindInfo.Named("capacitive")!, "qa", "qz", out var missing));
        Assert.Equal("couplers.bad.between", missing!.Field);
        Assert.Contains("no element 'qz'", missing.Message);
    }

    [Fact]
    public void RemovingAnElementTakesItsCouplersAndBiasesAndKeepsEverythingElse()
    {
        var document = Load("pair.toml");
        Assert.Equal(["coupler qa_ra", "coupler qa_qc", "coupler qa_qb", "bias qa_flux"], document.AlsoRemoved("qa"));
        var removed = document.Without("qa", out var error);
        Assert.Null(error);
        string text = removed.ToText();
        AssertKeptInOrder(text, document.ToText());
        foreach (var table in new[] { "[elements.qa]", "[couplers.qa_ra]", "[couplers.qa_qc]", "[couplers.qa_qb]", "[biases.qa_flux]" })
            Assert.DoesNotContain(table, text);
        Assert.Contains("# Two flux-tunable transmons (qa, qb)", text);   // comments outside removed tables stay
        Assert.DoesNotContain("\n\n\n", text);                              // no blank lines pile up
        var reloaded = SaveAndReload(removed);
        Assert.Equal(["qb", "qc", "ra", "rb"], reloaded.Device.Elements.Select(e => e.Id));
        Assert.Equal(["qb_rb", "qb_qc"], reloaded.Device.Couplers.Select(c => c.Id));
        Assert.Equal(["qb_flux", "qc_flux"], reloaded.Biases.Select(b => b.Name));
    }

    [Fact]
    public void RemovingABiasTakesPointsLeftEmptyAndSweepsMovingIt()
    {
        var document = Load("pair.toml");
        Assert.Equal(["sweep coupler_scan", "point idle", "point coupler_low"], document.AlsoRemoved("qc_flux"));
        var reloaded = SaveAndReload(document.Without("qc_flux", out var error));
        Assert.Null(error);
        Assert.Empty(reloaded.Points);
        Assert.Empty(reloaded.Sweeps);
        Assert.Equal(["qa_flux", "qb_flux"], reloaded.Biases.Select(b => b.Name));
    }

    [Fact]
    public void RemovingABiasFromAPointWithOthersRemovesOnlyItsLine()
    {
        var document = Load("pair.toml");
        var two = document.WithValue("points.idle.qa_flux", "0.1", out var error);
        Assert.Null(error);
        Assert.Contains("qa_flux in point idle", two.AlsoRemoved("qa_flux"));
        var reloaded = SaveAndReload(two.Without("qa_flux", out error));
        Assert.Null(error);
        var idle = reloaded.Points.Single(p => p.Name == "idle");
        Assert.Equal(["qc_flux"], idle.BiasValues.Keys);
    }

    [Fact]
    public void RemovingANodeOfTheCapacitanceMatrixIsRefusedWithTheReason()
    {
        var document = Load("capmatrix.toml");
        Assert.Same(document, document.Without("qb", out var error));
        Assert.Contains("[capacitance_matrix]", error!.Message);
        document.Without("nothing", out error);
        Assert.Contains("no element, coupler, bias, point or sweep 'nothing'", error!.Message);
    }

    [Fact]
    public void RenamingAnElementRewritesHeaderBetweenTargetsAndNothingElse()
    {
        var document = Load("pair.toml");
        var renamed = document.Renamed("qa", "qx", out var error);
        Assert.Null(error);
        string expected = document.ToText()
            .Replace("[elements.qa]", "[elements.qx]")
            .Replace("between = [\"qa\",", "between = [\"qx\",")
            .Replace("target = \"qa.flux\"", "target = \"qx.flux\"");
        Assert.Equal(expected, renamed.ToText());   // comments naming qa are left as written
        var reloaded = SaveAndReload(renamed);
        Assert.Equal(document.Device.GetParameter("qa.ec"), reloaded.Device.GetParameter("qx.ec"));
        Assert.Equal("qx.flux", reloaded.Bias("qa_flux")!.Target);
    }

    [Fact]
    public void RenamingANodeOfTheCapacitanceMatrixRenamesTheNodeToo()
    {
        var document = Load("capmatrix.toml");
        var reloaded = SaveAndReload(document.Renamed("qa", "q1", out var error));
        Assert.Null(error);
        Assert.Contains("nodes = [\"q1\", \"qb\", \"r\"]", reloaded.ToText());
        // E_C comes from the inverse matrix, so the same node must keep the same charging energy
        Assert.Equal(document.Device.GetParameter("qa.ec"), reloaded.Device.GetParameter("q1.ec"), 12);
    }

    [Fact]
    public void RenamingAnElementWithOperatorsRenamesItsOperatorsTable()
    {
        var reloaded = SaveAndReload(Load("defect.toml").Renamed("tls", "defect", out var error));
        Assert.Null(error);
        Assert.Contains("[elements.defect.operators]", reloaded.ToText());
        Assert.Equal("defect.energy_1", reloaded.Bias("tls_energy")!.Target);
        Assert.Contains(reloaded.Device.Couplers, c => c.Id == "q_tls" && c.ElementB == "defect");
    }

    [Fact]
    public void RenamingABiasRewritesPointKeysAndSweepPaths()
    {
        var document = Load("pair.toml");
        var renamed = document.Renamed("qc_flux", "coil", out var error);
        Assert.Null(error);
        string expected = document.ToText()
            .Replace("[biases.qc_flux]", "[biases.coil]")
            .Replace("\nqc_flux = ", "\ncoil = ")
            .Replace("vary = \"qc_flux\"", "vary = \"coil\"");
        Assert.Equal(expected, renamed.ToText());
        var reloaded = SaveAndReload(renamed);
        Assert.Equal("coil", reloaded.Sweeps.Single().Axes[0].Path);
        Assert.True(reloaded.Points.All(p => p.BiasValues.ContainsKey("coil")));
    }

    [Fact]
    public void RenamingFollowsLinkedPathsAndSecondAxes()
    {
        string text = File.ReadAllText(Path.Combine(RepositoryPaths.Devices, "pair.toml")) + """

            [sweeps.both]
            vary = "qa_flux"
            from = 0
            to = 0.5
            count = 11
            links = [{ path = "qb.flux", scale = -1, shift = 0.5 }]
            second = { vary = "qc.ec", from = "100 MHz", to = "140 MHz", count = 3 }
            """;
        var document = DeviceDocument.Parse(text, Path.Combine(_dir, "both.toml")).Document!;
        var qb = document.Renamed("qb", "q2", out var error);
        Assert.Null(error);
        Assert.Equal("q2.flux", qb.Sweeps.Single(s => s.Name == "both").Axes[0].Links[0].Path);
        var qc = qb.Renamed("qc", "c", out error);
        Assert.Null(error);
        Assert.Equal("c.ec", qc.Sweeps.Single(s => s.Name == "both").Axes[1].Path);
        Assert.Contains("sweep both", qc.AlsoRemoved("c"));
    }

    [Fact]
    public void RenameRefusesTakenAndBadIds()
    {
        var document = Load("pair.toml");
        Assert.Same(document, document.Renamed("qa", "qb", out var error));
        Assert.Contains("already used", error!.Message);
        document.Renamed("qa", "q a", out error);
        Assert.Contains("not a valid id", error!.Message);
        document.Renamed("qz", "qy", out error);
        Assert.Contains("'qz'", error!.Message);
    }

    [Fact]
    public void A_new_operating_point_goes_after_the_last_point_keeps_every_other_line_and_reads_back()
    {
        var document = Load("pair.toml");
        var added = document.WithPoint("gate", [("qc_flux", "0.7 mA"), ("qa_flux", "0.1")], out var error);
        Assert.Null(error);
        AssertKeptInOrder(document.Text, added.Text);
        var point = Assert.Single(added.Points, p => p.Name == "gate");
        Assert.Equal(0.7e-3, point.BiasValues["qc_flux"], 15);
        Assert.Equal(0.1, point.BiasValues["qa_flux"], 15);
        // after [points.coupler_low], before the sweeps
        Assert.True(added.Text.IndexOf("[points.gate]", StringComparison.Ordinal) > added.Text.IndexOf("[points.coupler_low]", StringComparison.Ordinal));
        Assert.True(added.Text.IndexOf("[points.gate]", StringComparison.Ordinal) < added.Text.IndexOf("[sweeps.", StringComparison.Ordinal));
        Assert.Equal(0.7e-3, SaveAndReload(added).Points.Single(p => p.Name == "gate").BiasValues["qc_flux"], 15);
    }

    [Theory]
    [InlineData("idle", "qc_flux", "0.7 mA", "already used")]
    [InlineData("2bad", "qc_flux", "0.7 mA", "not a valid id")]
    [InlineData("gate", "qz_flux", "0.7 mA", "no bias 'qz_flux'")]
    [InlineData("gate", "qc_flux", "5 GHz", "points.gate.qc_flux")]
    public void A_bad_operating_point_is_refused_with_the_field_named_and_the_document_unchanged(string name, string bias, string value, string expected)
    {
        var document = Load("pair.toml");
        var result = document.WithPoint(name, [(bias, value)], out var error);
        Assert.NotNull(error);
        Assert.Contains(expected, error!.Field + " " + error.Message);
        Assert.Same(document, result);
    }

    [Fact]
    public void The_model_text_ignores_points_sweeps_and_the_spread_study_but_not_a_value_of_the_device()
    {
        var document = Load("pair.toml");
        var withPoint = document.WithPoint("gate", [("qc_flux", "0.7 mA")], out var error);
        Assert.Null(error);
        Assert.Equal(document.ModelText(), withPoint.ModelText());
        Assert.DoesNotContain("[points.", document.ModelText());
        Assert.DoesNotContain("[sweeps.", document.ModelText());
        Assert.Contains("[biases.qc_flux]", document.ModelText());
        var moved = document.WithValue("points.idle.qc_flux", "0.2 mA", out error);
        Assert.Null(error);
        Assert.Equal(document.ModelText(), moved.ModelText());
        var edited = document.WithValue("elements.qa.ec", "220 MHz", out error);
        Assert.Null(error);
        Assert.NotEqual(document.ModelText(), edited.ModelText());
        var biased = document.WithValue("biases.qc_flux.value", "0.2 mA", out error);
        Assert.Null(error);
        Assert.NotEqual(document.ModelText(), biased.ModelText());
    }
}
