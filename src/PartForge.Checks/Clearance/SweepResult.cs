namespace PartForge.Checks.Clearance;

/// <summary>
/// The minimum clearance found by the rotation sweep.
/// </summary>
/// <param name="ClearanceMm">Minimum 3D distance between a rotating and a stationary prism; negative when two
/// prisms interfere: then minus the axial shift that would separate them (the smaller of the two ways out).</param>
/// <param name="AngleDeg">Rotor angle at which it occurs (first such angle), degrees.</param>
/// <param name="Rotating">The rotating prism involved (null when the scene has none).</param>
/// <param name="Stationary">The stationary prism involved.</param>
/// <param name="AxialMm">Axial component of the shortest connection (0 when the z-ranges overlap).</param>
/// <param name="PlanarMm">In-plane component (0 when the projections overlap).</param>
/// <param name="StepDeg">Coarse angular step used.</param>
/// <param name="Evaluations">Number of angles evaluated (coarse and refinement).</param>
public sealed record SweepResult(double ClearanceMm, double AngleDeg, SweepPrism? Rotating, SweepPrism? Stationary,
    double AxialMm, double PlanarMm, double StepDeg, int Evaluations)
{
    public bool Interference => ClearanceMm < 0;
}
