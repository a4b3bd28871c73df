namespace PartForge.Electrical.Switching;

/// <summary>One term of a circuit's flux linkage: lambda(theta) += CosWb cos(Order theta) + SinWb sin(Order theta),
/// theta the mechanical rotor angle, Order a mechanical order (electrical order x field periods).</summary>
public readonly record struct FluxTerm(int Order, double CosWb, double SinWb);

/// <summary>The flux linkage of one circuit (a phase, every coil in it with its direction) against the rotor angle.</summary>
/// <param name="Phase">'A', 'B' or 'C'.</param>
/// <param name="Terms">Its harmonics (the steady part of same-pole magnets makes no EMF and is left out).</param>
public sealed record PhaseFlux(char Phase, IReadOnlyList<FluxTerm> Terms)
{
    /// <summary>lambda at a mechanical angle, Wb-turns (without the steady part).</summary>
    public double At(double thetaRad)
    {
        double s = 0;
        foreach (var t in Terms) s += t.CosWb * Math.Cos(t.Order * thetaRad) + t.SinWb * Math.Sin(t.Order * thetaRad);
        return s;
    }

    /// <summary>d lambda / d theta, Wb-turns per mechanical radian: the EMF per unit speed and the torque per ampere.</summary>
    public double Derivative(double thetaRad)
    {
        double s = 0;
        foreach (var t in Terms) s += t.Order * (-t.CosWb * Math.Sin(t.Order * thetaRad) + t.SinWb * Math.Cos(t.Order * thetaRad));
        return s;
    }
}
