namespace PartForge.Electrical.Field;

/// <summary>One point of the assembly pull curve: the face-to-face gap of the two rotors' magnets, mm, and the pull between the rotors there, N.</summary>
public readonly record struct PullCurvePoint(double FaceToFaceMm, double PullN);
