namespace BinEnergy.Core.Economizer;

/// <summary>How the air system meets the building's sensible cooling load (DESIGN 8 and 15).</summary>
public enum AirSystemType
{
    /// <summary>
    /// Variable volume (the default): the supply airflow follows the load between the minimum and
    /// maximum at the set (or reset) supply temperature; below what the minimum airflow delivers,
    /// the terminal reheat is counted as heating.
    /// </summary>
    VariableVolume,

    /// <summary>
    /// Single zone: constant supply airflow whose supply temperature follows the load line,
    /// T_s = T_r - Q_b / (m_s c_p), never below the set (minimum) supply temperature; no reheat.
    /// </summary>
    SingleZone,

    /// <summary>
    /// Constant volume with reheat: constant airflow cooled to the fixed supply temperature, reheated
    /// back to what the load needs; the reheat is counted as heating.
    /// </summary>
    ConstantVolumeReheat,
}
