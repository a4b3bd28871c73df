namespace PartForge.Design.Machines;

/// <summary>The printer (<c>printer.*</c>): printable volume, nozzle (resolved: printer.nozzle, else process.nozzle) and the gap between parts on a plate.</summary>
public sealed record PrinterSpec(double BedXMm, double BedYMm, double BedZMm, double NozzleMm, double SpacingMm);
