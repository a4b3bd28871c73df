using System.Diagnostics.Contracts;

namespace PartForge.Dynamics;

/// <summary>
/// A circuit's flux linkage as a function of the mechanical rotor angle:
/// lambda(theta) = sum over terms of a cos(n theta) + b sin(n theta), Wb-turns. Immutable; compared by value.
/// </summary>
public sealed class FluxSeries : IEquatable<FluxSeries>
{
    private readonly FluxHarmonic[] _terms;

    /// <summary>A series from its terms (kept in the given order; repeated orders add).</summary>
    public FluxSeries(IEnumerable<FluxHarmonic> terms) => _terms = terms.ToArray();

    /// <summary>The terms, in the order given.</summary>
    public IReadOnlyList<FluxHarmonic> Terms => _terms;

    /// <summary>A single cosine: peak cos(order theta - phase).</summary>
    [Pure]
    public static FluxSeries Cosine(int order, double peakWb, double phaseRad = 0) =>
        new([new FluxHarmonic(order, peakWb * Math.Cos(phaseRad), peakWb * Math.Sin(phaseRad))]);

    /// <summary>A new series with one more term.</summary>
    [Pure]
    public FluxSeries With(FluxHarmonic term) => new(_terms.Append(term));

    /// <summary>lambda(theta), Wb-turns.</summary>
    [Pure]
    public double LinkageWb(double thetaRad)
    {
        double s = 0;
        foreach (var t in _terms)
        {
            var (sin, cos) = Math.SinCos(t.Order * thetaRad);
            s += t.CosWb * cos + t.SinWb * sin;
        }
        return s;
    }

    /// <summary>d lambda / d theta, Wb-turns per radian (volts per rad/s of speed).</summary>
    [Pure]
    public double SlopeWbPerRad(double thetaRad)
    {
        double s = 0;
        foreach (var t in _terms)
        {
            var (sin, cos) = Math.SinCos(t.Order * thetaRad);
            s += t.Order * (t.SinWb * cos - t.CosWb * sin);
        }
        return s;
    }

    /// <summary>An upper bound of |d lambda / d theta|: the sum of order x amplitude over the terms.</summary>
    [Pure]
    public double SlopeBoundWbPerRad() => _terms.Sum(t => Math.Abs(t.Order) * Math.Sqrt(t.CosWb * t.CosWb + t.SinWb * t.SinWb));

    public bool Equals(FluxSeries? other) => other is not null && _terms.AsSpan().SequenceEqual(other._terms);

    public override bool Equals(object? obj) => Equals(obj as FluxSeries);

    public override int GetHashCode()
    {
        var h = new HashCode();
        foreach (var t in _terms) h.Add(t);
        return h.ToHashCode();
    }
}
