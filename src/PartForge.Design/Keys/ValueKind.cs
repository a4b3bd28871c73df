namespace PartForge.Design.Keys;

/// <summary>What a design key holds.</summary>
public enum ValueKind
{
    /// <summary>A whole number (a C# int property).</summary>
    Integer,
    /// <summary>A finite real number (a C# double property).</summary>
    Number,
    /// <summary>A word or text (a C# string property).</summary>
    Text,
    /// <summary>true or false (a C# bool property).</summary>
    Boolean,
    /// <summary>A nested section (a class of the design model).</summary>
    Section,
}
