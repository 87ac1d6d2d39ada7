namespace LevelDesign.Core.Sweeps;

/// <summary>A parameter the fit may move, by path (e.g. "qa.ej"), from Initial within [Lower, Upper].</summary>
public sealed record FitParameter(string Path, double Initial, double Lower, double Upper);
