namespace PartForge.Design.Loading;

/// <summary>One key set from outside the file (a sweep variant): <c>rotor.thickness</c> = <c>"6.5"</c>.</summary>
public readonly record struct DesignOverride(string KeyPath, string Value)
{
    public override string ToString() => KeyPath + "=" + Value;

    public static implicit operator DesignOverride((string KeyPath, string Value) t) => new(t.KeyPath, t.Value);
}
