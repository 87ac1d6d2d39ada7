namespace LevelDesign.Ui.Compute;

/// <summary>Two labelled levels at their closest along a sweep: the gap (GHz), where, and which labels.</summary>
public sealed record NearApproach(string LabelA, string LabelB, double GapGHz, int PointIndex, double AxisValue, double FrequencyGHz);
