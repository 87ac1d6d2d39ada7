using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Text;

/// <summary>Why a background computation failed, in one line for the status line.</summary>
public static class ProblemText
{
    public static string Describe(Exception e) => e switch
    {
        InvalidDeviceException invalid => "the device is not valid: " + string.Join("; ", invalid.Problems),
        AggregateException { InnerException: { } inner } => Describe(inner),
        _ => e.Message,
    };
}
