namespace PartForge.Dynamics;

/// <summary>
/// One term <c>CosWb cos(Order theta) + SinWb sin(Order theta)</c> of a circuit's flux linkage, theta the
/// mechanical rotor angle in radians. Order is a mechanical order (an electrical harmonic h of a machine with p
/// pole pairs is order h p); order 0 is a constant offset that links flux but makes no EMF or torque.
/// </summary>
/// <param name="Order">Mechanical order, 0 or more.</param>
/// <param name="CosWb">Cosine coefficient, Wb-turns.</param>
/// <param name="SinWb">Sine coefficient, Wb-turns.</param>
public readonly record struct FluxHarmonic(int Order, double CosWb, double SinWb);
