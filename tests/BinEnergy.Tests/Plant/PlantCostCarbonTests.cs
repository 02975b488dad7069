using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Tests.Plant;

public class PlantCostCarbonTests
{
    private static PlantSettings GasPlant() => new(
        HeatingSource.Gas,
        HeatingEfficiency: 0.85,
        HeatPumpCop: null,
        CoolingCop: PerformanceCurve.Create([(Conversions.FahrenheitToCelsius(65), 4.2), (Conversions.FahrenheitToCelsius(95), 3.2), (Conversions.FahrenheitToCelsius(110), 2.6)]),
        FanEfficiency: 0.6,
        HumidifierEfficiency: 1.0,
        Tariffs: new Dictionary<Fuel, FuelTariff>
        {
            // $1.10 per therm and 5.3 kg per therm; 1 therm = 100,000 Btu (DESIGN 3; NIST SP 811).
            [Fuel.Gas] = new(1.10 / FuelUnits.JoulesPerTherm, 5.3 / FuelUnits.JoulesPerTherm),
            // $0.14 per kWh and 0.40 kg per kWh; 1 kWh = 3.6 MJ (exact).
            [Fuel.Electricity] = new(0.14 / FuelUnits.JoulesPerKilowattHour, 0.40 / FuelUnits.JoulesPerKilowattHour),
        });

    [Fact]
    public void Humidifiers_HandWorked_SteamFromSupplyWaterOrHeatForAdiabatic()
    {
        // 100 kg of water added: the load is 100 x 2,501 kJ/kg = 250,100 kJ (h_fg at 0 C, Handbook ch. 1 eq. 32).
        // Steam-electric, efficiency 1: 100 kg x 2,630 kJ/kg (saturated steam at 100 C, 2,675.6, less 10 C water, 42.0:
        //   Handbook ch. 1 table 3, recalled from memory) = 263,000 kJ = 73.056 kWh.
        // Steam-gas, efficiency 0.8: 263,000 / 0.8 = 328,750 kJ = 3.1159 therm (1 therm = 105,505.6 kJ).
        // Adiabatic: the air is reheated by 250,100 kJ, bought through the gas furnace at 85 %: 294,235 kJ of gas.
        double load = 100 * 2_501_000.0;
        var clamps = new CurveClampCounter();
        var electric = new PlantModel(GasPlant()).Humidification(load, 0, 1, clamps);
        Assert.Equal(263_000_000.0 / 3_600_000.0, electric.ElectricityJ / 3_600_000.0, 6);
        Assert.Equal(0.0, electric.GasJ);

        var gas = new PlantModel(GasPlant() with { Humidifier = HumidifierType.SteamGas, HumidifierEfficiency = 0.8 }).Humidification(load, 0, 1, clamps);
        Assert.Equal(328_750_000.0, gas.GasJ, 1e-3);
        Assert.Equal(3.1159, gas.GasJ / FuelUnits.JoulesPerTherm, 4);
        Assert.Equal(0.0, gas.ElectricityJ);

        var adiabatic = new PlantModel(GasPlant() with { Humidifier = HumidifierType.Adiabatic }).Humidification(load, 0, 1, clamps);
        Assert.Equal(load / 0.85, adiabatic.GasJ, 1e-3);
        Assert.Equal(0.0, adiabatic.ElectricityJ);
    }

    [Fact]
    public void HeatPump_CapacityLockoutDefrostAndBackup_HandWorked()
    {
        // Invented heat pump: COP 3.0 flat; capacity 10 kW at -10 C rising linearly to 20 kW at 10 C; lockout below -15 C;
        // defrost below 2 C costs 10 % of the COP; electric-resistance backup at 1.0.
        var plant = GasPlant() with
        {
            Heating = HeatingSource.HeatPump,
            HeatPumpCop = PerformanceCurve.Constant(3.0),
            HeatPumpCapacity = PerformanceCurve.Create([(-10.0, 10_000.0), (10.0, 20_000.0)]),
            HeatPumpLockout = Temperature.FromCelsius(-15),
            DefrostBelow = Temperature.FromCelsius(2),
            DefrostPenalty = 0.10,
        };
        var model = new PlantModel(plant);
        var clamps = new CurveClampCounter();

        // 5 C, 10 kW for 1 h = 36 MJ: capacity 10 + 10 x 15/20 = 17.5 kW carries it all; 36 / 3.0 = 12 MJ; no backup.
        var (a, aBackup) = model.HeatingSplit(36e6, 5, 1, clamps);
        Assert.Equal(12e6, a.ElectricityJ, 1e-3);
        Assert.Equal(0.0, aBackup.ElectricityJ);

        // 0 C, 20 kW = 72 MJ: capacity 15 kW carries 54 MJ at COP 3.0 x 0.9 = 2.7 -> 20 MJ; the backup buys 72 - 54 = 18 MJ.
        var (b, bBackup) = model.HeatingSplit(72e6, 0, 1, clamps);
        Assert.Equal(20e6, b.ElectricityJ, 1e-3);
        Assert.Equal(18e6, bBackup.ElectricityJ, 1e-3);

        // -20 C, below the lockout: all 72 MJ by the backup.
        var (c, cBackup) = model.HeatingSplit(72e6, -20, 1, clamps);
        Assert.Equal(0.0, c.ElectricityJ);
        Assert.Equal(72e6, cBackup.ElectricityJ, 1e-3);
        Assert.Equal(72e6, model.Heating(72e6, -20, 1, clamps).ElectricityJ, 1e-3); // the sum is what Heating returns

        // A gas backup at 0.8 buys 18 / 0.8 = 22.5 MJ of gas.
        var gas = new PlantModel(plant with { Backup = HeatingSource.Gas, BackupEfficiency = 0.8 });
        Assert.Equal(22.5e6, gas.HeatingSplit(72e6, 0, 1, clamps).Backup.GasJ, 1e-3);
    }

