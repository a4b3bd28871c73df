namespace PartForge.Export.Bom;

/// <summary>
/// The wire to buy: the electrical engine's total (every coil's turns and leads) plus a spare for the
/// start of the reel, test windings and mistakes: 10 % of the total plus 1 m (common practice of the trade,
/// our documented choice).
/// </summary>
public static class WireSpare
{
    public const double Fraction = 0.10;
    public const double FixedM = 1.0;

    public static double ToBuyM(double electricalTotalM) => electricalTotalM * (1 + Fraction) + FixedM;

    public const string Rule = "10% + 1 m spare";
}
