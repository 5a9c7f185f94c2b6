namespace RotorDrive.Core.Studies.Stress;

/// <summary>A tolerance whose spread can carry a quantity out of its physical range (see <see cref="StressSpreadRule"/>).</summary>
/// <param name="Quantity">The quantity whose spread breaks the rule.</param>
/// <param name="Station">The first station where it does, for a per-station quantity; null for a rig-wide one.</param>
/// <param name="Checked">What must stay in range, in words ("plate thickness", "landed gap (landed gap + gap offset)").</param>
/// <param name="NominalSi">The nominal value of what is checked, in the quantity's SI unit (<see cref="StressQuantities.SiUnit"/>).</param>
/// <param name="LowestSi">The lowest value the spread reaches (uniform lower bound, or nominal - 5 standard deviations).</param>
/// <param name="ZeroAllowed">True when the value may reach zero (a payload, a no-load current, a state of charge), false
/// when it must stay above zero.</param>
public sealed record StressSpreadViolation(StressQuantity Quantity, int? Station, string Checked, double NominalSi, double LowestSi, bool ZeroAllowed);
