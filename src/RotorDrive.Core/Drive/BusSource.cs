using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Drive;

/// <summary>The bus supply as a Thevenin source: open-circuit voltage behind an internal resistance.</summary>
/// <remarks>Pack terminal voltage V = S Voc(SoC) - I R_bank (the usual equivalent-circuit battery model without its RC
/// branches, which is the steady-state limit).</remarks>
/// <param name="OpenCircuitVoltageV">Open-circuit bus voltage, V, greater than 0.</param>
/// <param name="ResistanceOhm">Internal resistance of the bank, ohm, at least 0.</param>
public readonly record struct BusSource(double OpenCircuitVoltageV, double ResistanceOhm)
{
    /// <summary>The source a pack bank presents at a state of charge.</summary>
    /// <param name="bank">The packs on the bus.</param>
    /// <param name="socFraction">State of charge, 0..1.</param>
    /// <exception cref="ArgumentNullException">The bank is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The state of charge is outside [0, 1] or the bank's values are not physical.</exception>
    public static BusSource FromPack(PackBank bank, double socFraction)
    {
        Preconditions.NotNull(bank, nameof(bank));
        Preconditions.InRange(socFraction, 0, 1, nameof(socFraction));
        return new BusSource(
            Preconditions.Positive(bank.OpenCircuitVoltageAt(socFraction), "pack open-circuit voltage"),
            Preconditions.NonNegative(bank.ResistanceOhm, "pack resistance"));
    }

    /// <summary>Terminal voltage while delivering a current, V.</summary>
    /// <param name="currentA">Current delivered, A (negative while charging).</param>
    public double TerminalVoltageV(double currentA) => OpenCircuitVoltageV - currentA * ResistanceOhm;
}
