namespace LevelDesign.Core.Model;

/// <summary>Parameter paths are "owner.parameter", e.g. "qa.flux" or "g_qa_ra.coefficient".</summary>
public static class ParameterPath
{
    public static (string Owner, string Name) Split(string path)
    {
        int dot = path.LastIndexOf('.');
        if (dot <= 0 || dot == path.Length - 1)
            throw new ArgumentException($"'{path}' is not a parameter path; write owner.parameter, e.g. qa.flux");
        return (path[..dot], path[(dot + 1)..]);
    }
}
