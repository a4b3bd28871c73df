namespace PartForge.Cli.Sweep;

/// <summary>Evaluates one loaded machine variant (electrical results and checks, no export). Must be thread-safe.</summary>
public interface ISweepEvaluator
{
    SweepOutcome Evaluate(Design.Machines.MachineModel design);
}
