namespace PartForge.Bench;

/// <summary>
/// One benchmark. Cases are found by reflection: add a public class with a parameterless constructor that
/// implements this interface and it appears in `partforge-bench --list`.
/// </summary>
public interface IBenchCase
{
    /// <summary>Short unique name used on the command line, e.g. "kernel-r2".</summary>
    string Name { get; }

    /// <summary>What is measured and the target, one line.</summary>
    string Description { get; }

    /// <summary>Prepares inputs; not timed.</summary>
    void Setup();

    /// <summary>The timed operation. Returns a few figures to print beside the time (e.g. triangle count).</summary>
    IReadOnlyDictionary<string, double> Run();
}
