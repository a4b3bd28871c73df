using PartForge.Design.Machines;
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
    private readonly System.Collections.Concurrent.ConcurrentDictionary<string, (PartModel[] Parts, Fabrication.PrintPlates Plates)> _plates = new();

    /// <summary>
    /// The print plates of some of these parts on a printer (<see cref="Fabrication.PrintPlates.Of"/>), laid out once
    /// per set of parts and printer and kept: a build's plan, its 3MF files and its report share one layout.
    /// </summary>
    public Fabrication.PrintPlates PlatesOf(IEnumerable<PartModel> printed, PrinterSpec printer, PartForge.Geometry.Precision precision)
    {
        var list = printed.ToArray();
        string key = string.Join(",", list.Select(p => p.Name)) + "|" + printer + "|" + precision;
        var hit = _plates.GetOrAdd(key, _ => (list, Fabrication.PrintPlates.Of(list, printer, precision)));
        // The same part objects (a copy of the set made with `with` shares this table, not necessarily its parts).
        return hit.Parts.SequenceEqual(list, ReferenceEqualityComparer.Instance) ? hit.Plates : Fabrication.PrintPlates.Of(list, printer, precision);
    }

    public PartModel? Find(PartId id) => Parts.FirstOrDefault(p => p.Id == id);

    /// <summary>The part (throws if absent).</summary>
    public PartModel Get(PartId id) => Find(id) ?? throw new KeyNotFoundException($"no part '{id.Name}'");

    /// <summary>The parts of one role, in part order.</summary>
    public IEnumerable<PartModel> OfRole(PartRole role) => Parts.Where(p => p.Role == role);
}
