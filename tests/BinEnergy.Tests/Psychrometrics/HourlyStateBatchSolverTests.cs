using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Weather;
using BinEnergy.Tests.Weather;

namespace BinEnergy.Tests.Psychrometrics;

/// <summary>
/// The vectorised batch solver must give the roots of the Brent-based <see cref="MoistAir"/> functions (the reference,
/// solved by MathNet), on a grid over the weather range and on every hour of the six real weather files.
/// </summary>
public sealed class HourlyStateBatchSolverTests
{
    [Theory]
    [MemberData(nameof(RealWeatherFileTests.All), MemberType = typeof(RealWeatherFileTests))]
    public void WetBulbs_MatchTheBrentSolver_OnEveryHourOfTheRealFiles(string name)
    {
        var w = RealWeatherFileTests.Read(name);
        double worst = 0;
        for (int i = 0; i < w.Count; i++)
        {
            double brent = MoistAir.WetBulb(w.DryBulbC[i], w.HumidityRatio[i], w.PressurePa[i]);
            worst = Math.Max(worst, Math.Abs(w.WetBulbC[i] - brent));
        }

        // Brent stops within 1e-7 K of the root (MoistAir.SolverAccuracyK); the batch solver's Newton steps end closer.
        Assert.True(worst < 1e-6, $"{name}: largest difference {worst:E2} K");
    }

    [Fact]
    public void HumidityRatiosAndRelativeHumidities_AreTheSameWhereverAnHourStands()
    {
        // The parser solves each half of a file at its own offset, the builder at another: every hour must come out to
        // the same bit whether it falls in a full vector or in the padded last few.
        var w = RealWeatherFileTests.Read("725300TYA.CSV");
        const int n = 11;
        var whole = new double[n];
        var rh = new double[n];
        HourlyStateBatchSolver.HumidityRatiosFromDewPoints(w.DewPointC.AsSpan(100, n), w.PressurePa.AsSpan(100, n), whole);
        HourlyStateBatchSolver.RelativeHumidities(w.DryBulbC.AsSpan(100, n), w.HumidityRatio.AsSpan(100, n), w.PressurePa.AsSpan(100, n), rh);
        for (int start = 1; start < 4; start++)
        {
            var part = new double[n - start];
            HourlyStateBatchSolver.HumidityRatiosFromDewPoints(w.DewPointC.AsSpan(100 + start, n - start), w.PressurePa.AsSpan(100 + start, n - start), part);
            Assert.Equal(whole[start..], part);
            HourlyStateBatchSolver.RelativeHumidities(w.DryBulbC.AsSpan(100 + start, n - start), w.HumidityRatio.AsSpan(100 + start, n - start), w.PressurePa.AsSpan(100 + start, n - start), part);
            Assert.Equal(rh[start..], part);
        }
    }

    [Theory]
    [MemberData(nameof(RealWeatherFileTests.All), MemberType = typeof(RealWeatherFileTests))]
    public void EightHoursToAVector_GiveTheSameBitsAsFour(string name)
    {
        // Where the processor has AVX-512 the solver takes eight hours to a vector, elsewhere four: the runtime computes
        // each lane of its Exp and Log alike, so every hour must come out the same either way (on a processor without
        // AVX-512 the eight-lane path runs in software, more slowly, to the same bits).
        var w = RealWeatherFileTests.Read(name);
        var four = new double[w.Count];
        var eight = new double[w.Count];
        HourlyStateBatchSolver.WetBulbs(w.DryBulbC, w.HumidityRatio, w.PressurePa, w.DewPointC, four, wide: false);
        HourlyStateBatchSolver.WetBulbs(w.DryBulbC, w.HumidityRatio, w.PressurePa, w.DewPointC, eight, wide: true);
        Assert.Equal(four, eight);
        HourlyStateBatchSolver.VapourPressures(w.DryBulbC, four, wide: false);
        HourlyStateBatchSolver.VapourPressures(w.DryBulbC, eight, wide: true);
        Assert.Equal(four, eight);
    }

