namespace BinEnergy.Core.Plant;

/// <summary>
/// Turns thermal loads into energy bought (DESIGN 9): heating load / efficiency (or / heat-pump
/// COP at the outdoor temperature) of the heating fuel; cooling coil load / COP at the outdoor
/// temperature as electricity; fan energy as electricity; humidification by the humidifier type. Loads are in joules,
/// over an hour or a bin's hours; the outdoor temperature is the hour's dry-bulb or the bin's
/// evaluation point (mean dry-bulb or midpoint). Every evaluation of a COP curve outside its points is counted in
/// <see cref="CurveClampCounter"/> (the curve holds its end value there).
/// </summary>
public sealed class PlantModel(PlantSettings settings)
{
    /// <summary>The settings this model applies.</summary>
    public PlantSettings Settings { get; } = settings;

    /// <summary>The tariff of each fuel, by the fuel's number, looked up once (the economizer buys energy for every hour of five controls).</summary>
    private readonly FuelTariff[] tariffs = [.. Enum.GetValues<Fuel>().Order().Select(settings.TariffOf)];

    /// <summary>
    /// The energy bought for a set of loads at one outdoor dry-bulb: heating by the heating
    /// source, sensible plus latent cooling through the cooling COP, humidification by the
    /// humidifier, fan energy as electricity.
    /// </summary>
    /// <param name="loads">The loads (an hour's, or a bin's over its hours).</param>
    /// <param name="outdoorC">Outdoor dry-bulb for the COP curves, C.</param>
    /// <param name="clamps">Where evaluations outside a COP curve's points are counted (in the loads' hours).</param>
    public PlantEnergy Buy(in Loads.LoadVector loads, double outdoorC, CurveClampCounter clamps)
    {
        var fuels = default(PlantFuels);
        AddFuels(in loads, outdoorC, clamps, ref fuels);
        return Price(in fuels);
    }

    /// <summary>
    /// Adds the fuels bought for a set of loads to <paramref name="fuels"/>, unpriced (<see cref="Buy"/> prices them):
    /// the same purchases, for sums over many hours priced once.
    /// </summary>
    public void AddFuels(in Loads.LoadVector loads, double outdoorC, CurveClampCounter clamps, ref PlantFuels fuels)
    {
        double hours = loads.HoursVentilated;
        var heating = HeatingFuels(loads.Heating.Joules, outdoorC, hours, clamps);
        fuels.Add(EndUse.Heating, heating.Main, heating.MainJ);
        fuels.Add(EndUse.BackupHeating, heating.Backup, heating.BackupJ);
        fuels.Add(EndUse.Cooling, Fuel.Electricity, CoolingElectricityJ(loads.Cooling.Joules, outdoorC, hours, clamps));

        fuels.Add(EndUse.Fans, Fuel.Electricity, loads.FanEnergy.Joules);
        fuels.Add(EndUse.Humidification, HumidificationFuels(loads.Humidification.Joules, outdoorC, hours, clamps));
    }

    /// <summary>Joules per end use and fuel priced and weighed with each fuel's tariff.</summary>
    public PlantEnergy Price(in PlantFuels fuels)
    {
        var bought = PlantEnergy.Zero;
        foreach (var use in EndUses)
        {
            bought.Add(use, Price(fuels[use]));
        }

        return bought;
    }

    private static readonly EndUse[] EndUses = Enum.GetValues<EndUse>();

    /// <summary>The cooling COP at an outdoor dry-bulb (held at the end value outside the points, and counted for <paramref name="hours"/>).</summary>
    public double CoolingCop(double outdoorC, double hours, CurveClampCounter clamps)
    {
        if (Settings.CoolingCop.IsOutside(outdoorC))
        {
            clamps.CoolingHours += hours;
        }

        return Settings.CoolingCop.Evaluate(outdoorC);
    }

