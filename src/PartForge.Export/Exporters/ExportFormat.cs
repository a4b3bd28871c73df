namespace PartForge.Export.Exporters;

/// <summary>
/// One export format: its <c>--formats</c> word, what it is made from (a mesh, a part's exact profile, or the
/// results of the whole machine), which files it writes for a build (<see cref="Plan"/>), and its writer. A new
/// format is one subclass and one line in <see cref="ExportRegistry"/>.
/// </summary>
public abstract class ExportFormat
{
    /// <summary>The word of <c>--formats</c> (stl, 3mf, ...).</summary>
    public abstract string Name { get; }

    /// <summary>What its files are made from.</summary>
    public abstract ExportInput Input { get; }

    /// <summary>The files this format writes for the parts in scope, in writing order.</summary>
    public abstract IEnumerable<PlannedFile> Plan(ExportScope scope);

    /// <summary>The previews a file shows (rendered side by side before writing); none by default.</summary>
    public virtual IEnumerable<PreviewKey> Previews(PlannedFile file, ExportScope scope) => [];

    /// <summary>Writes one planned file to the stream, deterministically.</summary>
    public abstract void Write(Stream stream, PlannedFile file, ExportContext context);

    public override string ToString() => Name;
}

/// <summary>What a format's files are made from.</summary>
public enum ExportInput
{
    /// <summary>Part meshes (STL, 3MF, PNG).</summary>
    Mesh,

    /// <summary>A cut part's exact profile, lines and true arcs (DXF, SVG); no mesh is made for it.</summary>
    ExactProfile,

    /// <summary>The whole machine's results (JSON, HTML, CSV): every part is meshed for its size and triangle count.</summary>
    Results,
}
