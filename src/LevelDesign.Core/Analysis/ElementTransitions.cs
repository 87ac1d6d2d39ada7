namespace LevelDesign.Core.Analysis;

/// <summary>
/// One element's dressed transitions with every other element in its ground state, in GHz:
/// f01 = E(1) − E(0), f12 = E(2) − E(1), anharmonicity α = f12 − f01, Lamb shift = dressed f01 − bare f01.
/// NaN where a level is not kept or not among the computed dressed states.
/// </summary>
public sealed record ElementTransitions(
    string ElementId,
    double BareF01,
    double DressedF01,
    double BareF12,
    double DressedF12,
    double Anharmonicity,
    double LambShift);
