using PartForge.Dynamics.Engine;
using D = PartForge.Dynamics.Engine.DormandPrince;

namespace PartForge.Dynamics.Tests.Engine;

public class DormandPrinceTests
{
    // Source: Butcher's order conditions up to order 5 (Hairer, Norsett & Wanner, Solving ODEs I, II.2, table 2.2),
    // checked on the tableau's 5th-order weights, and order 4 on the embedded weights (b - e).
    [Fact]
    public void TableauMeetsTheOrderConditions()
    {
        double[] c = [0, D.C2, D.C3, D.C4, D.C5, 1, 1];
        double[,] a = new double[7, 7];
        a[1, 0] = D.A21;
        a[2, 0] = D.A31; a[2, 1] = D.A32;
        a[3, 0] = D.A41; a[3, 1] = D.A42; a[3, 2] = D.A43;
        a[4, 0] = D.A51; a[4, 1] = D.A52; a[4, 2] = D.A53; a[4, 3] = D.A54;
        a[5, 0] = D.A61; a[5, 1] = D.A62; a[5, 2] = D.A63; a[5, 3] = D.A64; a[5, 4] = D.A65;
        a[6, 0] = D.A71; a[6, 2] = D.A73; a[6, 3] = D.A74; a[6, 4] = D.A75; a[6, 5] = D.A76;
        double[] b = [D.A71, 0, D.A73, D.A74, D.A75, D.A76, 0];
        double[] e = [D.E1, 0, D.E3, D.E4, D.E5, D.E6, D.E7];
        double[] bh = b.Select((x, i) => x - e[i]).ToArray();
        for (int i = 0; i < 7; i++)
        {
            double row = 0;
            for (int j = 0; j < 7; j++) row += a[i, j];
            Assert.Equal(c[i], row, 14); // row sums = nodes
        }
        double S(double[] w, Func<int, double> g) => Enumerable.Range(0, 7).Sum(i => w[i] * g(i));
        double Ac(int i, Func<int, double> g) => Enumerable.Range(0, 7).Sum(j => a[i, j] * g(j));
        foreach (var (w, order) in new[] { (b, 5), (bh, 4) })
        {
            Assert.Equal(1.0, S(w, _ => 1), 14);
            Assert.Equal(1.0 / 2, S(w, i => c[i]), 14);
            Assert.Equal(1.0 / 3, S(w, i => c[i] * c[i]), 14);
            Assert.Equal(1.0 / 6, S(w, i => Ac(i, j => c[j])), 14);
            Assert.Equal(1.0 / 4, S(w, i => c[i] * c[i] * c[i]), 14);
            Assert.Equal(1.0 / 8, S(w, i => c[i] * Ac(i, j => c[j])), 14);
            Assert.Equal(1.0 / 12, S(w, i => Ac(i, j => c[j] * c[j])), 14);
            Assert.Equal(1.0 / 24, S(w, i => Ac(i, j => Ac(j, k => c[k]))), 14);
            if (order < 5) continue;
            Assert.Equal(1.0 / 5, S(w, i => Math.Pow(c[i], 4)), 14);
            Assert.Equal(1.0 / 10, S(w, i => c[i] * c[i] * Ac(i, j => c[j])), 14);
            Assert.Equal(1.0 / 15, S(w, i => c[i] * Ac(i, j => c[j] * c[j])), 14);
            Assert.Equal(1.0 / 30, S(w, i => c[i] * Ac(i, j => Ac(j, k => c[k]))), 14);
            Assert.Equal(1.0 / 20, S(w, i => Math.Pow(Ac(i, j => c[j]), 2)), 14);
            Assert.Equal(1.0 / 20, S(w, i => Ac(i, j => Math.Pow(c[j], 3))), 14);
            Assert.Equal(1.0 / 40, S(w, i => Ac(i, j => c[j] * Ac(j, k => c[k]))), 14);
            Assert.Equal(1.0 / 60, S(w, i => Ac(i, j => Ac(j, k => c[k] * c[k]))), 14);
            Assert.Equal(1.0 / 120, S(w, i => Ac(i, j => Ac(j, k => Ac(k, l => c[l])))), 14);
        }
        // The 4th-order weights differ: the embedded estimate is not identically zero.
        Assert.True(e.Sum(Math.Abs) > 0.01);
    }

    private sealed class Oscillator : IRightHandSide
    {
        public void Evaluate(ReadOnlySpan<double> y, Span<double> dydt)
        {
            dydt[0] = y[1];
            dydt[1] = -y[0];
        }
    }

    private sealed class Riccati : IRightHandSide
    {
        public void Evaluate(ReadOnlySpan<double> y, Span<double> dydt)
        {
            dydt[0] = y[0] * y[0];
            dydt[1] = 0;
        }
    }

    // Source: analytic solutions y = cos t of y'' = -y and y = 1/(1 - t) of y' = y^2. One step's error must fall
    // as h^6 (order 5); the continuous extension's error inside the step at least as h^5 (order 4; on the linear
    // oscillator it happens to be h^6), and it must meet the step's ends.
    [Fact]
    public void StepAndContinuousExtensionHaveTheirOrders()
    {
        var f = new Oscillator();
        double StepErr(double h, double s)
        {
            var dp = new D(2);
            var y = new[] { 1.0, 0.0 };
            dp.SetDerivative(f, y);
            dp.Attempt(f, y, h, [1, 1], 0, [true, true]);
            dp.PrepareDense(y, h);
            if (s == 1) return Math.Abs(dp.YNew[0] - Math.Cos(h));
            Assert.Equal(dp.YNew[0], dp.Dense(0, 1.0), 15);
            Assert.Equal(1.0, dp.Dense(0, 0.0), 15);
            return Math.Abs(dp.Dense(0, s) - Math.Cos(s * h));
        }
        double ratioStep = StepErr(0.2, 1) / StepErr(0.1, 1);
        Assert.InRange(ratioStep, 0.8 * 64, 1.25 * 64);
        double ratioDense = StepErr(0.2, 0.37) / StepErr(0.1, 0.37);
        Assert.InRange(ratioDense, 0.7 * 32, 1.25 * 64);

        var g = new Riccati();
        double DenseErr(double h, double s)
        {
            var dp = new D(2);
            var y = new[] { 1.0, 0.0 };
            dp.SetDerivative(g, y);
            dp.Attempt(g, y, h, [1, 1], 0, [true, true]);
            dp.PrepareDense(y, h);
            return Math.Abs(dp.Dense(0, s) - 1 / (1 - s * h));
        }
        double ratioNonlinear = DenseErr(0.02, 0.37) / DenseErr(0.01, 0.37);
        Assert.InRange(ratioNonlinear, 0.8 * 32, 1.25 * 32);
    }

    // Source: false position on a function with a known root.
    [Fact]
    public void RootFinderStaysOnThePastSide()
    {
        double root = Math.PI / 5;
        double s = RootFinder.Locate(x => root - x, false, 0, root, 1, root - 1);
        Assert.True(root - s < 0);
        Assert.Equal(root, s, 12);
        double si = RootFinder.Locate(x => Math.Cos(3 * x) - 0.2, true, 0, 0.8, 0.7, Math.Cos(2.1) - 0.2);
        Assert.True(Math.Cos(3 * si) - 0.2 <= 0);
        Assert.Equal(Math.Acos(0.2) / 3, si, 12);
    }
}
