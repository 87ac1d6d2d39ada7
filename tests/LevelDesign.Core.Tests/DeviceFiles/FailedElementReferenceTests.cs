using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Core.Tests.DeviceFiles;

public class FailedElementReferenceTests
{
    /// <summary>An element that fails its own range check still exists for the couplers naming it: one error, not four.</summary>
    [Fact]
    public void A_coupler_to_an_element_with_errors_adds_no_error_of_its_own()
    {
        const string text = """
            [elements.qa]
            kind = "tunable_transmon"
            ec = "200 MHz"
            ej_sum = "20 GHz"
            asymmetry = 1.3

            [elements.qb]
            kind = "transmon"
            ec = "200 MHz"
            ej = "18 GHz"

            [couplers.qa_qb]
            kind = "capacitive"
            between = ["qa", "qb"]
            g = "5 MHz"
            """;
        var result = DeviceDocument.Parse(text, "t.toml");
        var error = Assert.Single(result.Errors);
        Assert.Equal(5, error.Line);
        Assert.Contains("asymmetry", error.Field);
    }
}
