namespace PartForge.Dynamics.Engine;

/// <summary>An autonomous system y' = f(y).</summary>
internal interface IRightHandSide
{
    void Evaluate(ReadOnlySpan<double> y, Span<double> dydt);
}
