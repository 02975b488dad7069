using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Tests.Psychrometrics;

/// <summary>
/// The reader's solvers (the Newton dew point and wet-bulb) must find the same roots as the Brent-based
/// <see cref="MoistAir"/> functions, here over the weather range and in <c>RealWeatherFileTests</c> on every hour of the real files.
/// </summary>
public sealed class HourlyStateSolverTests
{
    [Fact]
    public void WetBulbAndDewPoint_MatchTheBrentSolvers_OverTheWeatherRange()
    {
        int checkedStates = 0;
        foreach (double p in new[] { 101_325.0, 83_400.0, 70_000.0 })
        {
            for (double t = -40; t <= 50; t += 2.5)
            {
                foreach (double rh in new[] { 0.02, 0.1, 0.3, 0.5, 0.8, 0.97, 1.0 })
                {
                    double w = MoistAir.HumidityRatioFromRelativeHumidity(t, rh, p);
                    double dp = HourlyStateSolver.DewPoint(w, p, t);
                    Assert.True(Math.Abs(dp - MoistAir.DewPoint(w, p)) < 1e-5, $"t {t} rh {rh} p {p}: {dp} vs {MoistAir.DewPoint(w, p)}");
                    // Near -40 C the Brent solver stops on |f| < 1e-7 kg/kg, up to 2e-4 K from the root; the Newton root
                    // must satisfy eqs. 33/35 at least as well, and lie within 1e-3 K.
                    double brent = MoistAir.WetBulb(t, w, p);
                    double fast = HourlyStateSolver.WetBulb(t, w, p);
                    Assert.True(Math.Abs(fast - brent) < 1e-3, $"t {t} rh {rh} p {p}: fast {fast} brent {brent}");
                    double residual(double x) => Math.Abs(x >= t ? 0 : MoistAir.HumidityRatioFromWetBulb(t, x, p) - w);
                    // Margin 4e-10 kg/kg = 1e-6 K of wet-bulb (h_fg / c_p = 2,486 K per kg/kg): main's scaled Brent
                    // residual can be far below the Newton one, which is still accurate to a micro-kelvin.
                    Assert.True(residual(fast) <= residual(brent) + 4e-10, $"t {t}, rh {rh}: {residual(fast):E2} vs {residual(brent):E2}");
                    checkedStates++;
                }
            }
        }

        Assert.True(checkedStates > 700);
    }

    [Fact]
    public void WetBulb_WhereTheBracketStraddlesFreezing_MatchesTheReferenceBisection()
    {
        // Dry-bulb above 0 C with the frost point below it: the wet-bulb may lie on either equation (33 over water, 35
        // over ice). The Newton root on the side the residuals point to must be the reference solver's root
        // (bisection, the convention of psychrolib) to 1e-6 K, on a fine grid of such states at two pressures.
        int states = 0;
        foreach (double p in new[] { 101_325.0, 80_000.0 })
        {
            for (double t = 0.05; t <= 12; t += 0.05)
            {
                for (double rh = 0.02; rh <= 0.9; rh += 0.01)
                {
                    double w = MoistAir.HumidityRatioFromRelativeHumidity(t, rh, p);
                    if (MoistAir.DewPoint(w, p) >= 0)
                    {
                        continue;
                    }

                    double reference = MoistAir.WetBulb(t, w, p);
                    double fast = HourlyStateSolver.WetBulb(t, w, p);
                    Assert.True(Math.Abs(fast - reference) < 1e-6, $"t {t} rh {rh} p {p}: fast {fast} reference {reference}");
                    states++;
                }
            }
        }

        Assert.True(states > 10_000, $"{states} states");
    }

    [Fact]
    public void WetBulb_OfHandbookState_MatchesTheTable()
    {
        // 30 C dry-bulb, 20 C wet-bulb at 101.325 kPa: W = 0.010 kg/kg within about 1 % (ASHRAE Fundamentals 2017 ch. 1, example 2 style state; recalled from memory)
        double p = 101_325;
        double w = MoistAir.HumidityRatioFromWetBulb(30, 20, p);
        Assert.InRange(w, 0.0099, 0.0107);
        Assert.Equal(20, HourlyStateSolver.WetBulb(30, w, p), 5);
    }
}
