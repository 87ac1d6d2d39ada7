using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Tests.Ui;

/// <summary>The map page's grid, without a screen: every point in its cell whatever order the sweep returned.</summary>
public class MapGridTests
{
    private static async Task<SweepResult> FluxByResonator()
    {
        var device = Support.QubitAndResonator.Build();
        SweepAxis x = new("q.flux", 0, 0.5, 5, []), y = new("r.frequency", 5.0, 6.0, 3, []);
        return await SweepRunner.RunAsync(ParameterResolver.ForPaths(device, [x, y]), new SweepPlan([x, y], Levels: 6));
    }

    [Fact]
    public async Task Each_point_lands_in_the_cell_of_its_axis_values_with_its_own_value_and_hybridized_flag()
    {
        var sweep = await FluxByResonator();
        var grid = MapGrid.From(sweep, "q.f01", purityThreshold: 0.9);
        Assert.Equal((5, 3), (grid.Values.GetLength(0), grid.Values.GetLength(1)));
        for (int i = 0; i < 5; i++)
            for (int j = 0; j < 3; j++)
            {
                int k = grid.PointAt(i, j);
                Assert.True(k >= 0, $"no point at ({i}, {j})");
                var p = sweep.Points[k];
                Assert.Equal(MapGrid.ValueAt(grid.X, i), p.AxisValues[0], 12);
                Assert.Equal(MapGrid.ValueAt(grid.Y, j), p.AxisValues[1], 12);
                Assert.Equal(p.Quantities["q.f01"], grid.Values[i, j]);
                Assert.Equal(p.QuantityPurities["q.f01"] < 0.9, grid.Hybridized[i, j]);
            }
        // f01 falls with flux (the SQUID's E_J drops towards half a flux quantum) at every resonator frequency
        for (int j = 0; j < 3; j++) Assert.True(grid.Values[0, j] > grid.Values[4, j]);
        Assert.Equal("q.f01", MapGrid.DefaultQuantity(sweep));   // no ZZ on one qubit
    }

    [Fact]
    public void Axis_values_map_back_to_their_steps_and_out_of_range_values_clamp()
    {
        var axis = new SweepAxis("a", 0.15e-3, 1e-3, 18, []);
        for (int k = 0; k < axis.Count; k++) Assert.Equal(k, MapGrid.IndexOn(axis, MapGrid.ValueAt(axis, k)));
        Assert.Equal(0, MapGrid.IndexOn(axis, -1));
        Assert.Equal(17, MapGrid.IndexOn(axis, 1));
    }
}
