using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>The rule a tolerance must obey before a stress study runs: its spread must not be able to carry a physically
/// positive quantity to zero or below.</summary>
/// <remarks>
/// <para>The reach of a spread is its lower end: the lower bound of a uniform spread, or nominal minus
/// <see cref="NormalReachSd"/> standard deviations of a normal one. A normal spread is unbounded, so some cut-off is a
/// choice: five standard deviations leave a probability of 2.9e-7 per draw below it (standard normal tail, Phi(-5);
/// M. Abramowitz and I. A. Stegun, "Handbook of Mathematical Functions", 1964, table 26.1), so that in a study of 10,000
/// samples of a six-station rig (60,000 draws per per-station quantity) a draw beyond it is unlikely (about 2 %), and a
/// draw that does fall there is still kept positive by <see cref="Tolerance"/>'s truncation. In percent of nominal the
/// rule reads: a normal spread below 20 %, a uniform lower bound above -100 % (or at least -100 % where zero is allowed).</para>
/// <para>What must stay above zero: motor Kv and winding resistance, the controller's current limit, the magnets'
/// remanence, the plate's thickness and conductivity, the pack's internal resistance, and each station's landed gap plus
/// its gap offset (the smallest gap a rotor sits at). What may reach zero but not go below: the motor's no-load current,
/// the payload and the pack's state of charge. Offsets of the centre of gravity and temperatures have no sign rule
/// (the rig file bounds temperatures).</para>
/// </remarks>
public static class StressSpreadRule
{
    /// <summary>Standard deviations a normal spread is taken to reach, 5.</summary>
    public const double NormalReachSd = 5.0;

    /// <summary>The lowest value a tolerance reaches around a nominal value (see the remarks).</summary>
    /// <param name="tolerance">The tolerance.</param>
    /// <param name="nominal">The nominal value, in the tolerance's unit when absolute.</param>
    /// <exception cref="ArgumentNullException"><paramref name="tolerance"/> is null.</exception>
    public static double Lowest(Tolerance tolerance, double nominal)
    {
        Preconditions.NotNull(tolerance, nameof(tolerance));
        double unit = tolerance.Scale == ToleranceScale.Percent ? Math.Abs(nominal) / 100.0 : 1.0;
        return tolerance.Shape switch
        {
            ToleranceShape.Normal => nominal - NormalReachSd * tolerance.StandardDeviation * unit,
            ToleranceShape.Uniform => nominal + tolerance.Lower * unit,
            _ => nominal,
        };
    }

    /// <summary>Every tolerance of a set that breaks the rule on a rig, one entry per quantity (at its first failing
    /// station), in draw order; empty when the set can be run.</summary>
    /// <param name="rig">The nominal rig; stations without a motor or controller are skipped for those parts' quantities.</param>
    /// <param name="tolerances">The spreads.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static IReadOnlyList<StressSpreadViolation> Check(Rig rig, StressTolerances tolerances)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(tolerances, nameof(tolerances));
        var list = new List<StressSpreadViolation>();
        foreach (var q in tolerances.Varied)
        {
            var t = tolerances.Of(q);
            if (q.IsPerStation())
            {
                for (int s = 0; s < rig.Stations.Count; s++)
                {
                    if (Nominal(rig, q, s) is { } n && Breaks(q, t, n.Value, n.ZeroAllowed) is { } low)
                    {
                        list.Add(new StressSpreadViolation(q, s, n.Checked, n.Value, low, n.ZeroAllowed));
                        break;
                    }
                }
            }
            else if (Nominal(rig, q, 0) is { } n && Breaks(q, t, n.Value, n.ZeroAllowed) is { } low)
            {
                list.Add(new StressSpreadViolation(q, null, n.Checked, n.Value, low, n.ZeroAllowed));
            }
        }
        return list;
    }

    // The lowest value when it breaks the rule, otherwise null. A gap offset's nominal is the landed gap it is added to.
    private static double? Breaks(StressQuantity quantity, Tolerance t, double nominal, bool zeroAllowed)
    {
        double low = quantity == StressQuantity.GapOffset ? nominal + Lowest(t, 0) : Lowest(t, nominal);
        return zeroAllowed ? (low >= 0 ? null : low) : (low > 0 ? null : low);
    }

    private static (double Value, bool ZeroAllowed, string Checked)? Nominal(Rig rig, StressQuantity quantity, int station)
    {
        var st = rig.Stations.Count > station ? rig.Stations[station] : null;
        return quantity switch
        {
            StressQuantity.MotorKv when st?.Motor is { } m => (m.KvRadPerSPerV, false, "motor Kv"),
            StressQuantity.MotorResistance when st?.Motor is { } m => (m.ResistanceOhm, false, "motor winding resistance"),
            StressQuantity.MotorNoLoadCurrent when st?.Motor is { } m => (m.NoLoadCurrentA, true, "motor no-load current"),
            StressQuantity.ControllerCurrentLimit when st?.Controller is { } c => (c.BurstCurrentA, false, "controller current limit"),
            StressQuantity.MagnetRemanence when st is not null => (st.Rotor.RemanenceT, false, "magnet remanence"),
            StressQuantity.GapOffset => (rig.LandedGapM, false, "landed gap plus gap offset"),
            StressQuantity.PlateThickness => (rig.Plate.ThicknessM, false, "plate thickness"),
            StressQuantity.PlateConductivity => (rig.Plate.Material.ConductivitySPerM, false, "plate conductivity"),
            StressQuantity.PackStateOfCharge => (1.0, true, "pack state of charge"),
            StressQuantity.PackResistance when rig.Packs is { } p => (p.ResistanceOhm, false, "pack internal resistance"),
            StressQuantity.Payload => (rig.Body.PayloadKg, true, "payload"),
            _ => null,
        };
    }
}
