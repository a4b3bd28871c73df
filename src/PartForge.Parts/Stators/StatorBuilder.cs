using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Stators;

/// <summary>
/// The stator ring(s). Geometry decisions:
/// <list type="bullet">
/// <item>Part-local frame: z = 0 the bottom face, z = <c>stator.thickness</c> the top face; the top face carries
/// the wire grooves and is turned away from the rotor where there is a choice: single-rotor (the ring is
/// flipped, the rotor is on +z), dual-stator (each ring's grooves face outward). In dual-rotor both faces face
/// a rotor; the grooves are recessed and face rotor-front.</item>
/// <item>Seat k: a through opening at coil k (machine angle k x 360 / coils on <c>coils.pitch_radius</c>; see
/// <see cref="LocalCoilAngleDeg"/>), the former's keyed
/// flange footprint offset outward by print_xy + 0.10 mm (<see cref="DesignGeometry.SeatClearanceMm"/>). The
/// former is centred on the ring's mid-plane (AxialStack) and glued.</item>
/// <item>Grooves, depth min(max(2 x layer, 2 x wire), thickness / 3), on the top face: a radial channel from each
/// seat (and each sensor) outward to a collector groove, a full ring (two half rings) in the widest free band
/// between the seats/sensors and the rim that misses the mount holes by a minimum wall, and a terminal exit from
/// the collector to the rim at 180 degrees. Channel width max(1.0, 3 x wire); collector and exit wide enough for
/// every lead at a packing of 0.5 (capped by the band). Without a free band the channels run to the rim.</item>
/// <item>Sensor pockets (timing sensors, on stator or stator-front only): body length (radial) x width
/// (tangential) plus the seat clearance on each side, depth = body height so the sensor face is flush with the
/// ring face that faces the rotor, centred at the electrical engine's angles and radius (the coil pitch radius,
/// between two coils, where the engine checked that the body fits). When that face is not the grooved face, a lead hole (a third of the
/// pocket's length, half its width, in its outer half, clear of its walls) goes through to the grooves.</item>
/// </list>
/// </summary>
internal static class StatorBuilder
{
    public sealed record Variant(PartId Id, bool Flipped, bool HasSensors, bool SensorsOnTop, double ExplodeRank);

    /// <summary>
    /// Each ring of the layout, placed by the stack: a ring with rotors only on its +z side is turned over (its
    /// grooved top face then faces away from the rotor); the first ring carries the sensors, in the face toward
    /// the rotor it faces (the +z one when rotors are on both sides); the exploded view moves a ring by the sign
    /// of its mid-plane.
    /// </summary>
    public static IReadOnlyList<Variant> Variants(MachineModel d)
    {
        var stack = d.Stack;
        var rotors = stack.OfKind(SlabKind.Rotor).ToList();
        return d.Layout.Stators.Select(id =>
        {
            var ring = stack.Slab(SlabKind.Stator, id);
            bool above = rotors.Any(r => r.ZMin >= ring.ZMax), below = rotors.Any(r => r.ZMax <= ring.ZMin);
            bool flipped = above && !below;
            bool sensorsOnTop = above != flipped;
            return new Variant(id, flipped, id == d.Layout.Stators[0], sensorsOnTop, Math.Sign(ring.ZMin + ring.ZMax));
        }).ToArray();
    }

    /// <summary>
    /// Part-local angle of coil k's seat: k x 360 / coils, negated on a ring that is turned over in the machine,
    /// so that seat-k (and former copy k) is at coil k's machine angle k x 360 / coils either way.
    /// </summary>
    public static double LocalCoilAngleDeg(MachineModel d, int k, bool flipped)
    {
        double a = DesignGeometry.CoilAngleDeg(d, k);
        return flipped && a != 0 ? 360 - a : a;
    }