    [Fact]
    public void WetBulbsOfRecord_OnTwoThreads_EqualTheSingleThreadSolveExactly()
    {
        var w = RealWeatherFileTests.Read("725300TYA.CSV");
        Assert.True(w.Count >= HourlyStateBatchSolver.ParallelHours);
        var single = new double[w.Count];
        HourlyStateBatchSolver.WetBulbs(w.DryBulbC.AsSpan(), w.HumidityRatio, w.PressurePa, w.DewPointC, single);
        var split = new double[w.Count];
        HourlyStateBatchSolver.WetBulbsOfRecord(w.DryBulbC, w.HumidityRatio, w.PressurePa, w.DewPointC, split);
        Assert.Equal(single, split);
        Assert.Equal(single, w.WetBulbC);
    }

    [Fact]
    public void WetBulbs_OfAWholeGrid_MatchTheBrentSolver_WhateverTheirNeighbours()
    {
        // Dry-bulb -40..50 C, RH 2..100 %, three pressures, in one batch of odd length (so the last block is padded):
        // the states near 0 C with a root on each side of it are among them.
        var states = new List<(double T, double W, double P)>();
        foreach (double p in new[] { 101_325.0, 83_400.0, 70_000.0 })
        {
            for (double t = -40; t <= 50; t += 0.7)
            {
                foreach (double rh in new[] { 0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.8, 0.97, 1.0 })
                {
                    states.Add((t, MoistAir.HumidityRatioFromRelativeHumidity(t, rh, p), p));
                }
            }
        }

        if (states.Count % 4 == 0)
        {
            states.RemoveAt(states.Count - 1);
        }

        var dry = states.Select(s => s.T).ToArray();
        var w = states.Select(s => s.W).ToArray();
        var pressure = states.Select(s => s.P).ToArray();
        var dew = states.Select(s => HourlyStateSolver.DewPoint(s.W, s.P, s.T)).ToArray();
        var batch = new double[states.Count];
        HourlyStateBatchSolver.WetBulbs(dry, w, pressure, dew, batch);
        for (int i = 0; i < states.Count; i++)
        {
            // Near -40 C the Brent solver stops on |f| < 1e-7 kg/kg, up to 2e-4 K from the root (see HourlyStateSolverTests).
            Assert.True(Math.Abs(batch[i] - MoistAir.WetBulb(dry[i], w[i], pressure[i])) < 1e-3, $"state {i}: {states[i]}");

            // The same hour alone gives the same answer: neighbours in a vector do not change a result.
            Assert.Equal(batch[i], HourlyStateSolverTests.BatchWetBulb(dry[i], w[i], pressure[i], dew[i]));
        }
    }

    [Fact]
    public void WetBulbs_WithARootOnEachSideOfZero_TakeTheRootTheReferenceBisectionTakes()
    {
        // Chicago TMY3, 18 March 09:00 (line 1843 of the file): 4.4 C dry-bulb, -7.2 C dew point, 99.3 kPa (the file's
        // own values). Eq. 35 has a root at -0.284 C and eq. 33 one at +0.022 C; bisection over [dew point, dry-bulb]
        // reaches the one over ice, as psychrolib's does (see PsychrolibAgreementTests for the convention).
        double t = 4.4, dewPoint = -7.2, p = 99_300;
        double w = MoistAir.HumidityRatioFromDewPoint(dewPoint, p);
        double reference = MoistAir.WetBulb(t, w, p);
        Assert.True(reference < 0, $"reference {reference}");
        Assert.Equal(reference, HourlyStateSolverTests.BatchWetBulb(t, w, p, dewPoint), 6);
    }

