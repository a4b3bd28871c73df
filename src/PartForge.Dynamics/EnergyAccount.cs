using System.Globalization;
using System.Text;

namespace PartForge.Dynamics;

/// <summary>
/// Where the energy went over a run, J, each term integrated alongside the states (or, for the stored terms,
/// taken from the end states). Sources: <see cref="StoreDeliveredJ"/> + <see cref="MechanicalInputJ"/>. Sinks:
/// every other term. <see cref="BalanceError"/> = |sources - sinks| / (largest single term).
/// </summary>
public sealed record EnergyAccount
{
    /// <summary>Energy delivered by the store's internal source (the capacitor, the battery's EMF, the supply):
    /// integral of V_source I; negative when the store is charged.</summary>
    public double StoreDeliveredJ { get; init; }

    /// <summary>Work done on the shaft by the prime mover (charge scenario), J.</summary>
    public double MechanicalInputJ { get; init; }

    /// <summary>Change of the rotor's kinetic energy 1/2 J omega^2, end minus start.</summary>
    public double KineticChangeJ { get; init; }

    /// <summary>Change of the energy in the coils' inductance 1/2 L i^2, end minus start.</summary>
    public double MagneticChangeJ { get; init; }

    /// <summary>Copper loss in the coil resistances.</summary>
    public double CopperLossJ { get; init; }

    /// <summary>Switch conduction loss (drop x current + on-resistance loss).</summary>
    public double SwitchConductionLossJ { get; init; }

    /// <summary>Switch turn-off loss without a freewheel: the 1/2 L i^2 of every forced current interruption.</summary>
    public double SwitchTurnOffLossJ { get; init; }

    /// <summary>Diode loss (drop x current + slope-resistance loss), freewheel and rectifier diodes.</summary>
    public double DiodeLossJ { get; init; }

    /// <summary>Loss in the store's ESR or internal resistance.</summary>
    public double StoreResistanceLossJ { get; init; }

    /// <summary>Energy into resistive loads.</summary>
    public double LoadJ { get; init; }

    /// <summary>Coulomb friction loss.</summary>
    public double FrictionLossJ { get; init; }

    /// <summary>Viscous drag loss.</summary>
    public double ViscousLossJ { get; init; }

    /// <summary>Sources minus sinks, J (ideally 0; measures the integration and event handling).</summary>
    public double ResidualJ =>
        StoreDeliveredJ + MechanicalInputJ - (KineticChangeJ + MagneticChangeJ + CopperLossJ + SwitchConductionLossJ
            + SwitchTurnOffLossJ + DiodeLossJ + StoreResistanceLossJ + LoadJ + FrictionLossJ + ViscousLossJ);

    /// <summary>|Residual| divided by the largest single term's magnitude (0 when every term is 0).</summary>
    public double BalanceError
    {
        get
        {
            double m = Terms().Max(t => Math.Abs(t.Value));
            return m > 0 ? Math.Abs(ResidualJ) / m : 0;
        }
    }

    /// <summary>The terms by name, in a fixed order (sources first).</summary>
    public IEnumerable<KeyValuePair<string, double>> Terms()
    {
        yield return new("store_delivered_j", StoreDeliveredJ);
        yield return new("mechanical_input_j", MechanicalInputJ);
        yield return new("kinetic_change_j", KineticChangeJ);
        yield return new("magnetic_change_j", MagneticChangeJ);
        yield return new("copper_loss_j", CopperLossJ);
        yield return new("switch_conduction_loss_j", SwitchConductionLossJ);
        yield return new("switch_turn_off_loss_j", SwitchTurnOffLossJ);
        yield return new("diode_loss_j", DiodeLossJ);
        yield return new("store_resistance_loss_j", StoreResistanceLossJ);
        yield return new("load_j", LoadJ);
        yield return new("friction_loss_j", FrictionLossJ);
        yield return new("viscous_loss_j", ViscousLossJ);
    }

    /// <summary>One line per term and the balance error, invariant culture.</summary>
    public override string ToString()
    {
        var sb = new StringBuilder();
        foreach (var t in Terms()) sb.Append(CultureInfo.InvariantCulture, $"{t.Key} {t.Value:G9}\n");
        sb.Append(CultureInfo.InvariantCulture, $"residual_j {ResidualJ:G6}\nbalance_error {BalanceError:G6}\n");
        return sb.ToString();
    }
}
