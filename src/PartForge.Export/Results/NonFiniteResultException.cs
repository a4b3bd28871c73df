namespace PartForge.Export.Results;

/// <summary>A NaN or infinite number reached the results document: always a bug upstream (exit 3).</summary>
public sealed class NonFiniteResultException(string field, double value)
    : Exception($"the results field '{field}' is {value}; a result must be a finite number");
