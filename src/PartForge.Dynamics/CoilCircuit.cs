namespace PartForge.Dynamics;

/// <summary>
/// One coil circuit (a "phase": one coil or several in series). Its terminal voltage, positive current flowing
/// in at the + terminal (motor convention), is v = R i + L di/dt + e with back-EMF e = d lambda/d theta x omega;
/// the torque it makes is T = i d lambda/d theta (air-cored, L constant, no mutual inductance).
/// </summary>
/// <param name="ResistanceOhm">Resistance at the running temperature, ohm (more than 0).</param>
/// <param name="InductanceH">Self inductance, H (0 or more; 0 is the quasi-static limit, solved algebraically).</param>
/// <param name="Flux">Flux linkage against the mechanical rotor angle.</param>
/// <param name="Connection">What the circuit's terminals are connected to.</param>
public sealed record CoilCircuit(double ResistanceOhm, double InductanceH, FluxSeries Flux, CircuitConnection Connection);
