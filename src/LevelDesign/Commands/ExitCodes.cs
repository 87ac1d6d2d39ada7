namespace LevelDesign.Commands;

/// <summary>Process exit codes, as documented in README.md.</summary>
public static class ExitCodes
{
    public const int Ok = 0;
    public const int InvalidInput = 2;
    public const int ComputationFailed = 3;
    public const int Cancelled = 130;
}
