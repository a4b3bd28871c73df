namespace PartForge.Bench;

/// <summary>
/// Peak managed heap during an operation, sampled by a background thread about every millisecond (in a run apart from the timed ones) (the GC's own
/// figure, so it is what the operation holds alive plus not-yet-collected garbage: an upper bound of the live
/// peak), relative to the heap after a full collection just before.
/// </summary>
public sealed class ScalingMemory : IDisposable
{
    private readonly long _baseline;
    private long _peak;
    private volatile bool _stop;
    private readonly Thread _thread;

    private ScalingMemory()
    {
        GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
        GC.WaitForPendingFinalizers();
        _baseline = GC.GetTotalMemory(true);
        _peak = _baseline;
        _thread = new Thread(Sample) { IsBackground = true, Priority = ThreadPriority.AboveNormal };
        _thread.Start();
    }

    public static ScalingMemory Start() => new();

    private void Sample()
    {
        while (!_stop)
        {
            long m = GC.GetTotalMemory(false);
            if (m > Interlocked.Read(ref _peak)) Interlocked.Exchange(ref _peak, m);
            Thread.Sleep(1);
        }
    }

    /// <summary>Stops sampling; the peak heap above the baseline, bytes.</summary>
    public long StopPeakBytes()
    {
        long m = GC.GetTotalMemory(false);
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
