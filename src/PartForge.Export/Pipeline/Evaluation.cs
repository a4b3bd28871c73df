using PartForge.Checks;
using PartForge.Electrical;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// A design carried through the computing stages: electrical results, parts (null when the coil could not be
/// resolved, so nothing can be built) and every check.
/// </summary>
public sealed record Evaluation(Design.Model.Design Design, ElectricalResult Electrical, PartSet? Parts, CheckReport Checks);
