using PartForge.Geometry.Solids;

namespace PartForge.Parts;

/// <summary>
/// Makes a part's layered solid on first use (thread-safe) and keeps its analytic volume. Once the part's mesh
/// is made, nothing in the pipeline reads the regions again, so the mesher lets go of them
/// (<see cref="Release"/>): a build then holds the meshes, not the meshes and the regions. A later read makes
/// the solid again, the same (the layers are immutable and the construction deterministic).
/// </summary>
internal sealed class SolidSource
{
    private readonly Func<LayeredSolid> _make;
    private readonly Lock _lock = new();
    private LayeredSolid? _solid;
    private double? _volume;
    private double? _polar;

    public SolidSource(Func<LayeredSolid> make) => _make = make;

    public LayeredSolid Value
    {
        get
        {
            lock (_lock)
            {
                if (_solid is null)
                {
                    _solid = _make();
                    _volume = _solid.AnalyticVolume;
                    _polar = _solid.AnalyticPolarMomentMm5;
                }
                return _solid;
            }
        }
    }

    /// <summary>Volume of the solid (mm^3), kept when the regions are let go.</summary>
    public double Volume
    {
        get
        {
            lock (_lock)
            {
                if (_volume is { } v) return v;
            }
            return Value.AnalyticVolume;
        }
    }

    /// <summary>Int r^2 dV about the axis, mm^5, kept when the regions are let go.</summary>
    public double PolarMomentMm5
    {
        get
        {
            lock (_lock)
            {
                if (_polar is { } v) return v;
            }
            return Value.AnalyticPolarMomentMm5;
        }
    }

    /// <summary>Whether the regions are held now.</summary>
    public bool Held
    {
        get { lock (_lock) return _solid is not null; }
    }

    /// <summary>Lets go of the regions (the volume stays).</summary>
    public void Release()
    {
        lock (_lock) _solid = null;
    }
}
