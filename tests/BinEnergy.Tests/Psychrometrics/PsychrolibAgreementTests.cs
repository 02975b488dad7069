using System.Text.Json.Serialization;
using BinEnergy.Core.Psychrometrics;
using BinEnergy.Core.Units;
using BinEnergy.Tests.Support;

namespace BinEnergy.Tests.Psychrometrics;

/// <summary>
/// The engine against the npm package psychrolib 1.1.1 (an open implementation of ASHRAE
/// Handbook—Fundamentals 2017 ch. 1), in psychrolib's SI mode, because the handbook's IP and SI
/// equations are not exact conversions of each other. Tolerances are the contract.
/// </summary>
public class PsychrolibAgreementTests
{
    private sealed record Input([property: JsonPropertyName("t_c")] double TC, [property: JsonPropertyName("rh")] double Rh, [property: JsonPropertyName("z_m")] double ZM);

    private sealed record Output(
        [property: JsonPropertyName("p_pa")] double PPa,
        [property: JsonPropertyName("w")] double W,
        [property: JsonPropertyName("v")] double V,
        [property: JsonPropertyName("h")] double H,
        [property: JsonPropertyName("tdp_c")] double TdpC,
        [property: JsonPropertyName("twb_c")] double TwbC,
        [property: JsonPropertyName("rho")] double Rho);

    /// <summary>-40..120 F in 4 F steps (41), RH 5..100 % (11), 0..10,000 ft (5): 2,255 states.</summary>
    private static List<Input> Grid()
    {
        var states = new List<Input>();
        double[] rhs = [0.05, 0.10, 0.20, 0.30, 0.40, 0.50, 0.60, 0.70, 0.80, 0.90, 1.00];
        double[] feet = [0, 2500, 5000, 7500, 10000];
        for (double f = -40; f <= 120; f += 4)
        {
            foreach (double rh in rhs)
            {
                foreach (double z in feet)
                {
                    states.Add(new Input(Conversions.FahrenheitToCelsius(f), rh, z * Conversions.MetresPerFoot));
                }
            }
        }

        return states;
    }

    [Fact]
    public void MoistAirProperties_MatchPsychrolibOverTheWholeRange()
    {
        var grid = Grid();
        Assert.True(grid.Count >= 2000);
        var reference = NodeReference.Run<List<Output>>("psychrolib-states.js", grid);
        Assert.Equal(grid.Count, reference.Count);

        var failures = new List<string>();
        double worstW = 0, worstV = 0, worstH = 0, worstDp = 0, worstWb = 0;
        for (int i = 0; i < grid.Count; i++)
        {
            var s = grid[i];
            var r = reference[i];
            double p = Atmosphere.PressureAtElevationPa(s.ZM);
            double w = MoistAir.HumidityRatioFromRelativeHumidity(s.TC, s.Rh, p);
            double v = MoistAir.SpecificVolume(s.TC, w, p);
            double h = MoistAir.Enthalpy(s.TC, w);
            double dp = MoistAir.DewPoint(w, p);
            double wb = MoistAir.WetBulb(s.TC, w, p);

            double dW = Math.Abs(w - r.W) / r.W;
            double dV = Math.Abs(v - r.V) / r.V;
            double dH = Math.Abs(h - r.H);
            double hTol = Math.Max(0.0005 * Math.Abs(r.H), 20.0); // 0.05 % or 0.02 kJ/kg (20 J/kg), whichever is larger
            double dDpF = Math.Abs(dp - r.TdpC) * 1.8;
            double dWbF = Math.Abs(wb - r.TwbC) * 1.8;
            worstW = Math.Max(worstW, dW);
            worstV = Math.Max(worstV, dV);
            worstH = Math.Max(worstH, dH / hTol);
            worstDp = Math.Max(worstDp, dDpF);
            worstWb = Math.Max(worstWb, dWbF);
            if (Math.Abs(p - r.PPa) / r.PPa > 1e-9 || dW > 0.0005 || dV > 0.0005 || dH > hTol || dDpF > 0.02 || dWbF > 0.02)
            {
                failures.Add($"t={s.TC:0.00} C rh={s.Rh} z={s.ZM:0} m: W {w} vs {r.W}, v {v} vs {r.V}, h {h} vs {r.H}, dp {dp} vs {r.TdpC}, wb {wb} vs {r.TwbC}");
            }
        }

        Assert.True(failures.Count == 0,
            $"{failures.Count} of {grid.Count} states disagree (worst: W {worstW:P4}, v {worstV:P4}, h {worstH:0.00} of tolerance, dp {worstDp:0.0000} F, wb {worstWb:0.0000} F):\n"
            + string.Join("\n", failures.Take(10)));
    }
}
