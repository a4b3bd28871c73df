using PartForge.Design.Parts;

namespace PartForge.Checks;

/// <summary>
/// The result of one check. <see cref="Margin"/> is signed so that positive means "on the good side of the
/// limit" whatever the direction of the check: value - limit for a minimum (a clearance), limit - value for a
/// maximum (a stress). <see cref="Message"/> says what was found and, unless the check passes, the change
/// that fixes it, computed by solving for the limiting value. A result is keyed by (id, part, counterpart):
/// no two results of one report share all three.
/// </summary>
public sealed record CheckResult
{
    /// <summary>Stable identifier, one of <see cref="CheckIds"/>.</summary>
    public required string Id { get; init; }

    /// <summary>The part the check is about; null for the machine as a whole.</summary>
    public required PartId? Part { get; init; }

    /// <summary>The other part of a pair (the stator facing a rotor, the stationary part a rotating one passes); null when there is none.</summary>
    public PartId? Counterpart { get; init; }

    /// <summary>The part's contract name, or "machine".</summary>
    public string PartName => Part?.Name ?? MachineName;

    /// <summary>The counterpart's contract name, or null.</summary>
    public string? CounterpartName => Counterpart?.Name;

    /// <summary>What a machine-level result names as its part.</summary>
    public const string MachineName = "machine";

    public required CheckStatus Status { get; init; }
    public required double Value { get; init; }
    public required double Limit { get; init; }

    /// <summary>Unit of Value, Limit and Margin: "mm", "MPa", "N", "A/mm2", "C", "1" (a ratio).</summary>
    public required string Unit { get; init; }

    public required double Margin { get; init; }

    /// <summary>
    /// False for a finding with no number (a diagnostic that states a fact, a part that could not be made): its
    /// value, limit and margin are 0 and mean nothing, and the terminal, the report and the results say so.
    /// </summary>
    public bool Measured { get; init; } = true;
    public required string Message { get; init; }

    /// <summary>Where the limiting value occurs, when that is meaningful.</summary>
    public CheckLocation? Where { get; init; }

    /// <summary>Published source or stated assumption behind the check, for the report.</summary>
    public string? Basis { get; init; }

    /// <summary>Status as the results document spells it: pass, warn, fail.</summary>
    public string StatusText => Status switch { CheckStatus.Pass => "pass", CheckStatus.Warn => "warn", _ => "fail" };
}
