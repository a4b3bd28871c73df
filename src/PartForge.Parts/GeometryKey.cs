using System.Globalization;
using System.Text;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts;

/// <summary>The text behind <see cref="PartModel.GeometryKey"/>: everything the mesher reads, written exactly.</summary>
public static class GeometryKey
{
    public static string Of(PartModel part, string meshInputs)
    {
        ArgumentNullException.ThrowIfNull(part);
        var sb = new StringBuilder();
        sb.Append(part.Id.Name).Append('|').Append(meshInputs).Append('|').Append(N(part.HeightMm));
        foreach (var layer in part.ExactLayers)
        {
            sb.Append("|L").Append(N(layer.Z0Mm)).Append(',').Append(N(layer.Z1Mm));
            foreach (var c in layer.Outers) Contour(sb.Append("|o"), c);
            foreach (var c in layer.Cuts) Contour(sb.Append("|c"), c);
        }
        return sb.ToString();
    }

    private static void Contour(StringBuilder sb, Contour c)
    {
        if (c.Circle is { } ci) { sb.Append('C').Append(N(ci.Center.X)).Append(',').Append(N(ci.Center.Y)).Append(',').Append(N(ci.Radius)); return; }
        foreach (var s in c.Segments)
        {
            switch (s)
            {
                case LineSegment l: sb.Append('l').Append(N(l.From.X)).Append(',').Append(N(l.From.Y)).Append(',').Append(N(l.To.X)).Append(',').Append(N(l.To.Y)); break;
                case ArcSegment a: sb.Append('a').Append(N(a.Center.X)).Append(',').Append(N(a.Center.Y)).Append(',').Append(N(a.Radius)).Append(',').Append(N(a.StartDeg)).Append(',').Append(N(a.SweepDeg)); break;
                default: sb.Append('?').Append(N(s.Start.X)).Append(',').Append(N(s.Start.Y)).Append(',').Append(N(s.End.X)).Append(',').Append(N(s.End.Y)); break;
            }
        }
    }

    private static string N(double x) => x.ToString("R", CultureInfo.InvariantCulture);
}
