using System.CommandLine;

namespace LevelDesign.Commands;

/// <summary>Options shared by several commands.</summary>
public static class CommonOptions
{
    public static Argument<string> File() => new("FILE") { Description = "device file (TOML, see docs/device-format.md)" };

    public static Option<string[]> At() => new("--at")
    {
        Description = "set a bias (control value, e.g. qa_flux=0.1 or qc_flux=0.6mA) or a parameter path (qa.ec=210MHz); repeatable",
        AllowMultipleArgumentsPerToken = false,
    };

    public static Option<string?> Point() => new("--point") { Description = "start from a named operating point of the file" };

    public static Option<bool> Json() => new("--json") { Description = "write JSON to stdout" };

    public static Option<bool> Csv() => new("--csv") { Description = "write CSV to stdout" };

    public static Option<bool> AllowLarge() => new("--allow-large")
    {
        Description = "compute even when the composite matrix is estimated not to fit in memory (same as allow_large = true in [truncation])",
    };

    /// <summary>--purity: one threshold shared with the terminal UI and the file's [device] purity_threshold.</summary>
    public static Option<double?> Purity(string what) => new("--purity")
    {
        Description = $"purity threshold: {what} (default: the file's [device] purity_threshold, else {Core.Analysis.Conventions.DefaultPurityThreshold})",
    };

    /// <summary>The threshold in force: the option if given (checked), else the file's.</summary>
    public static double PurityThreshold(double? option, Core.DeviceFiles.DeviceDocument document)
    {
        if (option is double p && !(p > 0 && p <= 1)) throw new UsageException($"--purity {p}: give a purity in (0, 1], e.g. 0.9");
        return option ?? document.PurityThreshold;
    }

    /// <summary>--levels means something different to each command, so each gives its own description.</summary>
    public static Option<int?> Levels(string description) => new("--levels") { Description = description };

    public static Option<string?> States() => new("--states")
    {
        Description = "which states to compute: auto (default), neighbours, excitations:N, below:ENERGY, or quantity names " +
            "(zz, chi2, zz:A:B, chi2:Q:R, Q.anharmonicity) separated by commas",
    };
}
