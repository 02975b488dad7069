namespace BinEnergy.Core.Economizer;

/// <summary>What the air system does in one occupied hour (DESIGN 8).</summary>
public enum EconomizerMode
{
    /// <summary>
    /// The building load line is zero (outdoor at or below the balance point): the building needs no
    /// cooling, but the system still conditions its supply, so reheat, preheat and (mixed air above
    /// the coil-leaving temperature) coil energy are counted in these hours too.
    /// </summary>
    NoCooling,

    /// <summary>The economizer is enabled and the coil does not run: outdoor air alone meets the supply temperature.</summary>
    FreeCooling,

    /// <summary>The economizer is enabled and the coil runs: 100 % outdoor air with the coil trimming, or mixed air too humid for the coil-leaving limit.</summary>
    Integrated,

    /// <summary>Minimum outdoor air: the high limit disables the economizer, the outdoor air is not cooler than the return air, a non-integrated economizer locks out, or there is no economizer.</summary>
    MinimumOutdoorAir,
}
