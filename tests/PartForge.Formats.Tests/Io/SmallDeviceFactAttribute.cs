namespace PartForge.Formats.Tests.Io;

/// <summary>A fact that needs <see cref="SmallDevice"/>: skipped, with the reason, where tmpfs cannot be mounted.</summary>
public sealed class SmallDeviceFactAttribute : FactAttribute
{
    public SmallDeviceFactAttribute()
    {
        if (SmallDevice.Unavailable is { } why) Skip = why;
    }
}
