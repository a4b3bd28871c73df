using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Fuzz;

/// <summary>
/// The hostile inputs of the review, each through <c>check</c>, <c>build</c> and <c>sweep</c> in the real
/// executable: none reaches exit 3 (reserved for bugs) or a crash (134 was the stack overflow of a self-referencing
/// alias), and each is refused (2, naming the file), fails a check (1) or passes (0), never with a stack trace.
/// </summary>
public sealed class AttackedInputTests
{
    private static string Crank => Repo.PresetText("crank-bench");

    public static TheoryData<string, string> Attacks()
    {
        string c = Crank;
        var t = new TheoryData<string, string>
        {
            { "self-alias", "partforge: 1\nname: x\nextra: &e [*e]\n" },
            { "alias-in-map", "partforge: 1\nname: x\nmachine: &m\n  poles: *m\n" },
            { "alias-bomb", "partforge: 1\nname: x\na0: &a0 [x,x,x,x,x,x,x,x,x,x]\na1: &a1 [*a0,*a0,*a0,*a0,*a0,*a0,*a0,*a0,*a0,*a0]\na2: &a2 [*a1,*a1,*a1,*a1,*a1,*a1,*a1,*a1,*a1,*a1]\na3: &a3 [*a2,*a2,*a2,*a2,*a2,*a2,*a2,*a2,*a2,*a2]\na4: &a4 [*a3,*a3,*a3,*a3,*a3,*a3,*a3,*a3,*a3,*a3]\na5: &a5 [*a4,*a4,*a4,*a4,*a4,*a4,*a4,*a4,*a4,*a4]\n" },
            { "tab", c.Replace("\n  poles:", "\n\tpoles:") },
            { "cr-only", c.Replace("\n", "\r") },
            { "long-name", c.Replace("name: crank-bench", "name: " + new string('x', 5000)) },
            { "device-name", c.Replace("name: crank-bench", "name: nul") },
            { "rotor-1030", c.Replace("outer_diameter: 110", "outer_diameter: 1030") },
            { "turns-400", c.Replace("turns: 120", "turns: 400") },
            { "gap-50", c.Replace("air_gap: 1.0", "air_gap: 50") },
            { "fill-max", c.Replace("fill_factor: 0.45", "fill_factor: 0.9069") },
            { "br-max", c.Replace("grade: N42", "br: 2") },
            { "coils-off-ring", Repo.WithKey(c, "coils", "pitch_radius", "80") },
            { "four-mistakes", c.Replace("poles: 12", "poles: 13").Replace("turns: 120", "turns: many").Replace("air_gap: 1.0", "air_gap: -1").Replace("layout: single-rotor", "layout: single-rotr") },
        };
        return t;
    }

    [Theory]
    [MemberData(nameof(Attacks))]
    public void No_attacked_input_reaches_exit_3(string name, string text)
    {
        using var tmp = new TempFolder("attack");
        Assert.NotEqual(Crank, text); // the attack changed the preset
        string design = tmp.Sub(name + ".yaml");
        File.WriteAllText(design, text);
        foreach (var args in new[]
                 {
                     new[] { "check", design },
                     new[] { "build", design, "-o", tmp.Sub("out"), "--formats", "stl,json" },
                     new[] { "sweep", design, "--vary", "machine.rated_rpm=300..400:100" },
                 })
        {
            var r = Pf.Exe(args);
            Assert.True(r.ExitCode is 0 or 1 or 2, $"{name}: {args[0]} gave exit {r.ExitCode?.ToString() ?? "hang"}\n{Pf.Describe(r)}");
            if (r.ExitCode == 2) Assert.Contains(name + ".yaml", r.Stderr + r.Stdout); // a refusal names the file
            Assert.DoesNotContain("   at ", r.Stderr); // no stack trace
        }
    }
}
