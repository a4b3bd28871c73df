namespace PartForge.Export.Drawings;

/// <summary>One line of a plot: a label, the sample points and a CSS colour.</summary>
public sealed record PlotSeries(string Label, IReadOnlyList<double> X, IReadOnlyList<double> Y, string Colour);
