namespace PartForge.Electrical.Flux;

/// <summary>
/// How finely the flux linkage is integrated. The defaults are converged to better than 0.1 % on the
/// fundamental (checked in the tests against a run with every order doubled), not in the hot path.
/// </summary>
/// <param name="RadialOrder">Gauss-Legendre order on each radial piece between breakpoints (coil edges, window edges, magnet edges).</param>
/// <param name="AngularOrder">Gauss-Legendre order over the winding's angular extent at each radius.</param>
/// <param name="AxialOrder">Gauss-Legendre order across the winding height.</param>
/// <param name="SamplesPerPeriod">Rotor positions per electrical period (a multiple of 4; harmonics up to half of it are resolved).</param>
/// <param name="FarFactor">Magnets farther than this many magnet sizes are replaced by dipoles (0: never).</param>
/// <param name="MaxPieceGaps">Radial pieces are split to be no longer than this many magnetic gaps (the field's length scale near magnet edges).</param>
public sealed record FluxQuadrature(int RadialOrder = 5, int AngularOrder = 12, int AxialOrder = 3, int SamplesPerPeriod = 72, double FarFactor = 2.5, double MaxPieceGaps = 6.0)
{
    public static FluxQuadrature Default { get; } = new();

    /// <summary>Every order doubled and no dipole substitution: the reference for convergence tests.</summary>
    public static FluxQuadrature Fine { get; } = new(12, 32, 8, 144, 0, 2.0);
}