    /// <summary>True when the cooling COP depends on the coil-entering wet-bulb (<see cref="PlantSettings.CoolingCopByWetBulb"/>).</summary>
    public bool CoolingCopUsesWetBulb => Settings.CoolingCopByWetBulb is not null;

    /// <summary>
    /// The cooling COP at an outdoor dry-bulb and a coil-entering wet-bulb: the two-axis table when
    /// the plant has one (held at its edges outside it, and counted for <paramref name="hours"/>),
    /// else the outdoor curve.
    /// </summary>
    public double CoolingCop(double outdoorC, double enteringWetBulbC, double hours, CurveClampCounter clamps)
    {
        if (Settings.CoolingCopByWetBulb is not { } table)
        {
            return CoolingCop(outdoorC, hours, clamps);
        }

        if (table.IsOutside(outdoorC, enteringWetBulbC))
        {
            clamps.CoolingHours += hours;
        }

        return table.Evaluate(outdoorC, enteringWetBulbC);
    }

    /// <summary>Energy bought to meet a heating load.</summary>
    /// <param name="heatingJ">Heating delivered to the air, J.</param>
    /// <param name="outdoorC">Outdoor dry-bulb, C (for a heat pump's COP).</param>
    /// <param name="hours">Hours this load spans (counted when the COP curve is clamped).</param>
    /// <param name="clamps">Where clamped evaluations are counted.</param>
    public SiteEnergy Heating(double heatingJ, double outdoorC, double hours, CurveClampCounter clamps)
    {
        var (main, backup) = HeatingSplit(heatingJ, outdoorC, hours, clamps);
        return main + backup;
    }

    /// <summary>
    /// Energy bought to meet a heating load, split into the heating source's and a heat pump's
    /// backup. A heat pump carries at most its capacity at the outdoor temperature (times the
    /// hours), nothing below its lockout, at its COP, times (1 - defrost penalty) below the
    /// defrost temperature; the backup buys the rest at its efficiency. Without a heat pump the
    /// backup is zero.
    /// </summary>
    public (SiteEnergy Main, SiteEnergy Backup) HeatingSplit(double heatingJ, double outdoorC, double hours, CurveClampCounter clamps)
    {
        var f = HeatingFuels(heatingJ, outdoorC, hours, clamps);
        return (f.MainJ > 0 ? SiteEnergy.Buy(f.Main, f.MainJ, Tariff(f.Main)) : SiteEnergy.Zero,
            f.BackupJ > 0 ? SiteEnergy.Buy(f.Backup, f.BackupJ, Tariff(f.Backup)) : SiteEnergy.Zero);
    }

    /// <summary>
    /// The fuels bought to meet a heating load, unpriced (<see cref="HeatingSplit"/> prices them): the heating
    /// source's fuel and joules, and the backup's.
    /// </summary>
    public (Fuel Main, double MainJ, Fuel Backup, double BackupJ) HeatingFuels(double heatingJ, double outdoorC, double hours, CurveClampCounter clamps)
    {
        var s = Settings;
        if (heatingJ <= 0)
        {
            return (s.HeatingFuel, 0.0, s.BackupFuel, 0.0);
        }

        if (s.Heating != HeatingSource.HeatPump)
        {
            return (s.HeatingFuel, heatingJ / s.HeatingEfficiency, s.BackupFuel, 0.0);
        }

        var curve = s.HeatPumpCop ?? throw new InvalidOperationException("heat pump without a COP curve");
        double carried = heatingJ;
        if (s.HeatPumpLockout is { } lockout && outdoorC < lockout.Celsius)
        {
            carried = 0;
        }
        else if (s.HeatPumpCapacity is { } capacity)
        {
            carried = Math.Min(heatingJ, capacity.Evaluate(outdoorC) * hours * 3600.0);
        }

        double main = 0.0;
        if (carried > 0)
        {
            if (curve.IsOutside(outdoorC))
            {
                clamps.HeatingHours += hours;
            }

            double cop = curve.Evaluate(outdoorC) * (s.DefrostBelow is { } d && outdoorC < d.Celsius ? 1.0 - s.DefrostPenalty : 1.0);
            main = carried / cop;
        }

        double rest = heatingJ - carried;
        return (Fuel.Electricity, main, s.BackupFuel, rest > 0 ? rest / s.BackupEfficiency : 0.0);
    }

