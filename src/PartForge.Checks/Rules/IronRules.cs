using PartForge.Electrical.Field;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>back-iron-saturation: the steel behind each rotor's magnets against steel's saturation.</summary>
internal static class IronRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        foreach (var f in c.E.BackIron) yield return Saturation(c, f);
    }

    private static CheckResult Saturation(CheckContext c, BackIronFluxResult f)
    {
        var p = f.Plane;
        double limit = BackIronFlux.LimitTesla;
        var (status, margin) = AtMost(f.FluxDensityTesla, limit, limit - BackIronFlux.PassTesla);
        string what = p.SteelRotor ? $"{p.Rotor.Name} (steel disc, {F(p.ThicknessMm)} mm behind the magnets)" : $"{p.Part.Name} behind {p.Rotor.Name} ({F(p.ThicknessMm)} mm)";
        string msg = $"{what}: {F(f.FluxPerPoleWb * 1e6)} uWb per pole would need {F(f.FluxDensityTesla)} T in the steel between poles with ideal iron";
        if (f.ImageStrength < 1) msg += $"; it saturates, so the iron's image is weakened to {F(f.ImageStrength)} in the EMF and the pull";
        if (status != CheckStatus.Pass)
        {
            double add = f.ThicknessToPassMm - p.ThicknessMm;
            msg += p.SteelRotor
                ? $"; thicken rotor.thickness to {F(c.D.Rotor.ThicknessMm + add)} (steel behind the magnets {F(f.ThicknessToPassMm)} mm)"
                : $"; thicken rotor.back_iron.thickness to {F(f.ThicknessToPassMm)}";
        }
        return new CheckResult
        {
            Id = CheckIds.BackIronSaturation, Part = p.Part, Counterpart = p.SteelRotor ? null : p.Rotor, Status = status,
            Value = f.FluxDensityTesla, Limit = limit, Unit = "T", Margin = margin, Message = msg,
            Where = new CheckLocation($"{p.Part.Name} between two poles"),
            Basis = "flux per pole at the steel face by the image method (ideal iron), half of it through the steel section thickness x magnet radial length; limit 1.6 T, the knee of mild steel (saturation about 2.0 T; from memory, common practice); warn above 1.4 T",
        };
    }
}
