using PartForge.Checks.Mechanics;
using PartForge.Design.Materials;

namespace PartForge.Checks.Tests.Mechanics;

/// <summary>
/// A rotor stiffened by a bolted (not bonded) steel disc: the flexural rigidities add, D = E t^3 / (12 (1 - nu^2))
/// each (Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, flexural rigidity; from memory), and the
/// rotor carries the share D_rotor / (D_rotor + D_steel) of the pull on the Roark case 1j plate.
/// </summary>
public class CompositeRotorTests
{
    private static readonly RotorPlate Pla = new(80, 18, 60, 6.5, MaterialTable.Pla);

    [Fact]
    public void ThickerSteelGivesStrictlyLessDeflection()
    {
        double bare = Pla.RimDeflectionMm(135);
        double last = bare;
        foreach (double t in new[] { 1.0, 3.0, 6.5, 10.0 })
        {
            var plate = Pla with { Backing = new PlateBacking(72, t, MaterialTable.Steel) };
            double y = plate.RimDeflectionMm(135);
            Assert.True(y < last, $"{t} mm steel: {y} mm, not below {last} mm");
            last = y;
            // Independent: the share of the load from the two rigidities written out here.
            double dr = 3500 * Math.Pow(6.5, 3) / (12 * (1 - 0.35 * 0.35)), ds = 200000 * t * t * t / (12 * (1 - 0.29 * 0.29));
            Assert.Equal(bare * dr / (dr + ds), y, 1e-12 * bare);
            Assert.True(plate.RootStressMpa(135) < Pla.RootStressMpa(135));
        }
    }

    [Fact]
    public void SteelThatStopsShortOfThePullDoesNotCount()
    {
        var plate = Pla with { Backing = new PlateBacking(50, 6, MaterialTable.Steel) };
        Assert.Equal(Pla.RimDeflectionMm(100), plate.RimDeflectionMm(100), 12);
    }

    [Fact]
    public void ThicknessForDeflectionWithBackingMeetsTheTarget()
    {
        var plate = Pla with { ThicknessMm = 2.0, Backing = new PlateBacking(72, 1, MaterialTable.Steel) };
        double target = 0.3 * plate.RimDeflectionMm(400);
        double t = plate.ThicknessForDeflection(400, target);
        Assert.Equal(target, (plate with { ThicknessMm = t }).RimDeflectionMm(400), 1e-6 * target);
    }
}
