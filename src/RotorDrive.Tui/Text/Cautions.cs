namespace RotorDrive.Tui.Text;

/// <summary>The safety cautions shown on the help sheet and beside the results they concern.</summary>
public static class Cautions
{
    /// <summary>Each caution as a heading and its text.</summary>
    public static IReadOnlyList<(string Heading, string Text)> All { get; } =
    [
        ("Strong magnets",
            "Halbach rotors hold large forces: they pinch and crush fingers, pull tools and pieces of steel, "
            + "and upset pacemakers and other implants. Keep people with implants away and handle rotors with non-magnetic tools."),
        ("Rotor burst",
            "A rotor that fails at speed throws magnets and retainer pieces. Stay out of the plane of the rotors while they spin, "
            + "keep below the rotor's rated speed, and check the retainer's hoop stress margin."),
        ("Lithium packs",
            "Lithium packs can burn when shorted, punctured, over-charged or over-discharged. Charge them on a fire-safe surface "
            + "under supervision, store them part-charged, and respect their current and cutoff ratings."),
        ("Hot plate and windings",
            "Eddy currents heat the plate under the rotors, and current heats the motor windings and controllers; both can burn skin. "
            + "Watch their temperatures and let them cool before touching."),
        ("Estimates only",
            "RotorDrive estimates. Defer to local codes, the manufacturers' ratings and licensed practice; "
            + "test on the bench with margins before trusting a figure."),
    ];
}