    /// <summary>
    /// Builds one ring.
    /// </summary>
    public static PartSpec Build(MachineModel d, AxialStack stack, CoilGeometry coil, Contour formerFootprint, Variant v, List<PartDiagnostic> diags)
    {
        var sd = d.Stator;
        double Ro = sd.OuterDiameterMm / 2, Ri = sd.InnerDiameterMm / 2, s = sd.ThicknessMm;
        int n = d.CoilsPerStator;
        double pitch = coil.PitchRadiusMm;
        double c = DesignGeometry.SeatClearanceMm(d);
        double wall = DesignGeometry.MinWallMm(d);
        double dw = coil.WireOverallMm > 0 ? coil.WireOverallMm : 0.5;
        double grooveDepth = Math.Min(Math.Max(2 * d.Process.LayerMm, 2 * dw), s / 3);
        double channelW = Math.Max(1.0, 3 * dw);
        var o = new Vec2(0, 0);
        var notes = new List<string>();
        var features = new List<PartFeature>();

        var rim = Contour.FullCircle(o, Ro);
        features.Add(new("rim", FeatureKind.Rim, 0, rim, 0, s, 0, Ro));
        var st = new PrismaticStack(s).Outer(rim);
        if (Ri > 0)
        {
            var bore = Contour.FullCircle(o, Ri);
            st.Through(bore);
            features.Add(new("bore", FeatureKind.Bore, 0, bore, 0, s, 0, 0));
        }

        // Seats.
        var seat0 = ContourOffset.Offset(formerFootprint, c).Translated(new Vec2(pitch, 0));
        var (seatMin, seatMax) = Exact2D.RadialExtent(seat0);
        double seatOut = Exact2D.RayExit(seat0, new Vec2(pitch, 0), new Vec2(1, 0));
        for (int k = 0; k < n; k++)
        {
            double a = LocalCoilAngleDeg(d, k, v.Flipped);
            var seat = seat0.RotatedDeg(a);
            st.Through(seat);
            features.Add(new($"seat-{k}", FeatureKind.CoilSeat, k, seat, 0, s, a, pitch));
        }

        // Sensors (angles in the machine frame; a flipped ring carries them mirrored).
        var sensorAngles = v.HasSensors && d.Sensor.Kind != SensorKind.None ? coil.SensorAnglesDeg : Array.Empty<double>();
        double rs = coil.SensorRadiusMm > 0 ? coil.SensorRadiusMm : pitch;
        var body = d.Sensor.Body;
        double pl = body.LengthMm + 2 * c, pw = body.WidthMm + 2 * c;
        double ph = Math.Min(body.HeightMm, s);
        if (body.HeightMm >= s) notes.Add("the sensor body is as tall as the ring: its pocket goes through");
        double sensorMax = 0;
        var sensorChannelStarts = new List<(double AngleDeg, double RadiusMm)>();
        for (int i = 0; i < sensorAngles.Count; i++)
        {
            double a = v.Flipped ? -sensorAngles[i] : sensorAngles[i];
            var pocket = Contour.Rectangle(new Vec2(rs, 0), pl, pw, 0).RotatedDeg(a);
            double z0 = v.SensorsOnTop ? s - ph : 0, z1 = v.SensorsOnTop ? s : ph;
            st.Cut(pocket, z0, z1);
            features.Add(new($"sensor-{i}", FeatureKind.SensorPocket, i, pocket, z0, z1, a, rs));
            sensorMax = Math.Max(sensorMax, Exact2D.RadialExtent(pocket).Max);
            double rLead = rs;
            if (!v.SensorsOnTop && ph < s)
            {
                double ll = pl / 3;
                rLead = rs + pl / 4; // outer part of the pocket, pl/12 clear of its end wall (no shared edges)
                var lead = Contour.Rectangle(new Vec2(rLead, 0), ll, pw / 2, 0).RotatedDeg(a);
                st.Through(lead);
                features.Add(new($"sensor-lead-{i}", FeatureKind.SensorLeadHole, i, lead, 0, s, a, rLead));
            }
            sensorChannelStarts.Add((a, rLead));
        }

        // Mount holes.
        double mountOffset = StatorLayout.MountOffsetDeg(d, coil.SensorAnglesDeg);
        (double Lo, double Hi)? mountBand = null;
        if (sd.Mount is { } m)
        {
            double rm = m.CircleDiameterMm / 2;
            for (int j = 0; j < m.Count; j++)
            {
                double a = StatorLayout.MountAngleDeg(d, mountOffset, j);
                var hole = Contour.FullCircle(Vec2.FromAngleDeg(a) * rm, m.HoleMm / 2);
                st.Through(hole);
                features.Add(new($"mount-{j}", FeatureKind.MountHole, j, hole, 0, s, a, rm));
            }
            mountBand = (rm - m.HoleMm / 2 - wall, rm + m.HoleMm / 2 + wall);
        }

        // Collector band: widest free radial interval outside the seats and sensors, clear of the mount holes.
        double lo = Math.Max(seatMax, sensorMax) + wall, hi = Ro - wall;
        var bands = new List<(double Lo, double Hi)>();
        if (mountBand is { } mb && mb.Hi > lo && mb.Lo < hi)
        {
            bands.Add((lo, Math.Min(hi, mb.Lo)));
            bands.Add((Math.Max(lo, mb.Hi), hi));
        }
        else bands.Add((lo, hi));
        var best = bands.Where(b => b.Hi - b.Lo >= channelW).OrderByDescending(b => b.Hi - b.Lo).ThenBy(b => b.Lo).FirstOrDefault();
        bool hasCollector = best.Hi - best.Lo >= channelW;
        int leads = 2 * n + 3 * sensorAngles.Count;
        double zg0 = s - grooveDepth;
        double channelEnd;
        if (hasCollector)
        {
            double wc = Math.Clamp(leads * dw * dw / (0.5 * grooveDepth), channelW, best.Hi - best.Lo);
            double rc = (best.Lo + best.Hi) / 2;
            double t = StatorLayout.TerminalAngleDeg;
            var half0 = Contour.AnnularSector(rc - wc / 2, rc + wc / 2, t, 180);
            var half1 = Contour.AnnularSector(rc - wc / 2, rc + wc / 2, t + 180, 180);
            st.Cut(half0, zg0, s).Cut(half1, zg0, s);
            features.Add(new("collector-0", FeatureKind.Collector, 0, half0, zg0, s, t + 90, rc));
            features.Add(new("collector-1", FeatureKind.Collector, 1, half1, zg0, s, t + 270, rc));
            double x0 = rc, x1 = Ro + 1.0;
            var exit = Contour.Rectangle(new Vec2((x0 + x1) / 2, 0), x1 - x0, wc, 0).RotatedDeg(t);
            st.Cut(exit, zg0, s);
            features.Add(new("terminal-exit", FeatureKind.TerminalExit, 0, exit, zg0, s, t, (x0 + Ro) / 2));
            channelEnd = rc;
        }
        else
        {
            channelEnd = Ro + 1.0;
            notes.Add("no room for a collector groove between the seats and the rim: every channel runs to the rim, where the leads leave the ring");
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, v.Id, "no-collector", $"{v.Id.Name}: no free band for a collector groove; the lead channels run straight to the rim"));
        }

        // Channels.
        double chStart = pitch + seatOut / 2;
        for (int k = 0; k < n; k++)
        {
            double a = LocalCoilAngleDeg(d, k, v.Flipped);
            if (channelEnd <= chStart) break;
            var ch = Contour.Rectangle(new Vec2((chStart + channelEnd) / 2, 0), channelEnd - chStart, channelW, 0).RotatedDeg(a);
            st.Cut(ch, zg0, s);
            features.Add(new($"channel-{k}", FeatureKind.WireChannel, k, ch, zg0, s, a, (chStart + channelEnd) / 2));
        }
        for (int i = 0; i < sensorChannelStarts.Count; i++)
        {
            var (a, r0) = sensorChannelStarts[i];
            if (channelEnd <= r0) continue;
            var ch = Contour.Rectangle(new Vec2((r0 + channelEnd) / 2, 0), channelEnd - r0, channelW, 0).RotatedDeg(a);
            st.Cut(ch, zg0, s);
            features.Add(new($"sensor-channel-{i}", FeatureKind.WireChannel, n + i, ch, zg0, s, a, (r0 + channelEnd) / 2));
        }

        var (process, material) = ProcessChoice.Resolve(v.Id, d.Parts.For(PartRole.Stator), false,
            "a stator ring has wire grooves and blind sensor pockets", diags);
        notes.Insert(0, $"{v.Id.Name}: push each former into its seat, slotted flange on the grooved face, flats matching; centre it on the ring's thickness and glue it. Lay the leads in the channels to the collector groove and out at the terminal exit.");
        if (!v.HasSensors && d.Sensor.Kind != SensorKind.None)
            notes.Add($"{v.Id.Name} has no sensor pockets: the timing sensors sit in {d.Layout.Stators[0].Name}.");

        var slab = stack.Slab(SlabKind.Stator, v.Id);
        return new PartSpec
        {
            Id = v.Id,
            Process = process,
            Material = material,
            HeightMm = s,
            Layers = st.Build(),
            Features = features,
            Instances = new[] { new PartInstance(0, v.Id, slab.ZMin, s, v.Flipped, 0, 0, v.ExplodeRank) },
            Notes = notes,
        };
    }
}
