namespace PartForge.Bench;

/// <summary>
/// Peak managed heap during an operation, sampled by a background thread (in a run apart from the timed ones),
/// relative to the heap after a full collection just before. Two modes: the GC's own figure about every
/// millisecond (what the operation holds alive plus not-yet-collected garbage: an upper bound of the live
/// peak, and mostly a measure of how much garbage the collector lets pile up), or, with <c>live</c>, what is
/// live at a blocking full collection forced about every millisecond plus the collection's own time (the
/// memory the operation really needs at those moments, from <see cref="LiveAfterFullCollection"/>; it slows
/// the operation down and can miss a peak shorter than the interval).
/// </summary>
/// <remarks>
/// An earlier live mode read <see cref="GC.GetTotalMemory(bool)"/> with a forced collection from this thread;
/// that figure also counts what the measured threads allocate while it collects, and read about 21 MB on a
/// loop that never holds more than 1.5 MB (the <c>memory-parts</c> benchmark's sampler check). On the
/// builds of that time it happened to be close (8x to 10x the mesh either way).
/// </remarks>
public sealed class ScalingMemory : IDisposable
{
    private readonly long _baseline;
    private long _peak;
    private volatile bool _stop;
    private readonly Thread _thread;

    private readonly bool _live;

    private ScalingMemory(bool live)
    {
        _live = live;
        GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
        GC.WaitForPendingFinalizers();
        _baseline = _live ? LiveAfterFullCollection() : GC.GetTotalMemory(true);
        _peak = _baseline;
        _thread = new Thread(Sample) { IsBackground = true, Priority = ThreadPriority.AboveNormal };
        _thread.Start();
    }

    public static ScalingMemory Start(bool live = false) => new(live);

    private void Sample()
    {
        while (!_stop)
        {
            long m = _live ? LiveAfterFullCollection() : GC.GetTotalMemory(false);
            if (m > Interlocked.Read(ref _peak)) Interlocked.Exchange(ref _peak, m);
            Thread.Sleep(1);
        }
    }

    /// <summary>Stops sampling; the peak heap above the baseline, bytes.</summary>
    public long StopPeakBytes()
    {
        long m = _live ? LiveAfterFullCollection() : GC.GetTotalMemory(false);
        if (m > Interlocked.Read(ref _peak)) Interlocked.Exchange(ref _peak, m);
        _stop = true;
        _thread.Join();
        return Math.Max(0, Interlocked.Read(ref _peak) - _baseline);
    }

    /// <summary>
    /// What is live at a blocking full collection, from the collector's own account of that collection (heap size
    /// minus free space). The world is stopped during it, so this is an exact snapshot even while other threads
    /// allocate; <see cref="GC.GetTotalMemory(bool)"/> is not (it counts what they allocate while it collects).
    /// </summary>
    public static long LiveAfterFullCollection()
    {
        GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: false);
        var info = GC.GetGCMemoryInfo(GCKind.FullBlocking);
        return info.HeapSizeBytes - info.FragmentedBytes;
    }

    public void Dispose()
    {
        _stop = true;
        _thread.Join();
    }
}
