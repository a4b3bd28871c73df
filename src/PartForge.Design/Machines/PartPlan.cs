using PartForge.Design.Parts;

namespace PartForge.Design.Machines;

/// <summary>
/// The process and material asked for each part role: <c>parts.&lt;key&gt;.material</c>, else the part's own
/// section (<c>rotor.material</c>, <c>stator.material</c>), else the role's default; the process as
/// <c>parts.&lt;key&gt;.process</c> names it, or null (then by material: filament printed, others cut).
/// </summary>
public sealed class PartPlan
{
    private readonly IReadOnlyDictionary<PartRole, PartChoice> _choices;

    public PartPlan(IReadOnlyDictionary<PartRole, PartChoice> choices) => _choices = choices;

    public PartChoice For(PartRole role) => _choices[role];
}
