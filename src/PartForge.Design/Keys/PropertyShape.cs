using System.Reflection;

namespace PartForge.Design.Keys;

/// <summary>
/// One key property of a model class and whether its type is a nullable reference (<c>T?</c> of a class),
/// as the compiler saw it; value types say so themselves through <c>Nullable&lt;T&gt;</c>.
/// </summary>
internal readonly record struct PropertyShape(PropertyInfo Property, bool IsNullableReference);
