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

    /// <summary>
    /// Adds <paramref name="hours"/> of an hour's result (loads in W, energy in J), and the
    /// compressor energy for its coil load at <paramref name="cop"/> through <paramref name="plant"/> (when given).
    /// </summary>
    public void Add(in EconomizerHour hour, double hours, PlantModel? plant, double cop)
    {
        switch (hour.Mode)
        {
            case EconomizerMode.NoCooling:
                _noCooling += hours;
                return;
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
    }

    public readonly EconomizerTotals ToTotals() =>
        new(_noCooling, _free, _integrated, _minimum, Energy.FromJoules(_sensibleJ), Energy.FromJoules(_latentJ), _compressor);
}
