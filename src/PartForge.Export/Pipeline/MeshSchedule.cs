using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// Makes the meshes of a set of parts side by side on the machine's cores, heaviest first, with at most half
/// of the set's estimated work in the mesher at any moment (the heaviest part may always run, alone if it
/// needs more). A part's work is its estimated triangles (<c>MeshBudget.EstimateTriangles</c>), doubled when
/// the cuts of one of its layers may overlap (<see cref="ExactSolid.CutsMayOverlap"/>): such a layer's
/// region is made by booleans, whose working set is about twice that of a region assembled directly.
/// Making a part's solid and mesh needs one to two times its mesh size beside the finished meshes, so two
/// large parts at once would hold two such working sets; with the cap, and the heaviest part first (while
/// the fewest finished meshes are held), the peak stays near the finished meshes plus one working set.
/// Measured on the scaling design at 64 pockets and 0.01 mm (benchmark <c>memory-parts</c> and
/// <c>scaling-build</c>): the stator (grooves into the seats) first gives a peak of 1.7x the meshes, the
/// rotor first 2.0x. Small parts fill the other cores meanwhile.
/// </summary>
internal static class MeshSchedule
{
    /// <summary>Share of the set's estimated work that may be in the mesher at once.</summary>
    public const double InFlightShare = 0.5;

    /// <summary>Makes every part's mesh (a part that cannot be meshed keeps its exception for the caller to
    /// read from <see cref="PartModel.Mesh"/>).</summary>
    public static void MeshAll(IReadOnlyList<PartModel> parts, double chordalToleranceMm)
    {
        if (parts.Count == 0) return;
        var est = parts.Select(p => Math.Max(1, PartForge.Geometry.Meshes.MeshBudget.EstimateTriangles(p.ExactLayers.Select(l => new Profile(l.Outers, l.Cuts)), chordalToleranceMm))
            * (p.ExactLayers.Any(ExactSolid.CutsMayOverlap) ? 2 : 1)).ToArray();
        var pending = Enumerable.Range(0, parts.Count).OrderByDescending(i => est[i]).ThenBy(i => i).ToList();
        double total = est.Sum(), cap = Math.Max(InFlightShare * total, est.Max());
        double inFlight = 0;
        int running = 0;
        var gate = new object();
        int workers = Math.Max(1, Math.Min(Environment.ProcessorCount, parts.Count));
        Parallel.For(0, workers, new ParallelOptions { MaxDegreeOfParallelism = workers }, worker =>
        {
            while (true)
            {
                int pick;
                lock (gate)
                {
                    while (true)
                    {
                        if (pending.Count == 0) return;
                        int k = running == 0 ? 0 : pending.FindIndex(i => inFlight + est[i] <= cap);
                        if (k >= 0)
                        {
                            pick = pending[k];
                            pending.RemoveAt(k);
                            inFlight += est[pick];
                            running++;
                            break;
                        }
                        Monitor.Wait(gate);
                    }
                }
                try { _ = parts[pick].Mesh; }
                catch (PartsException) { } // the caller reports it, in part order
                finally
                {
                    lock (gate)
                    {
                        inFlight -= est[pick];
                        running--;
                        Monitor.PulseAll(gate);
                    }
                }
            }
        });
    }
}
