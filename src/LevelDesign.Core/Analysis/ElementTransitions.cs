namespace LevelDesign.Core.Analysis;

/// <summary>
/// One element's dressed transitions with every other element in its ground state, in GHz:
/// f01 = E(1) − E(0), f12 = E(2) − E(1), anharmonicity α = f12 − f01, Lamb shift = dressed f01 − bare f01.
/// NaN where a level is not kept or not among the computed dressed states. F01Purity is the lowest purity of the
/// labelled states 0 and 1 (f01, Lamb shift), F12Purity of 0, 1 and 2 (f12, anharmonicity).
/// </summary>
public sealed record ElementTransitions(
    string ElementId,
    double BareF01,
    double DressedF01,
    double BareF12,
    double DressedF12,
    double Anharmonicity,
    double LambShift,
    double F01Purity = double.NaN,
    double F12Purity = double.NaN);
