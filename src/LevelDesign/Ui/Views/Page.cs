namespace LevelDesign.Ui.Views;

/// <summary>The pages of the right-hand side; F3 cycles the first four.</summary>
public enum Page
{
    States,
    Shifts,
    Spectrum,
    Crossings,
    Quantities,
    Help,
    Errors,
}
