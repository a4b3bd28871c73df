namespace PartForge.Design.Model;

/// <summary>
/// The key's text is used as the first part of every output file name (<c>NAME.3mf</c>, <c>NAME-rotor.stl</c>),
/// so it is refused when it is longer than <see cref="MaxLength"/> characters (longer names would have to be
/// cut, and two designs that differ only after the cut would overwrite each other's files) or when it is one
/// of the names Windows keeps for devices (<see cref="ReservedNames"/>, in any case): <c>con.3mf</c> cannot be
/// created there. Only the exact names are refused: Windows reserves a device name alone or followed by an
/// extension, and every other output is <c>NAME-part.ext</c> (<c>con-rotor.stl</c> is an ordinary file), so
/// <c>con-bench</c> is allowed.
/// </summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class OutputNameAttribute : Attribute
{
    /// <summary>Longest name accepted, characters.</summary>
    public const int MaxLength = 64;

    /// <summary>
    /// Device names Windows reserves (from memory of its file-naming rules: CON, PRN, AUX, NUL, COM0-COM9 and
    /// LPT0-LPT9; the digit 0 forms are listed in its newer documentation and refused here too).
    /// </summary>
    public static IReadOnlyList<string> ReservedNames { get; } =
        new[] { "con", "prn", "aux", "nul" }
            .Concat(Enumerable.Range(0, 10).Select(i => "com" + (char)('0' + i)))
            .Concat(Enumerable.Range(0, 10).Select(i => "lpt" + (char)('0' + i)))
            .ToArray();

    /// <summary>True when the text is a reserved device name (any case).</summary>
    public static bool IsReserved(string text) => ReservedNames.Contains(text, StringComparer.OrdinalIgnoreCase);
}
