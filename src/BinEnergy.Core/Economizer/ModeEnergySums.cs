using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>Running sums behind <see cref="EconomizerTotals"/>: allocation-free, one per control and cell.</summary>
internal struct ModeEnergySums
{
    private double _noCooling;
    private double _free;
    private double _integrated;
    private double _minimum;
    private double _sensibleJ;
    private double _latentJ;
    private SiteEnergy _compressor;
    private double _reheatJ;
    private double _preheatJ;
    private double _unmetJ;
    private SiteEnergy _heating;
    private double _fanJ;
    private SiteEnergy _fan;

    /// <summary>
    /// Adds <paramref name="hours"/> of an hour's result (loads in W, energy in J), and the
    /// compressor energy for its coil load at <paramref name="cop"/> and the heating bought for its
    /// reheat and preheat at <paramref name="outdoorC"/> through <paramref name="plant"/> (when given).
    /// </summary>
    public void Add(in EconomizerHour hour, double hours, PlantModel? plant, double cop, double outdoorC, CurveClampCounter clamps)
    {
        double fan = hour.FanW * hours * 3600.0;
        _fanJ += fan;
        if (plant is not null && fan > 0)
        {
            _fan += plant.Electricity(fan);
        }

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
            _compressor += plant.Electricity((sensible + latent) / cop);
        }

        double reheat = hour.ReheatW * seconds;
        double preheat = hour.PreheatW * seconds;
        _reheatJ += reheat;
        _preheatJ += preheat;
        _unmetJ += hour.UnmetW * seconds;
        if (plant is not null && reheat + preheat > 0)
        {
            _heating += plant.Heating(reheat + preheat, outdoorC, hours, clamps);
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
        _compressor += other._compressor;
        _reheatJ += other._reheatJ;
        _preheatJ += other._preheatJ;
        _unmetJ += other._unmetJ;
        _heating += other._heating;
        _fanJ += other._fanJ;
        _fan += other._fan;
    }

    public readonly EconomizerTotals ToTotals() =>
        new(_noCooling, _free, _integrated, _minimum, Energy.FromJoules(_sensibleJ), Energy.FromJoules(_latentJ), _compressor)
        {
            Reheat = Energy.FromJoules(_reheatJ),
            Preheat = Energy.FromJoules(_preheatJ),
            Unmet = Energy.FromJoules(_unmetJ),
            Heating = _heating,
            Fans = Energy.FromJoules(_fanJ),
            FanElectricity = _fan,
        };
}
