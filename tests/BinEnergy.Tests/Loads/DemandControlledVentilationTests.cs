using BinEnergy.Core.Loads;

namespace BinEnergy.Tests.Loads;

/// <summary>Demand-controlled ventilation multipliers of the ventilation rate procedure (invented rates).</summary>
public class DemandControlledVentilationTests
{
    [Fact]
    public void HalfOccupancy_HalvesOnlyThePeoplePart()
    {
        // Invented zone: 40 people x 5 cfm = 200 cfm people part, 10,000 ft2 x 0.06 cfm/ft2 = 600 cfm area part.
        var rate = VentilationRate.FromIp(40, 5, 10_000, 0.06);
        var m = rate.DemandControlledMultipliers(Enumerable.Repeat(0.5, 24).ToArray());

        // ASHRAE Standard 62.1 ventilation rate procedure, people part reset by occupancy (recalled from memory):
        // (200 x 0.5 + 600) / (200 + 600) = 0.875.
        Assert.All(m, f => Assert.Equal(0.875, f, 12));
    }

    [Fact]
    public void FullOccupancy_GivesExactlyTheDesignAirflow()
    {
        var rate = VentilationRate.FromIp(40, 5, 10_000, 0.06);
        var m = rate.DemandControlledMultipliers(Enumerable.Repeat(1.0, 24).ToArray());
        Assert.All(m, f => Assert.Equal(1.0, f)); // invariant: a full profile changes nothing
    }
}
