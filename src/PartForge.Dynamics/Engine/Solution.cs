namespace PartForge.Dynamics.Engine;

/// <summary>Everything the circuits' equations give at one state in one mode (scratch, reused).</summary>
internal sealed class Solution
{
    public readonly double[] Slope, Emf, Current, PortV, U;
    public double Omega, SourceV, BusV, BusI, StarV, Torque;
    public double PSource, PSeries, PCopper, PSwitch, PDiode, PLoad;
    public int StarActive;

    public Solution(int n)
    {
        Slope = new double[n];
        Emf = new double[n];
        Current = new double[n];
        PortV = new double[n];
        U = new double[n];
    }
}
