namespace PartForge.Parts;

/// <summary>
/// The design cannot be turned into parts (a value the validator should have refused, or a combination
/// the parts cannot be made from). The message is one line for the user and names the design key.
/// </summary>
public sealed class PartsException(string message) : Exception(message);
