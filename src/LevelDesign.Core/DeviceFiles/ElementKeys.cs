using LevelDesign.Core.Elements;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>The keys each element kind accepts in a device file.</summary>
public static class ElementKeys
{
    private static readonly string[] Common = ["kind", "levels"];

    public static IReadOnlyList<string> For(ElementKind kind) => kind switch
    {
        ElementKind.Transmon => [.. Common, "basis_size", "ec", "capacitance", "ej", "ic", "rn", "ng"],
        ElementKind.TunableTransmon => [.. Common, "basis_size", "ec", "capacitance", "ej_sum", "asymmetry", "ej1", "ej2", "ic1", "ic2", "rn1", "rn2", "flux", "ng"],
        ElementKind.Fluxonium => [.. Common, "basis_size", "ec", "capacitance", "ej", "ic", "rn", "el", "inductance", "flux"],
        ElementKind.KerrOscillator => [.. Common, "frequency", "anharmonicity", "ec", "capacitance"],
        ElementKind.Resonator => [.. Common, "frequency", "kappa", "ec", "capacitance"],
        ElementKind.LevelList => [.. Common, "energies", "hamiltonian", "operators", "overlap"],
        _ => Common,
    };
}
