namespace PartForge.Design.Loading;

/// <summary>Either a validated design or every error found (never both).</summary>
public sealed class DesignLoadResult
{
    private DesignLoadResult(Model.Design? design, IReadOnlyList<DesignError> errors)
    {
        Design = design;
        Errors = errors;
    }

    /// <summary>The design, with every default filled and every derived key resolved; null when there are errors.</summary>
    public Model.Design? Design { get; }

    /// <summary>Every problem found, in file order; empty on success.</summary>
    public IReadOnlyList<DesignError> Errors { get; }

    public bool Success => Design != null;

    internal static DesignLoadResult Ok(Model.Design design) => new(design, []);

    internal static DesignLoadResult Failed(IReadOnlyList<DesignError> errors) =>
        new(null, errors.OrderBy(e => e.Line == 0 ? int.MaxValue : e.Line).ThenBy(e => e.Column).ToArray());
}
