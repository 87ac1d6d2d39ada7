using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Ui.Compute;

/// <summary>A sweep the user asked for: its text (to offer again) and its axes (resolved by DeviceDocument.Resolve).</summary>
public sealed record SweepRequest(string Text, IReadOnlyList<SweepAxis> Axes);
