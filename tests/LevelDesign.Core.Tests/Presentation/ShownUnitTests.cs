using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Presentation;

public class ShownUnitTests
{
    [Theory]
    [InlineData("0.15 mA", UnitKind.Current, "mA", 1e-3)]
    [InlineData("150uA", UnitKind.Current, "µA", 1e-6)]
    [InlineData("2.1 V", UnitKind.Voltage, "V", 1)]
    [InlineData("5.6 GHz", UnitKind.Frequency, "GHz", 1)]
    [InlineData("210 MHz", UnitKind.Frequency, "MHz", 1e-3)]
    [InlineData("85 fF", UnitKind.Capacitance, "fF", 1e-15)]
    public void The_unit_is_the_one_written_after_the_number(string text, UnitKind kind, string symbol, double basePerUnit)
    {
        var unit = ShownUnit.FromText(text, kind)!;
        Assert.Equal(symbol, unit.Symbol);
        Assert.Equal(basePerUnit, unit.BasePerUnit, basePerUnit * 1e-12);
    }

    [Theory]
    [InlineData("0.3", UnitKind.Current)]        // plain number: no unit written
    [InlineData("0.15 mA", UnitKind.Voltage)]    // a unit of another kind is not taken
    [InlineData("", UnitKind.Current)]
    public void No_unit_when_none_of_the_kind_is_written(string text, UnitKind kind) => Assert.Null(ShownUnit.FromText(text, kind));

    [Fact]
    public void A_coil_current_is_shown_in_the_files_unit_everywhere()
    {
        var document = DeviceDocument.Demo();   // qc_flux value = "0.15 mA"
        var unit = ShownUnit.Of(document, "qc_flux");
        Assert.Equal("mA", unit.Symbol);
        Assert.Equal(0.15, unit.ToShown(0.00015));           // exactly, not 0.15000000000000002
        Assert.Equal("0.68731 mA", unit.Text(0.00068731009));
        Assert.Equal("0.06269 mA", unit.Text(6.269e-05));
        Assert.Equal("qc_flux (mA)", unit.Caption("qc_flux"));
        Assert.Equal("Φ0", ShownUnit.Of(document, "qa_flux").Symbol);   // a plain-number flux control is in Φ0
        Assert.Equal("Φ0", ShownUnit.Of(document, "qc.flux").Symbol);
        Assert.Equal("GHz", ShownUnit.Of(document, "ra.frequency").Symbol);
    }
}
