namespace RotorDrive.Core.Safety;

/// <summary>The hazards RotorDrive warns about.</summary>
public enum CautionTopic
{
    /// <summary>Strong magnets: pinching and crushing, implanted medical devices, magnetic media.</summary>
    StrongMagnets,

    /// <summary>A rotor bursting at speed.</summary>
    RotorBurst,

    /// <summary>Lithium packs: fire, charging, storage.</summary>
    LithiumPacks,

    /// <summary>Hot plate and motor windings.</summary>
    HotSurfaces,

    /// <summary>A plate laid on steel: stopped rotors are pulled down onto it.</summary>
    SteelUnderPlate,

    /// <summary>The figures are estimates that defer to codes, ratings and licensed practice.</summary>
    EstimatesOnly,
}