    /// <summary>Joules per fuel priced and weighed with each fuel's tariff.</summary>
    public SiteEnergy Price(in FuelJoules joules) =>
        SiteEnergy.Buy(Fuel.Electricity, joules.ElectricityJ, Tariff(Fuel.Electricity))
        + SiteEnergy.Buy(Fuel.Gas, joules.GasJ, Tariff(Fuel.Gas))
        + SiteEnergy.Buy(Fuel.Oil, joules.OilJ, Tariff(Fuel.Oil));

    /// <summary>Electricity bought to remove a cooling coil load (sensible plus latent), J.</summary>
    public SiteEnergy Cooling(double coilJ, double outdoorC, double hours, CurveClampCounter clamps) =>
        coilJ > 0 ? Electricity(CoolingElectricityJ(coilJ, outdoorC, hours, clamps)) : SiteEnergy.Zero;

    /// <summary>The electricity of <see cref="Cooling"/>, J, unpriced: coil load / COP at the outdoor dry-bulb (nothing without a load).</summary>
    private double CoolingElectricityJ(double coilJ, double outdoorC, double hours, CurveClampCounter clamps) =>
        coilJ > 0 ? coilJ / CoolingCop(outdoorC, hours, clamps) : 0.0;

    /// <summary>
    /// Energy bought for a humidification load, J: the load is h_fg (W_min - W_o) per kg of dry air at
    /// h_fg = 2,501 kJ/kg (<see cref="Loads.OutdoorAirLoad"/>), so the water added is load / 2,501 kJ/kg.
    /// Steam (electric or gas): water x <see cref="PlantSettings.SteamJoulesPerKilogram"/> over the
    /// humidifier efficiency, in electricity or gas. Adiabatic: the air gives the water its latent heat
    /// (water x 2,501 kJ/kg), which the heating source puts back (bought as heating, at its efficiency
    /// or COP); the pump's electricity is left out.
    /// </summary>
    public SiteEnergy Humidification(double humidificationJ, double outdoorC, double hours, CurveClampCounter clamps) =>
        Price(HumidificationFuels(humidificationJ, outdoorC, hours, clamps));

    /// <summary>The fuels of <see cref="Humidification"/>, unpriced.</summary>
    private FuelJoules HumidificationFuels(double humidificationJ, double outdoorC, double hours, CurveClampCounter clamps)
    {
        var fuels = default(FuelJoules);
        if (humidificationJ <= 0)
        {
            return fuels;
        }

        double water = humidificationJ / Psychrometrics.MoistAir.LatentHeat;
        double steam = water * PlantSettings.SteamJoulesPerKilogram / Settings.HumidifierEfficiency;
        switch (Settings.Humidifier)
        {
            case HumidifierType.SteamGas:
                fuels.Add(Fuel.Gas, steam);
                break;
            case HumidifierType.Adiabatic:
                var h = HeatingFuels(water * Psychrometrics.MoistAir.LatentHeat, outdoorC, hours, clamps);
                fuels.Add(h.Main, h.MainJ);
                fuels.Add(h.Backup, h.BackupJ);
                break;
            default:
                fuels.Add(Fuel.Electricity, steam);
                break;
        }

        return fuels;
    }

    /// <summary>Electricity, J, priced and weighed.</summary>
    public SiteEnergy Electricity(double joules) =>
        SiteEnergy.Buy(Fuel.Electricity, joules, Tariff(Fuel.Electricity));

    private FuelTariff Tariff(Fuel fuel) => tariffs[(int)fuel];
}
