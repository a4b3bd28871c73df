namespace PartForge.Design.Loading;

/// <summary>Either a validated design or every error found (never both).</summary>
public sealed class DesignLoadResult
{
    private DesignLoadResult(Model.Design? design, Machines.MachineModel? machine, IReadOnlyList<DesignError> errors)
    {
        Design = design;
        Machine = machine;
        Errors = errors;
    }

    /// <summary>The design file as written, every default filled; null when there are errors. Only the loader's
    /// own tools (template, overrides) read it: every stage reads <see cref="Machine"/>.</summary>
    public Model.Design? Design { get; }

    /// <summary>The machine the design describes, resolved and typed; null when there are errors.</summary>
    public Machines.MachineModel? Machine { get; }

    /// <summary>Every problem found, in file order; empty on success.</summary>
    public IReadOnlyList<DesignError> Errors { get; }

    public bool Success => Machine != null;

    internal static DesignLoadResult Ok(Model.Design design, Machines.MachineModel machine) => new(design, machine, []);

    internal static DesignLoadResult Failed(IReadOnlyList<DesignError> errors) =>
        new(null, null, errors.OrderBy(e => e.Line == 0 ? int.MaxValue : e.Line).ThenBy(e => e.Column).ToArray());
}
