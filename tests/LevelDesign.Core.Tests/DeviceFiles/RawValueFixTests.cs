using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Core.Tests.DeviceFiles;

public class RawValueFixTests
{
    private const string Text = "[elements.qa]\nec = \"92 fF\"   # a comment\nasymmetry = 1.5\nbetween = [\"qa\", \"r\"]\n";

    [Fact]
    public void A_quoted_value_is_replaced_and_stays_quoted_keeping_the_comment()
    {
        string? fixedText = RawValueFix.Replace(Text, 2, 6, "210 MHz", out _);
        Assert.Equal(Text.Replace("\"92 fF\"", "\"210 MHz\""), fixedText);
        Assert.Equal("92 fF", RawValueFix.ValueAt(Text, 2, 6));
    }

    [Fact]
    public void A_bare_number_stays_bare_and_text_with_a_unit_gets_quotes()
    {
        Assert.Equal(Text.Replace("1.5", "0.3"), RawValueFix.Replace(Text, 3, 13, "0.3", out _));
        Assert.Equal(Text.Replace("asymmetry = 1.5", "asymmetry = \"30 %\""), RawValueFix.Replace(Text, 3, 13, "30 %", out _));
    }

    [Fact]
    public void An_array_element_is_replaced_alone()
    {
        Assert.Equal(Text.Replace("[\"qa\", \"r\"]", "[\"qb\", \"r\"]"), RawValueFix.Replace(Text, 4, 12, "qb", out _));
    }

    [Fact]
    public void A_place_without_a_value_is_refused()
    {
        Assert.Null(RawValueFix.Replace(Text, 40, 1, "1", out string? problem));
        Assert.Contains("no value", problem);
    }
}
