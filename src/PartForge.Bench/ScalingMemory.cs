namespace PartForge.Bench;

/// <summary>
/// Peak managed heap during an operation, sampled by a background thread (in a run apart from the timed ones),
/// relative to the heap after a full collection just before. Two modes: the GC's own figure about every
/// millisecond (what the operation holds alive plus not-yet-collected garbage: an upper bound of the live
/// peak, and mostly a measure of how much garbage the collector lets pile up), or, with <c>live</c>, the live
/// heap after a full collection about every 5 ms (the memory the operation really needs at those moments; it
/// slows the operation down and can miss a peak shorter than the interval).
/// </summary>
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
        _baseline = GC.GetTotalMemory(true);
        _peak = _baseline;
        _thread = new Thread(Sample) { IsBackground = true, Priority = ThreadPriority.AboveNormal };
        _thread.Start();
    }

    public static ScalingMemory Start(bool live = false) => new(live);

    private void Sample()
    {
        while (!_stop)
        {
            long m = GC.GetTotalMemory(_live);
            if (m > Interlocked.Read(ref _peak)) Interlocked.Exchange(ref _peak, m);
            Thread.Sleep(_live ? 5 : 1);
        }
    }

    /// <summary>Stops sampling; the peak heap above the baseline, bytes.</summary>
    public long StopPeakBytes()
    {
        long m = GC.GetTotalMemory(_live);
        if (m > Interlocked.Read(ref _peak)) Interlocked.Exchange(ref _peak, m);
        _stop = true;
        _thread.Join();
        return Math.Max(0, Interlocked.Read(ref _peak) - _baseline);
    }

    public void Dispose()
    {
        _stop = true;
        _thread.Join();
    }
}
