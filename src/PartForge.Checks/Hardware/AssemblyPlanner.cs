using PartForge.Checks.Inputs;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Hardware;

/// <summary>
/// The ordered assembly steps of a machine, from its layout, its parts and joints (<see cref="FastenerPlanner"/>)
/// and the electrical engine's pull. The pull rises as two attracting bodies close, so the electrical result's
/// pull at the running gap (the closest the hub spacer lets the rotors come) bounds the pull on the way down.
/// </summary>
public static class AssemblyPlanner
{
    public const string Fingers = "keep fingers out from between the rotors and between a rotor and any steel: the gap closes by itself and traps skin";
    public const string Flying = "a loose magnet jumps to steel (back iron, tools, the bench) and shatters or pinches: keep steel tools away and place magnets one at a time";
    public const string Spacer = "the non-magnetic spacer must stay in place while the parts close: without it the magnets pull the rotor onto the stator";

    public static IReadOnlyList<AssemblyStep> Plan(MachineModel d, ElectricalFacts e, IReadOnlyList<PartView> parts, IReadOnlyList<FastenerJoint> joints, JackingSet? jacks = null)
    {
        var steps = new List<(string Action, double Pull, string Note, string? Caution)>();
        bool iron = parts.Any(p => p.Id.Role == PartRole.BackIron);
        double perMagnet = e.MagnetToBackIronN;
        string Rotors(int n) => n > 1 ? "each rotor" : "the rotor";
        int nr = d.Layout.Rotors.Count;

        if (iron)
            steps.Add(($"lay the back iron against the back face (the face without pockets) of {Rotors(nr)}, holes in line", 0, "no magnets fitted yet", null));
        steps.Add(($"glue the magnets into {Rotors(nr)}'s pockets one at a time, north up where the engraved dot is; let the glue cure", iron ? perMagnet : 0,
            iron ? $"each magnet is pulled {F(perMagnet)} N onto the back iron (electrical result)" : "no iron: a magnet is pulled only by its neighbours", Flying));
        steps.Add(("seat the wound formers in the stator ring" + (d.Layout.Stators.Count > 1 ? "s" : "") + " and lead the wires out along the grooves", 0,
            "the coreless stator holds no iron: no pull", null));

        var stud = joints.FirstOrDefault(j => j.Kind == JointKind.ThroughStud);
        if (d.Layout.StatorBetweenRotors)
        {
            var back = d.Layout.Rotors[1].Name;
            var front = d.Layout.Rotors[0].Name;
            double pull = e.PullOnRotorN.TryGetValue(d.Layout.Rotors[0], out double f) ? Math.Max(0, f) : 0;
            steps.Add(stud is { } s
                ? ($"put the {s.Count} through-studs ({s.Thread?.Size ?? "pins"}, grip {F(s.GripMm)} mm) through {back}{(iron ? " and its back iron" : "")} with a washer and nut below; fit the hub spacer over them", 0, "one rotor only: no pull", null)
                : ($"fix {back} to the shaft and fit the hub spacer on its inner face", 0, "one rotor only: no pull", null));
            steps.Add(("fix the stator to its frame around the hub spacer, centred on the shaft, its face parallel to the rotor", 0,
                "the coreless stator holds no iron: no pull on it", Fingers));
            if (jacks is { } jk)
            {
                steps.Add(($"press a {jk.Thread.Size} hex nut into each of {front}'s {jk.Count} nut traps; run the {jk.Count} jacking screws ({jk.Thread.Size} x {F(jk.ScrewLengthMm)}) in from the back until they stand {F(JackingSet.LiftMm)} mm proud of the stator-side face", 0,
                    "away from the stack: no pull", null));
                steps.Add(($"set {front} (magnets facing the stator, rim notches in line with {back}'s) over the studs with the jacking screws' tips on the hub spacer, then back the screws off a half turn each in turn until it seats on the spacer", pull,
                    $"the screws hold the rotors' pull, rising to {F(pull)} N at the running gap (electrical result; less while they are further apart)", Fingers + "; " + Spacer));
            }
            else
                steps.Add(($"lower {front} (magnets facing the stator, rim notches in line with {back}'s) slowly over the studs onto the hub spacer, holding it against the pull; never let go of it on the way down", pull,
                    $"the rotors pull together with up to {F(pull)} N at the running gap (electrical result; less while they are further apart)", Fingers + "; " + Spacer));
            steps.Add((stud is { } s2 ? $"fit washers and nuts on the studs above {front}{(iron ? "'s back iron" : "")} and tighten them evenly in a star pattern to the clamp the report gives" : $"fix {front} to the shaft",
                pull, "the hub spacer carries the pull in compression", null));
        }
        else if (d.Layout.RotorBetweenStators)
        {
            steps.Add(($"fix {d.Layout.Stators[1].Name} to its frame; fit the rim spacer on it" + (stud is { } s ? $" and put the {s.Count} through-studs ({s.Thread?.Size ?? "pins"}, grip {F(s.GripMm)} mm) through both" : ""), 0, "no magnets near: no pull", null));
            steps.Add(($"fix the rotor to the shaft and bring it inside the rim spacer, centred between the stator faces", 0,
                "a rotor between two coreless stators feels no net axial pull", Flying));
            steps.Add(($"lay {d.Layout.Stators[0].Name} on the rim spacer" + (stud is { } s3 ? " over the studs, then fit washers and nuts and tighten them evenly" : " and bolt it through the mount holes"), 0,
                "no net pull on the stators", Fingers));
        }
        else
        {
            steps.Add(("fix the stator to its frame, centred on the shaft", 0, "no magnets near: no pull", null));
            steps.Add(("lay the gap gauge on the stator ring's face around the shaft, lower the rotor (magnets facing the stator) onto it and fix the rotor to the shaft; slide the gauge out through its slot", 0,
                "a single rotor facing a coreless stator feels no net axial pull", Fingers + "; " + Spacer));
        }
        steps.Add(("turn the rotor by hand through a full turn and listen for rubbing before any powered run", 0, "", "stand out of the rotor's plane when it first spins"));
        return steps.Select((s, i) => new AssemblyStep(i + 1, s.Action, s.Pull, s.Note, s.Caution)).ToArray();
    }
}
