namespace BinEnergy.Core.Plant;

/// <summary>What the energy bought for the outdoor air is used for; indexes <see cref="PlantEnergy"/>.</summary>
public enum EndUse
{
    /// <summary>Heating the outdoor air (the heating fuel, or a heat pump's electricity).</summary>
    Heating,

    /// <summary>Cooling and dehumidifying it (electricity through the cooling COP).</summary>
    Cooling,

    /// <summary>Fans (electricity).</summary>
    Fans,

    /// <summary>Humidification (the humidifier's energy).</summary>
    Humidification,

    /// <summary>A heat pump's backup heat: the part of the heating it cannot carry, and all of it below its lockout.</summary>
    BackupHeating,
}
