using PartForge.Electrical.Flux;
using M = PartForge.Design.Model;

namespace PartForge.Electrical.Tests.Flux;

public class EmfTests
{
    /// <summary>Invented near-sinusoidal machine: a large magnetic gap relative to the pole pitch filters the harmonics.</summary>
    public static M.Design NearSine()
    {
        var d = TestDesigns.Crank();
        return Copy.With(d, machine: new M.Machine { Layout = "dual-rotor", Poles = 16, Coils = 12, Phases = 3, Connection = "star", RatedRpm = 500, MaxRpm = 900 },
            magnets: new M.Magnets { Shape = "disc", Diameter = 10, Thickness = 4, Grade = "N42", PitchRadius = 40 }, gap: new M.Gap { AirGap = 4 });
    }

    // Source: docs/physics.md §4 (Faraday, e = N dPhi/dt; for sinusoidal flux E_rms = 4.4429 f N Phi_max;
    // phase EMF = 4.44 f N_ph Phi k_w with the pitch factor NOT applied again when Phi is the flux the coil links).
    [Fact]
    public void FaradayConsistencyNearSinusoidal()
    {
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(NearSine()));
        Assert.True(r.Phase!.ThdPercent < 3, $"THD {r.Phase.ThdPercent}");
        double f = r.ElectricalHz;
        Assert.Equal(16 / 2 * 500 / 60.0, f, 12);
        Assert.Equal(4.4429 * f * r.CoilFluxLinkagePeakWb, r.CoilEmfRmsV, r.CoilEmfRmsV * 0.01);
        double kd = r.Winding.DistributionFactor;
        Assert.Equal(4.4429 * f * r.Phase.CoilsInSeries * r.CoilFluxLinkagePeakWb * kd, r.Phase.EmfRmsV, r.Phase.EmfRmsV * 0.01);
    }

    // Source: worked example computed from the formula (docs/physics.md §4): 12 poles at 500 rpm -> 50 Hz; N 100, Phi_max 2e-5 Wb -> 0.4443 V rms.
    [Fact]
    public void WorkedFrequencyExample()
    {
        var d = TestDesigns.Crank();
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        Assert.Equal(6 * 400 / 60.0, r.ElectricalHz, 12);
        Assert.Equal(0.4443, 4.4429 * (6 * 500 / 60.0) * 100 * 2e-5, 4);
    }

    // Faraday, numerically: the coil EMF waveform is omega x d lambda / d theta of the flux waveform (central differences).
    [Fact]
    public void EmfIsTheNumericalDerivativeOfFluxLinkage()
    {
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(TestDesigns.Crank()));
        var s = r.FluxLinkage!;
        double w = 2 * Math.PI * r.RatedRpm / 60;
        var th = r.Waveforms!.ThetaMechDeg;
        double peak = r.Waveforms.CoilEmfV.Max(Math.Abs);
        for (int i = 0; i < th.Count; i++)
        {
            double t = th[i] * Math.PI / 180, h = 1e-6;
            double num = (s.At(t + h) - s.At(t - h)) / (2 * h) * w;
            Assert.Equal(num, r.Waveforms.CoilEmfV[i], peak * 1e-5);
        }
    }

    // Source: docs/physics.md §4: star line voltage = difference of two phase waveforms 120 degrees apart;
    // sqrt(3) x phase only for sinusoids (triplens cancel). Checked on the waveforms here.
    [Fact]
    public void LineFromPhaseWaveforms()
    {
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(TestDesigns.Crank()));
        var wv = r.Waveforms!;
        var diff = wv.PhaseEmfV[0].Zip(wv.PhaseEmfV[1], (a, b) => a - b).ToArray();
        double rms = Math.Sqrt(diff.Sum(v => v * v) / diff.Length);
        Assert.Equal(rms, r.LineEmfRmsV, r.LineEmfRmsV * 1e-9);
        // The crank's EMF has a third harmonic, so its line RMS is below sqrt(3) x phase RMS by exactly the triplens.
        double nonTriplen = Math.Sqrt(r.Harmonics.Where(h => h.Order % 3 != 0).Sum(h => h.PeakV * h.PeakV) / 2);
        Assert.Equal(Math.Sqrt(3) * nonTriplen, r.LineEmfRmsV, r.LineEmfRmsV * 1e-6);
        var s = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(NearSine()));
        Assert.Equal(Math.Sqrt(3) * s.Phase!.EmfRmsV, s.LineEmfRmsV, s.LineEmfRmsV * 0.005);
        // ke: line EMF per 1000 rpm.
        Assert.Equal(r.LineEmfRmsV * 1000 / r.RatedRpm, r.KeVPerKrpm, 1e-9);
    }

    // The three phases are equal and 120 degrees apart (balanced winding).
    [Fact]
    public void PhasesAreBalanced()
    {
        var r = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(TestDesigns.Large()));
        var wv = r.Waveforms!;
        int m = wv.ThetaElecDeg.Count, shift = m / 3;
        for (int i = 0; i < m; i++)
        {
            Assert.Equal(wv.PhaseEmfV[0][i], wv.PhaseEmfV[1][(i + shift) % m], 1e-9 * r.Phase!.EmfPeakV + 1e-12);
            Assert.Equal(wv.PhaseEmfV[1][i], wv.PhaseEmfV[2][(i + shift) % m], 1e-9 * r.Phase.EmfPeakV + 1e-12);
        }
    }

    // Dual rotor: the two rotors' fields add, so removing the back rotor (single rotor, same stack) lowers the EMF.
    [Fact]
    public void DualRotorFieldsAdd()
    {
        var d = TestDesigns.Crank();
        var dual = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var single = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(Copy.With(d, machine: Copy.Machine(d.Machine, layout: "single-rotor"))));
        Assert.InRange(dual.CoilFluxLinkagePeakWb / single.CoilFluxLinkagePeakWb, 1.6, 2.0);
        // Back iron raises the flux (image method).
        var iron = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(Copy.With(d, machine: Copy.Machine(d.Machine, layout: "single-rotor"), rotor: Copy.Rotor(d.Rotor, new M.BackIron { Thickness = 2 }))));
        Assert.True(iron.CoilFluxLinkagePeakWb > single.CoilFluxLinkagePeakWb);
        Assert.True(iron.Magnet.BackIronImageModel);
    }
}
