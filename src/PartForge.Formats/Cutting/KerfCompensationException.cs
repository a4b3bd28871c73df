namespace PartForge.Formats.Cutting;

/// <summary>
/// A through cut cannot be compensated for the kerf (a hole or a feature is smaller than the kerf), or
/// the sheet itself is malformed. The message names the part and the contour.
/// </summary>
public sealed class KerfCompensationException : Exception
{
    public KerfCompensationException(string message) : base(message) { }

    public KerfCompensationException(string message, Exception inner) : base(message, inner) { }
}
