namespace PartForge.Dynamics;

/// <summary>
/// The rotating part: J d omega/dt = T_em - Tf sign(omega) - b omega. At standstill the rotor sticks while the
/// electromagnetic torque is no larger than Tf (static friction taken equal to the Coulomb friction) and breaks
/// away in the direction of the torque once it is larger.
/// </summary>
/// <param name="InertiaKgM2">Moment of inertia J about the shaft, kg m^2 (more than 0).</param>
/// <param name="FrictionNm">Coulomb friction torque Tf, N m (0 or more), always against the motion.</param>
/// <param name="ViscousNmsPerRad">Viscous drag coefficient b, N m s/rad (0 or more).</param>
public sealed record RotorParameters(double InertiaKgM2, double FrictionNm, double ViscousNmsPerRad);
