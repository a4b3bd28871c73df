using System.Globalization;
using PartForge.Checks.Stack;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>winding-fill, current-density (coil-temperature is in HeatRules).</summary>
internal static class WindingRules
{
    /// <summary>Hexagonal packing of equal circles, pi / (2 sqrt 3) to 4 figures (geometry).</summary>
    public const double HexagonalPacking = 0.9069;

    /// <summary>
    /// Continuous current density allowed in a small air-cooled coil in a plastic former, A/mm^2 (common
    /// practice, from memory: 3-6 A/mm^2 continuous for small enclosed coils; more only for short duty).
    /// </summary>
    public const double MaxCurrentDensity = 6.0;

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        yield return Fill(c);
        if (c.E.CurrentDensityAPerMm2 > 0) yield return CurrentDensity(c);
    }

    private static CheckResult Fill(CheckContext c)
    {
        double fill = c.D.Coils.FillFactor;
        double ratio = c.E.WireOverallMm > 0 ? c.E.WireBareMm / c.E.WireOverallMm : 1;
        double limit = HexagonalPacking * ratio * ratio;   // copper fill at perfect hexagonal packing of the insulated wire
        CheckStatus status;
        double margin = limit - fill;
        string msg = $"coils.fill_factor {F(fill)}: hexagonal packing of {F(c.E.WireOverallMm)} mm enamelled wire allows at most {F(limit)} copper fill";
        if (!(fill <= limit))
        {
            status = CheckStatus.Fail;
            msg += $"; impossible: lower coils.fill_factor to {Down(CoilBulge.PracticalFill)} or less (random-wound practice 0.30-0.50)";
        }
        else if (fill > CoilBulge.PracticalFill)
        {
            status = CheckStatus.Warn;
            msg += $"; above the 0.30-0.50 a hand or random-wound coil reaches (common practice), the winding may bulge {F(c.BulgePerFaceMm)} mm each face; lower coils.fill_factor to {Down(CoilBulge.PracticalFill)}";
        }
        else status = CheckStatus.Pass;
        return new CheckResult
        {
            Id = CheckIds.WindingFill, Part = PartId.Former, Status = status, Value = fill, Limit = limit, Unit = "1", Margin = margin,
            Message = msg, Where = new CheckLocation("winding window"),
            Basis = "hexagonal packing pi/(2 sqrt 3) x (d/D)^2 (geometry); random-wound 0.30-0.50 (practice)",
        };
    }

    private static CheckResult CurrentDensity(CheckContext c)
    {
        double j = c.E.CurrentDensityAPerMm2;
        double limit = MaxCurrentDensity;
        double band = 0.25 * limit;
        var (status, margin) = AtMost(j, limit, band);
        string msg = $"{F(j)} A/mm^2 in the wire at the {c.E.OperatingPoint}";
        if (status != CheckStatus.Pass)
        {
            double d = c.E.WireBareMm * Math.Sqrt(j / (limit - band));
            int awg = AwgAtLeast(d);
            msg += $"; use a wire of at least {F(d)} mm bare (coils.wire.awg {awg.ToString(CultureInfo.InvariantCulture)} or lower) or draw less current (operation.load_resistance up, or operation.supply_voltage down)";
        }
        return new CheckResult
        {
            Id = CheckIds.CurrentDensity, Part = PartId.Former, Status = status, Value = j, Limit = limit, Unit = "A/mm2", Margin = margin,
            Message = msg, Where = new CheckLocation("coil wire"),
            Basis = "continuous current density of small air-cooled coils (common practice, from memory)",
        };
    }

    /// <summary>The largest AWG number whose bare diameter is at least d (ASTM B258: d = 0.127 x 92^((36 - n)/39)).</summary>
    public static int AwgAtLeast(double diameterMm)
    {
        // Source: ASTM B258 (AWG formula).
        double n = 36 - 39 * Math.Log(diameterMm / 0.127) / Math.Log(92);
        return (int)Math.Floor(n + 1e-9);
    }
}
