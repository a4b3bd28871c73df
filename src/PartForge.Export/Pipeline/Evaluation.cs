using PartForge.Checks;
using PartForge.Design.Machines;
using PartForge.Electrical;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// A machine carried through the computing stages: electrical results, parts (null when the coil could not be
/// resolved, so nothing can be built) and every check.
/// </summary>
public sealed record Evaluation(MachineModel Machine, ElectricalResult Electrical, PartSet? Parts, CheckReport Checks);