    [Fact]
    public void GasHeating_HandWorkedCostAndCarbon()
    {
        // Hand-worked: 85,000 kBtu of heating delivered to the outdoor air, furnace 85 % efficient.
        //   gas bought = 85,000 kBtu / 0.85 = 100,000 kBtu = 100,000,000 Btu
        //   therms     = 100,000,000 Btu / 100,000 Btu per therm = 1,000 therm   (1 therm = 100,000 Btu)
        //   cost       = 1,000 therm x $1.10 = $1,100
        //   carbon     = 1,000 therm x 5.3 kg = 5,300 kg
        var model = new PlantModel(GasPlant());
        var clamps = new CurveClampCounter();
        var bought = model.Heating(Energy.FromKbtu(85_000).Joules, outdoorC: 0, hours: 1, clamps);
        Assert.Equal(1_000.0, bought.GasJ / FuelUnits.JoulesPerTherm, 9);
        Assert.Equal(1_100.0, bought.Cost, 6);
        Assert.Equal(5_300.0, bought.CarbonKg, 6);
        Assert.Equal(0.0, bought.ElectricityJ);
    }

    [Fact]
    public void Cooling_HandWorkedCostAndCarbon_InterpolatedCop()
    {
        // Hand-worked: 34,121.4 kBtu of coil load at 80 F. COP at 80 F lies halfway between
        // (65 F, 4.2) and (95 F, 3.2): 3.7.
        //   coil load   = 34,121,400 Btu / 3412.14 Btu per kWh = 10,000 kWh   (1 kWh = 3412.14 Btu)
        //   electricity = 10,000 kWh / 3.7 = 2,702.7027 kWh
        //   cost        = 2,702.7027 kWh x $0.14 = $378.3784
        //   carbon      = 2,702.7027 kWh x 0.40 kg = 1,081.0811 kg
        var model = new PlantModel(GasPlant());
        var clamps = new CurveClampCounter();
        double coilJ = Energy.FromBtu(34_121_400).Joules;
        var bought = model.Cooling(coilJ, Conversions.FahrenheitToCelsius(80), hours: 1, clamps);
        // 3412.14 is the DESIGN 3 rounding of 3,600,000 / 1055.05585262 = 3412.1416; allow that rounding.
        Assert.Equal(10_000.0 / 3.7, bought.ElectricityJ / FuelUnits.JoulesPerKilowattHour, 0.01);
        Assert.Equal(378.3784, bought.Cost, 0.01);
        Assert.Equal(1_081.0811, bought.CarbonKg, 0.01);
        Assert.Equal(0.0, clamps.CoolingHours);
    }

    [Fact]
    public void CoolingCurve_ClampsOutsidePointsAndCounts()
    {
        var model = new PlantModel(GasPlant());
        var clamps = new CurveClampCounter();
        double oneKwh = FuelUnits.JoulesPerKilowattHour;

        // 120 F is beyond the last point (110 F, 2.6): held at 2.6 and counted.
        var hot = model.Cooling(oneKwh, Conversions.FahrenheitToCelsius(120), hours: 3, clamps);
        Assert.Equal(1.0 / 2.6, hot.ElectricityJ / oneKwh, 12);
        Assert.Equal(3.0, clamps.CoolingHours);

        // 50 F is below the first point (65 F, 4.2): held at 4.2.
        var mild = model.Cooling(oneKwh, Conversions.FahrenheitToCelsius(50), hours: 2, clamps);
        Assert.Equal(1.0 / 4.2, mild.ElectricityJ / oneKwh, 12);
        Assert.Equal(5.0, clamps.CoolingHours);
    }

    [Fact]
    public void CoolingRatings_ConvertToCop()
    {
        // EER 10.24 Btu/Wh is COP 3.0 (10.24 / 3.41214 = 3.001; common practice).
        Assert.Equal(3.0011, CoolingRating.CopFromEer(10.24), 3);

        // 1.0 kW/ton is COP 3.517 (12,000 Btu/h per ton / 3412.14 Btu per kWh; common practice).
        Assert.Equal(3.5169, CoolingRating.CopFromKilowattsPerTon(1.0), 3);
    }

    [Fact]
    public void FanPower_MatchesIpShorthand()
    {
        // 2,000 cfm against 0.8 in. w.g. at 60 % total efficiency:
        // bhp = cfm x in.w.g. / (6356 x eta) = 2000 x 0.8 / (6356 x 0.6) = 0.41955 hp (common practice),
        // and 0.41955 hp x 745.7 W/hp = 312.86 W.
        var p = FanPower.Electric(VolumeFlow.FromCfm(2000), 0.8 * Conversions.PascalsPerInchOfWater, 0.6);
        Assert.Equal(312.86, p.Watts, 0.5);
    }

    [Fact]
    public void HeatPump_UsesCopAtOutdoorTemperature()
    {
        var settings = GasPlant() with
        {
            Heating = HeatingSource.HeatPump,
            HeatingEfficiency = 1.0,
            HeatPumpCop = PerformanceCurve.Create([(-10, 2.0), (10, 4.0)]),
        };
        var model = new PlantModel(settings);
        var clamps = new CurveClampCounter();

        // At 0 C the COP is 3.0 (halfway): 3 kWh of heat takes 1 kWh of electricity = $0.14.
        var bought = model.Heating(3 * FuelUnits.JoulesPerKilowattHour, 0.0, 1, clamps);
        Assert.Equal(1.0, bought.ElectricityJ / FuelUnits.JoulesPerKilowattHour, 12);
        Assert.Equal(0.14, bought.Cost, 12);
        Assert.Equal(0.0, bought.GasJ);
    }
}