    [Fact]
    public void BisectionPick_ReplaysTheSignsOfBisection()
    {
        // Residual negative below -0.3, positive to 0, negative to 0.02, positive above. Over [-7.2, 4.4] the
        // midpoints are -1.4 (negative), 1.5 (positive), 0.05 (positive), -0.675 (negative), -0.3125 (negative),
        // -0.131 (positive): from there on the interval lies below 0, around the root over ice.
        Assert.Equal(-0.3, HourlyStateBatchSolver.BisectionPick(-7.2, 4.4, -0.3, 0.02));

        // Over [-1, 3] the first midpoint 1 is positive, the second 0 is in doubt (it is where the equations switch).
        Assert.Null(HourlyStateBatchSolver.BisectionPick(-1, 3, -0.3, 0.02));

        // Over [-0.4, 0.1] the first midpoint -0.15 lies between the root over ice and 0 (positive): the root over ice.
        Assert.Equal(-0.3, HourlyStateBatchSolver.BisectionPick(-0.4, 0.1, -0.3, 0.02));

        // Over [-0.1, 0.12] the first midpoint 0.01 lies between 0 and the root over water (negative): the root over water.
        Assert.Equal(0.02, HourlyStateBatchSolver.BisectionPick(-0.1, 0.12, -0.3, 0.02));
    }

    [Theory]
    [MemberData(nameof(RealWeatherFileTests.All), MemberType = typeof(RealWeatherFileTests))]
    public void HumidityRatiosAndRelativeHumidities_EqualTheScalarEquations_OnEveryHourOfTheRealFiles(string name)
    {
        var w = RealWeatherFileTests.Read(name);
        var ratios = new double[w.Count];
        HourlyStateBatchSolver.HumidityRatiosFromDewPoints(w.DewPointC, w.PressurePa, ratios);
        var rh = new double[w.Count];
        HourlyStateBatchSolver.RelativeHumidities(w.DryBulbC, w.HumidityRatio, w.PressurePa, rh);
        var enthalpy = new double[w.Count];
        HourlyStateBatchSolver.Enthalpies(w.DryBulbC, w.HumidityRatio, enthalpy);
        for (int i = 0; i < w.Count; i++)
        {
            Assert.Equal(MoistAir.Enthalpy(w.DryBulbC[i], w.HumidityRatio[i]), enthalpy[i]); // eq. 32: the same operations, the same bits

            // The scalar eq. 20 and eq. 12 (Handbook ch. 1); the vector exponential agrees with Math.Exp to a few units in
            // the last place, so the two agree to about 1e-15 relative.
            double ratio = MoistAir.HumidityRatioFromDewPoint(w.DewPointC[i], w.PressurePa[i]);
            Assert.Equal(ratio, ratios[i], 1e-13 * ratio);
            Assert.Equal(Math.Min(100.0, MoistAir.RelativeHumidity(w.DryBulbC[i], w.HumidityRatio[i], w.PressurePa[i]) * 100.0), rh[i], 1e-11);
        }
    }

    [Fact]
    public void HumidityRatiosFromDewPoints_AVapourPressureAboveThePressure_RaisesTheScalarError()
    {
        double[] dew = [10, 10, 10, 10, 10, 10, 10, 10];
        double[] pressure = [101_325, 101_325, 101_325, 101_325, 101_325, 1_000, 101_325, 101_325]; // 1 kPa: below p_ws(10 C) = 1.23 kPa
        Assert.Throws<PsychrometricException>(() => HourlyStateBatchSolver.HumidityRatiosFromDewPoints(dew, pressure, new double[8]));
    }

    [Fact]
    public void VapourPressures_MatchTheScalarEquations()
    {
        var temperatures = Enumerable.Range(0, 3001).Select(k => -100 + k * 0.1).ToArray();
        var batch = new double[temperatures.Length];
        HourlyStateBatchSolver.VapourPressures(temperatures, batch);
        for (int i = 0; i < temperatures.Length; i++)
        {
            double scalar = Saturation.VapourPressurePa(temperatures[i]);
            // ln p_ws sums terms up to about 60 in size (eq. 5 at -100 C), so rounding alone leaves about 60 x 2.2e-16.
            Assert.True(Math.Abs(batch[i] / scalar - 1) < 1e-13, $"{temperatures[i]} C: {batch[i]} vs {scalar}");
        }

        Assert.Throws<PsychrometricException>(() => HourlyStateBatchSolver.VapourPressures([10, 20, 250, 30], new double[4]));
    }
}
