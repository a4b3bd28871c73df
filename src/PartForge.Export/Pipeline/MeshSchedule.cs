using PartForge.Geometry.Profiles;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// Makes the meshes of a set of parts side by side on the machine's cores, largest first, with at most half
/// of the estimated triangles of the set being meshed at any moment (the largest part may always run,
/// alone if it needs more). Meshing a part needs a working set of about its own mesh size again (rings on
/// the grid, level vertex tables, the growing buffers, the validator), so two large parts meshed at once would
/// hold two such working sets beside the finished meshes; with the cap the peak stays near the size of
/// the finished meshes plus one working set. Small parts fill the other cores meanwhile.
/// </summary>
internal static class MeshSchedule
{
    /// <summary>Share of the set's estimated triangles that may be in the mesher at once.</summary>
    public const double InFlightShare = 0.5;

    /// <summary>Makes every part's mesh (a part that cannot be meshed keeps its exception for the caller to
    /// read from <see cref="PartModel.Mesh"/>).</summary>
    public static void MeshAll(IReadOnlyList<PartModel> parts, double chordalToleranceMm)
    {
        if (parts.Count == 0) return;
        var est = parts.Select(p => Math.Max(1, PartForge.Geometry.Meshes.MeshBudget.EstimateTriangles(p.ExactLayers.Select(l => new Profile(l.Outers, l.Cuts)), chordalToleranceMm))).ToArray();
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
