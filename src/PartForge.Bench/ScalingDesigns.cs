using System.Globalization;
using System.Text;

namespace PartForge.Bench;

/// <summary>
/// The invented designs of the end-to-end scaling benchmarks: an R2-like single rotor (outer diameter 400,
/// thickness 10, bore 25, disc pockets on pitch radius 180, 8 bolt holes of 6.6 on a 60 circle) facing a
/// ring of round coils, with the pocket count, coil count and chordal tolerance as parameters. Magnets and
/// coils shrink with their count so that the geometry stays valid (pocket diameter at most 0.55 of the
/// pocket pitch chord, coils at most 0.6 of theirs).
/// </summary>
public static class ScalingDesigns
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    private static string F(double v) => Math.Round(v, 3).ToString("0.###", Inv);

    /// <summary>YAML of the scaling design with <paramref name="poles"/> pockets and <paramref name="coils"/> coils;
    /// <paramref name="marks"/> false leaves out the polarity dots and the rim notch (the bare R2 rotor shape).</summary>
    public static string Yaml(int poles, int coils, double chordalTolerance, bool marks = true)
    {
        const double pitchR = 180;
        double pocketChord = 2 * pitchR * Math.Sin(Math.PI / poles);
        double magnetD = Math.Min(15.05, 0.55 * pocketChord);
        double coilChord = 2 * pitchR * Math.Sin(Math.PI / coils);
        double core = Math.Min(12, 0.3 * coilChord);
        double build = Math.Min(6, 0.15 * coilChord);
        double height = 5, wire = 0.44; // AWG 26 grade 2, overall diameter about 0.44 mm
        int turns = Math.Max(8, (int)(build * height * 0.42 / (wire * wire)));
        double coilOuter = core + 2 * build;
        var sb = new StringBuilder();
        sb.Append("# Invented scaling design for the benchmarks (not a real machine)\n");
        sb.Append("partforge: 1\nname: scaling\nmachine:\n  layout: single-rotor\n");
        sb.Append($"  poles: {poles}\n  coils: {coils}\n  phases: 3\n  connection: star\n  rated_rpm: 200\n  max_rpm: 400\n");
        sb.Append($"magnets:\n  shape: disc\n  diameter: {F(magnetD)}\n  thickness: 6\n  grade: N42\n  pitch_radius: {F(pitchR)}\n");
        sb.Append("rotor:\n  outer_diameter: 400\n  thickness: 10\n  bore: 25\n  pocket_clearance: 0.15\n  pocket_floor: 4\n");
        sb.Append("  bolt_circle: { diameter: 60, count: 8, hole: 6.6 }\n  material: PLA\n");
        if (!marks) sb.Append("  marks: none\n  index: none\n");
        sb.Append($"coils:\n  shape: round\n  wire: {{ awg: 26 }}\n  enamel: grade-2\n  turns: {turns}\n  fill_factor: 0.42\n  height: {F(height)}\n");
        sb.Append($"  core: {{ diameter: {F(core)} }}\n  max_temperature: 50\n");
        sb.Append("former:\n  flange: 0.8\n  margin: 1.0\n");
        double sIn = 2 * (pitchR - coilOuter / 2 - 12), sOut = 2 * (pitchR + coilOuter / 2 + 14);
        sb.Append($"stator:\n  inner_diameter: {F(sIn)}\n  outer_diameter: {F(sOut)}\n  thickness: {F(height + 1.6)}\n");
        sb.Append($"  mount: {{ circle_diameter: {F(sOut - 10)}, count: 8, hole: 5.5 }}\n  material: PLA\n");
        sb.Append("sensor:\n  kind: none\ngap:\n  air_gap: 1.5\n  min_running_gap: 0.3\n");
        sb.Append($"mesh:\n  chordal_tolerance: {chordalTolerance.ToString("R", Inv)}\n");
        // An invented large-format printer, so the 400 mm class parts print whole (the kernel is what is measured).
        sb.Append("printer: { bed_x: 2000, bed_y: 2000, bed_z: 500 }\n");
        return sb.ToString();
    }

    /// <summary>Coils for a pole count at the 12-coil / 16-pole ratio (3 phases).</summary>
    public static int CoilsFor(int poles) => poles * 3 / 4;
}
