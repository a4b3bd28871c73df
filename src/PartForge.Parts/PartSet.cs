using PartForge.Design.Parts;
using PartForge.Design.Stack;

namespace PartForge.Parts;

/// <summary>Every distinct part of a design, with the stack-up they were placed from and the builders' diagnostics.</summary>
public sealed record PartSet
{
    /// <summary>Distinct parts in a fixed order: rotors, back iron, former, stators, spacer.</summary>
    public required IReadOnlyList<PartModel> Parts { get; init; }

    /// <summary>The nominal axial stack-up the parts were placed from.</summary>
    public required AxialStack Stack { get; init; }

    /// <summary>Notes and errors (errors: the design asks for something the parts cannot be).</summary>
    public required IReadOnlyList<PartDiagnostic> Diagnostics { get; init; }

    /// <summary>Explode distance of the assembly view, mm (<c>assembly.explode</c>).</summary>
    public required double ExplodeMm { get; init; }

    public bool HasErrors => Diagnostics.Any(x => x.Severity == DiagnosticSeverity.Error);

    /// <summary>The part, or null.</summary>
    public PartModel? Find(PartId id) => Parts.FirstOrDefault(p => p.Id == id);

    /// <summary>The part (throws if absent).</summary>
    public PartModel Get(PartId id) => Find(id) ?? throw new KeyNotFoundException($"no part '{id.Name}'");

    /// <summary>The parts of one role, in part order.</summary>
    public IEnumerable<PartModel> OfRole(PartRole role) => Parts.Where(p => p.Role == role);
}
