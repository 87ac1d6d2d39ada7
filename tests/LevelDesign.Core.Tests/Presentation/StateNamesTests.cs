using LevelDesign.Core.Presentation;

namespace LevelDesign.Core.Tests.Presentation;

public class StateNamesTests
{
    [Fact]
    public void Ids_ending_in_a_digit_take_a_separator_so_levels_cannot_be_misread()
    {
        string[] line = ["q0", "q1", "q2", "c1", "r2"];
        Assert.Equal("q2:1 c1:1", StateNames.Of(line, [0, 0, 1, 1, 0]));
        Assert.Equal("q1:12", StateNames.Of(line, [0, 12, 0, 0, 0]));
        Assert.NotEqual(StateNames.Of(line, [0, 0, 1, 0, 0]), StateNames.Of(["q0", "q", "q2"], [0, 21, 0]));
    }

    [Fact]
    public void Letter_ids_read_as_before_and_all_zero_is_ground()
    {
        string[] pair = ["qa", "qb", "qc", "ra", "rb"];
        Assert.Equal("qa1 ra1", StateNames.Of(pair, [1, 0, 0, 1, 0]));
        Assert.Equal("ground", StateNames.Of(pair, [0, 0, 0, 0, 0]));
    }
}
