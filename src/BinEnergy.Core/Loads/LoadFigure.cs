namespace BinEnergy.Core.Loads;

/// <summary>
/// The figures of an outdoor-air estimate, each an energy; they index a <see cref="LoadVector"/>.
/// Adding a figure here (and to <see cref="LoadVector.FigureCount"/>) adds it to every table.
/// </summary>
public enum LoadFigure
{
    /// <summary>Heating the outdoor air to the heating setpoint.</summary>
    Heating,

    /// <summary>Sensible cooling of the outdoor air to the cooling setpoint.</summary>
    CoolingSensible,

    /// <summary>Latent cooling: removing the water above the maximum indoor humidity ratio.</summary>
    CoolingLatent,

    /// <summary>Adding water up to the minimum indoor humidity ratio (when a minimum is set).</summary>
    Humidification,

    /// <summary>Heating and humidification the recovery device saves.</summary>
    RecoveredHeating,

    /// <summary>Sensible and latent cooling the recovery device saves.</summary>
    RecoveredCooling,

    /// <summary>Fan energy: the ventilation fan that moves the outdoor air and the recovery device's added pressure drop (reported separately).</summary>
    FanEnergy,
}
