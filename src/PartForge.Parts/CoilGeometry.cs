using PartForge.Geometry.Profiles;

namespace PartForge.Parts;

/// <summary>
/// What the part builders take from the electrical results: the coil's exact outline and window, and the
/// sensor angles. Contours are in the coil's frame as the electrical engine gives them: coil 0 centred at
/// (pitch radius, 0), +x radially outward.
/// </summary>
/// <param name="PitchRadiusMm">Radius of the coil centres.</param>
/// <param name="WindingOutline">Outer boundary of the copper (round: a circle; keystone: arcs and radial sides).</param>
/// <param name="WindingWindow">Inner boundary of the copper (the former's core).</param>
/// <param name="HeightMm">Axial height of the winding (= the former's winding window height).</param>
/// <param name="Turns">Turns per coil.</param>
/// <param name="WireOverallMm">Overall (enamelled) wire diameter, sizes the lead slot and grooves.</param>
/// <param name="SensorAnglesDeg">Mechanical angles of the timing sensors, machine frame (coil 0 at 0), empty for none.</param>
/// <param name="SensorRadiusMm">Radius of the sensor centres (the electrical engine places them on the coil pitch radius).</param>
public sealed record CoilGeometry(double PitchRadiusMm, Contour WindingOutline, Contour WindingWindow, double HeightMm,
    int Turns, double WireOverallMm, IReadOnlyList<double> SensorAnglesDeg, double SensorRadiusMm);
