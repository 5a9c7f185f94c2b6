namespace RotorDrive.Tui.Shell;

/// <summary>Every key the workbench answers to, as the help sheet lists them.</summary>
public static class KeyMap
{
    /// <summary>The key that opens a sheet, as the sheet list shows it: the digits 1..9 and then 0 for the first ten
    /// sheets other than Help in list order, "?" for Help (which F1 opens too), "" for any sheet beyond the tenth.</summary>
    /// <param name="position">The sheet's position among the sheets other than Help, 0-based (ignored for Help).</param>
    /// <param name="isHelp">Whether the sheet is the help sheet.</param>
    public static string SheetKey(int position, bool isHelp)
        => isHelp ? "?" : position is >= 0 and < 9 ? ((char)('1' + position)).ToString() : position == 9 ? "0" : "";

    /// <summary>Keys and what they do.</summary>
    public static IReadOnlyList<(string Keys, string Does)> All { get; } =
    [
        ("F1, ?", "this help sheet (? when not typing in a field)"),
        ("F2", "save the rig (the previous file is kept as RIG.json.bak)"),
        ("F12", "save the rig under another name (asks before replacing a file)"),
        ("F3", "open another rig file (asks first when there are unsaved edits)"),
        ("F4", "pick a catalog id for the field being edited (rotor, motor, controller, pack, plate, spin; the Shortlist's why-not motor)"),
        ("F5", "recompute the current sheet now (Shortlist: rank again; Stress: run the stress test)"),
        ("F6", "write the chart sheet's charts to a file, .svg or .png by the name given (Lift & drag, Running points, Spin-up, Endurance; asks before replacing a file)"),
        ("F7", "sheet action: sort the parts table by the selected column / arrows or letters in the sketch / Shortlist: rank by the next objective / Stress: histogram of the next figure"),
        ("F8", "stop the computation that is running (a stopped stress run shows the samples finished, marked PARTIAL)"),
        ("F10, Ctrl+Q", "quit (asks first when there are unsaved edits or results of a long run)"),
        ("Esc", "close a dialog; never quits"),
        ("1 .. 9, 0", "jump to the sheet with that key in the list (when not typing in a field; Alt+digit always)"),
        ("Ctrl+PageDown/Up", "next / previous sheet"),
        ("Tab, Shift+Tab", "move between fields; cursor keys move in lists and tables"),
        ("Enter", "in the sheet list: open the sheet and move into it; in the Shortlist table: apply the row to the rig (asks first)"),
        ("Typing in a field", "stores the value at once; text that is not a valid value stays, marked '!' with the reason"),
    ];
}
