using PartForge.Checks.Inputs;
using PartForge.Checks.Rules;
using PartForge.Design.Machines;

namespace PartForge.Checks;

/// <summary>
/// Runs every check on a design, its electrical results and its parts, and returns the report. Never
/// throws for a loadable design: a check that cannot be evaluated fails with a message saying why.
/// </summary>
public static partial class CheckRunner
{
    public static CheckReport Run(MachineModel design, ElectricalFacts electrical, IReadOnlyList<PartView> parts, CheckOptions? options = null)
    {
        options ??= CheckOptions.Default;
        var c = new CheckContext(design, electrical, parts, options.SweepStepDeg);
        var results = new List<CheckResult>();
        Collect(results, "stack-up", () => GapRules.Run(c));
        Collect(results, "rotation sweep", () => SweepRules.Run(c));
        Collect(results, "printability", () => PrintRules.Run(c));
        Collect(results, "machine fit", () => MachineFitRules.Run(c));
        Collect(results, "winding", () => WindingRules.Run(c));
        Collect(results, "heat", () => HeatRules.Run(c));
        Collect(results, "coil placement", () => CoilPlacementRules.Run(c));
        Collect(results, "speed", () => SpeedRules.Run(c));
        Collect(results, "electrical", () => ElectricalRules.Run(c));
        Collect(results, "drive", () => DriveRules.Run(c));
        Collect(results, "storage", () => StorageRules.Run(c));
        Collect(results, "steel", () => IronRules.Run(c));
        Collect(results, "hardware", () => HardwareRules.Run(c));
        var joints = Hardware.FastenerPlanner.Plan(design, electrical, parts);
        var jacks = Hardware.JackingSet.From(electrical, parts);
        return new CheckReport(results) { Joints = joints, Jacks = jacks, Assembly = Hardware.AssemblyPlanner.Plan(design, electrical, parts, joints, jacks) };
    }

    private static void Collect(List<CheckResult> into, string group, Func<IEnumerable<CheckResult>> rule)
    {
        try
        {
            foreach (var r in rule()) into.Add(Sanitise(r));
        }
        catch (Exception ex) when (ex is ArgumentException or InvalidOperationException or ArithmeticException or IndexOutOfRangeException)
        {
            into.Add(new CheckResult
            {
                Id = "check-error", Part = null, Status = CheckStatus.Fail, Value = 0, Limit = 0, Unit = "", Margin = 0, Measured = false,
                Message = $"the {group} checks could not be evaluated for this design ({ex.Message}); treat it as failed",
            });
        }
    }

    /// <summary>Non-finite numbers never reach the results document: they become a failure with the value 0.</summary>
    private static CheckResult Sanitise(CheckResult r)
    {
        if (double.IsFinite(r.Value) && double.IsFinite(r.Limit) && double.IsFinite(r.Margin)) return r;
        return r with
        {
            Status = CheckStatus.Fail,
            Value = double.IsFinite(r.Value) ? r.Value : 0,
            Limit = double.IsFinite(r.Limit) ? r.Limit : 0,
            Margin = double.IsFinite(r.Margin) ? r.Margin : 0,
            Message = r.Message + " (a value was not finite)",
        };
    }
}
