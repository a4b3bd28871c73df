using PartForge.Design.Machines;
using PartForge.Parts;

namespace PartForge.Export.Exporters;

/// <summary>What a build exports: the machine, the parts in scope (after <c>--parts</c>) and all of its parts.</summary>
public sealed record ExportScope(MachineModel Machine, IReadOnlyList<PartModel> Parts, PartSet All)
{
    /// <summary>The build covers the whole machine (no part left out by <c>--parts</c>).</summary>
    public bool WholeMachine => Parts.Count == All.Parts.Count;

    public IEnumerable<PartModel> Printed => Parts.Where(p => p.Process == PartProcess.Print);
    /// <summary>What goes on the printer: each printed part, or its print pieces when it is printed in pieces.</summary>
    public IEnumerable<PartModel> PrintUnits => Printed.SelectMany(p => p.PrintUnits);

    public IEnumerable<PartModel> Cut => Parts.Where(p => p.Process == PartProcess.Cut);

    /// <summary>A per-part file name: &lt;design&gt;-&lt;part&gt;.&lt;extension&gt;.</summary>
    public string PartFile(PartModel p, string extension) => Pipeline.OutputNames.PartFile(Machine.Name, p.Name, extension);
}
