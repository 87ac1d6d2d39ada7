namespace LevelDesign.Core.Analysis;

/// <summary>One reported quantity at the device's truncation and with every cutoff raised.</summary>
public sealed record ConvergenceEntry(string Quantity, double Value, double RaisedValue, bool Flagged)
{
    public double Change => RaisedValue - Value;
}
