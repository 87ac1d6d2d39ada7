namespace LevelDesign.Core.Spread.Export;

/// <summary>
/// What identifies a study, written at the top of every result and shard file and compared by the merge: the
/// program version, the device file (path, name and SHA-256 of its text), the eigensolver, seed and sample count,
/// and the rules as written. <see cref="NominalFigures"/> are the rule figures of the nominal device.
/// </summary>
public sealed record SpreadStudyHeader(string Version, string DevicePath, string DeviceName, string DeviceSha256, string Eigensolver,
    ulong Seed, int Samples, IReadOnlyList<(string Name, string Text)> Rules, IReadOnlyList<string> Parameters, IReadOnlyList<double> NominalFigures)
{
    /// <summary>The fields two shards of one study must share, as text (differences are named in the merge's message).</summary>
    public IEnumerable<(string Field, string Value)> Identity()
    {
        yield return ("version", Version);
        yield return ("device_sha256", DeviceSha256);
        yield return ("device", DeviceName);
        yield return ("eigensolver", Eigensolver);
        yield return ("seed", Seed.ToString(System.Globalization.CultureInfo.InvariantCulture));
        yield return ("samples", Samples.ToString(System.Globalization.CultureInfo.InvariantCulture));
        yield return ("rules", string.Join("; ", Rules.Select(r => $"{r.Name} = {r.Text}")));
        yield return ("parameters", string.Join(", ", Parameters));
    }
}
