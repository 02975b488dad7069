using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// Running sums behind <see cref="EconomizerTotals"/>: allocation-free, one per control and cell. What the plant buys is
/// summed as joules per fuel and priced once in <see cref="ToTotals"/> (a tariff is linear in the joules).
/// </summary>
internal struct ModeEnergySums
{
    private double _noCooling;
    private double _free;
    private double _integrated;
    private double _minimum;
    private double _sensibleJ;
    private double _latentJ;
    private double _compressorJ;
    private double _reheatJ;
    private double _preheatJ;
    private double _unmetJ;
    private FuelJoules _heating;
    private double _fanJ;

    /// <summary>
    /// Adds <paramref name="hours"/> of an hour's result (loads in W, energy in J), and the
    /// compressor energy for its coil load at <paramref name="cop"/> and the heating bought for its
    /// reheat and preheat at <paramref name="outdoorC"/> through <paramref name="plant"/> (when given).
    /// </summary>
    public void Add(in EconomizerHour hour, double hours, PlantModel? plant, double cop, double outdoorC, CurveClampCounter clamps)
    {
        _fanJ += hour.FanW * hours * 3600.0;

        switch (hour.Mode)
        {
            case EconomizerMode.NoCooling:
                _noCooling += hours;
                break;
            case EconomizerMode.FreeCooling:
                _free += hours;
                break;
            case EconomizerMode.Integrated:
                _integrated += hours;
                break;
            default:
                _minimum += hours;
                break;
        }

        double seconds = hours * 3600.0;
        double sensible = hour.CoilSensibleW * seconds;
        double latent = hour.CoilLatentW * seconds;
        _sensibleJ += sensible;
        _latentJ += latent;
        if (plant is not null && sensible + latent > 0)
        {
            _compressorJ += (sensible + latent) / cop;
        }

        double reheat = hour.ReheatW * seconds;
        double preheat = hour.PreheatW * seconds;
        _reheatJ += reheat;
        _preheatJ += preheat;
        _unmetJ += hour.UnmetW * seconds;
        if (plant is not null && reheat + preheat > 0)
        {
            var f = plant.HeatingFuels(reheat + preheat, outdoorC, hours, clamps);
            _heating.Add(f.Main, f.MainJ);
            _heating.Add(f.Backup, f.BackupJ);
        }
    }

    /// <summary>Adds another set of sums.</summary>
    public void Add(in ModeEnergySums other)
    {
        _noCooling += other._noCooling;
        _free += other._free;
        _integrated += other._integrated;
        _minimum += other._minimum;
        _sensibleJ += other._sensibleJ;
        _latentJ += other._latentJ;
        _compressorJ += other._compressorJ;
        _reheatJ += other._reheatJ;
        _preheatJ += other._preheatJ;
        _unmetJ += other._unmetJ;
        _heating.Add(in other._heating);
        _fanJ += other._fanJ;
    }

    /// <summary>The totals, with what the plant bought priced through <paramref name="plant"/> (nothing bought without one).</summary>
    public readonly EconomizerTotals ToTotals(PlantModel? plant) =>
        new(_noCooling, _free, _integrated, _minimum, Energy.FromJoules(_sensibleJ), Energy.FromJoules(_latentJ),
            plant?.Electricity(_compressorJ) ?? SiteEnergy.Zero)
        {
            Reheat = Energy.FromJoules(_reheatJ),
            Preheat = Energy.FromJoules(_preheatJ),
            Unmet = Energy.FromJoules(_unmetJ),
            Heating = plant?.Price(in _heating) ?? SiteEnergy.Zero,
            Fans = Energy.FromJoules(_fanJ),
            FanElectricity = plant?.Electricity(_fanJ) ?? SiteEnergy.Zero,
        };
}
