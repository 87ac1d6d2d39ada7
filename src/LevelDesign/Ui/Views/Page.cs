namespace LevelDesign.Ui.Views;

/// <summary>The pages of the right-hand side; F3 cycles the first eight.</summary>
public enum Page
{
    States,
    Shifts,
    Spectrum,
    Crossings,
    Quantities,
    Matrix,
    Compare,
    Map,
    Help,
    Errors,
}
