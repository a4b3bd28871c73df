namespace PartForge.Dynamics.Engine;

/// <summary>
/// One conduction path of a circuit port (or of a six-step leg) for one sign of the coil current: the port
/// voltage is v = Sigma V_bus - Rho (switch drops + diode drops) - (resistances) i, the current it draws from
/// the store is Sigma i, and it exists only while Rho i is positive (Rho 0: a resistive load, both signs).
/// </summary>
internal readonly record struct Branch(int Sigma, int Rho, double SwitchDropV, double SwitchOhm, double DiodeDropV, double DiodeOhm, double LoadOhm)
{
    /// <summary>Port voltage at zero current for a bus (store terminal) voltage vBus.</summary>
    public double OpenV(double vBus) => Sigma * vBus - Rho * (SwitchDropV + DiodeDropV);

    /// <summary>Total series resistance of the path.</summary>
    public double Ohm => SwitchOhm + DiodeOhm + LoadOhm;

    public static Branch Switches(int sigma, int rho, int count, SwitchModel s) =>
        new(sigma, rho, count * s.OnDropV, count * s.OnResistanceOhm, 0, 0, 0);

    public static Branch Diodes(int sigma, int rho, int count, DiodeModel d) =>
        new(sigma, rho, 0, 0, count * d.ForwardDropV, count * d.ResistanceOhm, 0);

    public static Branch Load(double ohm) => new(0, 0, 0, 0, 0, 0, ohm);
}
