namespace PartForge.Export.Exporters;

/// <summary>
/// Every export format, in the contract's order of <c>--formats</c>, which is also the order a build writes
/// their files. The one list: <c>--formats</c>, its help text and the build plan read it. A new format: one
/// <see cref="ExportFormat"/> subclass and one line here.
/// </summary>
public static class ExportRegistry
{
    public static IReadOnlyList<ExportFormat> All { get; } =
    [
        new StlExport(),
        new ThreeMfExport(),
        new DxfExport(),
        new SvgExport(),
        new ResultsExport(),
        new ReportExport(),
        new BomExport(),
        new PngExport(),
    ];

    /// <summary>Every format's word, in registry order.</summary>
    public static IReadOnlyList<string> Names { get; } = All.Select(f => f.Name).ToArray();

    /// <summary>The format of that word, or null.</summary>
    public static ExportFormat? Find(string name) => All.FirstOrDefault(f => f.Name == name);
}
