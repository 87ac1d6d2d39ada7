namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign fit</c>, as typed.</summary>
public sealed record FitArguments : DeviceArguments
{
    /// <summary>--param: the parameters to fit, PATH[=LOW:HIGH].</summary>
    public string[]? Parameters { get; init; }

    /// <summary>--target: QUANTITY=VALUE[@POINT or @BIAS=V].</summary>
    public string[]? Targets { get; init; }

    /// <summary>--write: put the fitted values back into the file.</summary>
    public bool Write { get; init; }

    /// <summary>--levels: dressed states solved at each evaluation.</summary>
    public int? Levels { get; init; }

    /// <summary>--json: the fit as JSON.</summary>
    public bool Json { get; init; }
}
