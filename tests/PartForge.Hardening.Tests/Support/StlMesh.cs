using System.Globalization;
using System.Text;

namespace PartForge.Hardening.Tests.Support;

/// <summary>
/// An STL file read back independently of the project's writer: binary (80-byte header, uint32 count,
/// 50 bytes a triangle, little-endian float32) or ASCII (<c>solid</c> ... <c>endsolid</c>), per the format's
/// published description. Vertices are kept as the float32 values in the file.
/// </summary>
public sealed class StlMesh
{
    private StlMesh(float[] xyz) => Xyz = xyz;

    /// <summary>9 floats a triangle: x0 y0 z0 x1 y1 z1 x2 y2 z2.</summary>
    public float[] Xyz { get; }

    public int TriangleCount => Xyz.Length / 9;

    public static StlMesh Read(string path)
    {
        var bytes = File.ReadAllBytes(path);
        if (bytes.Length >= 84)
        {
            uint n = BitConverter.ToUInt32(bytes, 80);
            if (84 + 50L * n == bytes.Length)
            {
                var xyz = new float[n * 9];
                for (int t = 0; t < n; t++)
                    for (int k = 0; k < 9; k++)
                        xyz[t * 9 + k] = BitConverter.ToSingle(bytes, 84 + 50 * t + 12 + 4 * k);
                return new StlMesh(xyz);
            }
        }
        string text = Encoding.ASCII.GetString(bytes);
        if (!text.TrimStart().StartsWith("solid", StringComparison.Ordinal)) throw new InvalidDataException($"{path}: neither binary nor ASCII STL");
        var list = new List<float>();
        foreach (var raw in text.Split('\n'))
        {
            var l = raw.Trim();
            if (!l.StartsWith("vertex ", StringComparison.Ordinal)) continue;
            var p = l.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            for (int k = 1; k <= 3; k++) list.Add(float.Parse(p[k], NumberStyles.Float, CultureInfo.InvariantCulture));
        }
        if (list.Count % 9 != 0) throw new InvalidDataException($"{path}: vertex count not a multiple of 3");
        return new StlMesh(list.ToArray());
    }
}
