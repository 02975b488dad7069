namespace BinEnergy.Core.Climate;

/// <summary>An enthalpy design condition: the enthalpy exceeded in a given share of the hours, with its mean coincident dry-bulb.</summary>
/// <param name="AnnualPercent">Share of the hours above the design enthalpy, percent (0.4 or 1).</param>
/// <param name="EnthalpyJPerKg">The design enthalpy, J/kg dry air (0 C datum).</param>
/// <param name="MeanCoincidentDryBulbC">Mean dry-bulb of the coincident hours, C.</param>
/// <param name="CoincidentHours">How many hours that mean is taken over.</param>
public sealed record EnthalpyDesignPoint(double AnnualPercent, double EnthalpyJPerKg, double MeanCoincidentDryBulbC, int CoincidentHours);
