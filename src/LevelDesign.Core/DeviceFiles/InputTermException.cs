namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A term typed by the user (a setting, a fit parameter with bounds, a target) that cannot be read; the message names
/// the term and what to write. The command line prefixes its option (--param, --target), the UI shows it as it is.
/// </summary>
public sealed class InputTermException(string message) : Exception(message);
