namespace BinEnergy.Core.Plant;

/// <summary>Hours in which a COP curve was evaluated outside its points and held at its end value.</summary>
public sealed class CurveClampCounter
{
    /// <summary>Hours of heat-pump heating outside the heat-pump COP points.</summary>
    public double HeatingHours { get; set; }

    /// <summary>Hours of cooling outside the cooling COP points.</summary>
    public double CoolingHours { get; set; }
}
