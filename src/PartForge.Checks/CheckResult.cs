namespace PartForge.Checks;

/// <summary>
/// The result of one check. <see cref="Margin"/> is signed so that positive means "on the good side of the
/// limit" whatever the direction of the check: value - limit for a minimum (a clearance), limit - value for a
/// maximum (a stress). <see cref="Message"/> says what was found and, unless the check passes, the change
/// that fixes it, computed by solving for the limiting value.
/// </summary>
public sealed record CheckResult
{
    /// <summary>Stable identifier, one of <see cref="CheckIds"/>.</summary>
    public required string Id { get; init; }

    /// <summary>Part name from the contract (rotor, rotor-front, stator, former, ...), or "machine".</summary>
    public required string Part { get; init; }

    public required CheckStatus Status { get; init; }
    public required double Value { get; init; }
    public required double Limit { get; init; }

    /// <summary>Unit of Value, Limit and Margin: "mm", "MPa", "N", "A/mm2", "C", "1" (a ratio).</summary>
    public required string Unit { get; init; }

    public required double Margin { get; init; }
    public required string Message { get; init; }

    /// <summary>Where the limiting value occurs, when that is meaningful.</summary>
    public CheckLocation? Where { get; init; }

    /// <summary>Published source or stated assumption behind the check, for the report.</summary>
    public string? Basis { get; init; }

    /// <summary>Status as the results document spells it: pass, warn, fail.</summary>
    public string StatusText => Status switch { CheckStatus.Pass => "pass", CheckStatus.Warn => "warn", _ => "fail" };
}
