using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

public class QuantityExpressionTests
{
    private static readonly Dictionary<string, double> Values = new()
    {
        ["qa.f01"] = 5.6, ["qb.f01"] = 4.9, ["q-1.f01"] = 4.0, ["zz:qa:qb"] = -5e-5,
    };

    private static readonly Dictionary<string, double> Purities = new()
    {
        ["qa.f01"] = 0.98, ["qb.f01"] = 0.95, ["q-1.f01"] = 0.99, ["zz:qa:qb"] = 0.6,
    };

    [Theory]
    [InlineData("qa.f01", 5.6)]
    [InlineData("qa.f01 - qb.f01", 0.7)]
    [InlineData("qa.f01 + qb.f01", 10.5)]
    [InlineData("-qa.f01 + 2*qb.f01", 4.2)]
    [InlineData("qa.f01 - q-1.f01", 1.6)]
    [InlineData("qa.f01 -q-1.f01", 1.6)]
    [InlineData("0.5*qa.f01 - 0.5*qb.f01", 0.35)]
    public void Sums_and_differences_of_named_quantities(string text, double expected)
    {
        var e = QuantityExpression.Parse(text, Values.Keys, out string? error);
        Assert.True(e is not null, error);
        Assert.Equal(expected, e!.Value(Values), 12);
        Assert.Equal(expected, QuantityLookup.Value(Values, e.ToString()), 12);
    }

    [Fact]
    public void Purity_is_the_lowest_of_the_terms()
    {
        Assert.Equal(0.95, QuantityLookup.Purity(Purities, "qa.f01 - qb.f01"));
        Assert.Equal(0.6, QuantityLookup.Purity(Purities, "zz:qa:qb + qa.f01"));
    }

    [Theory]
    [InlineData("qa.f01 - qc.f01", "no quantity 'qc.f01'")]
    [InlineData("x*qa.f01", "a factor is a plain number")]
    [InlineData("qa.f01 qb.f01", "joined by ' + ' or ' - '")]
    [InlineData("", "no quantity given")]
    public void Bad_expressions_are_refused_with_the_reason(string text, string reason)
    {
        Assert.Null(QuantityExpression.Parse(text, Values.Keys, out string? error));
        Assert.Contains(reason, error);
    }

    [Fact]
    public void Canonical_text_reads_back_the_same()
    {
        var e = QuantityExpression.Parse("  -qa.f01+ 2*qb.f01 ", Values.Keys, out _)!;
        Assert.Equal("-qa.f01 + 2*qb.f01", e.ToString());
    }
}
