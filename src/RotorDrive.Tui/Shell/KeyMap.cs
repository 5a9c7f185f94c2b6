namespace RotorDrive.Tui.Shell;

/// <summary>Every key the workbench answers to, as the help sheet lists them.</summary>
public static class KeyMap
{
    /// <summary>Keys and what they do.</summary>
    public static IReadOnlyList<(string Keys, string Does)> All { get; } =
    [
        ("F1", "this help sheet"),
        ("F2", "save the rig (the previous file is kept as RIG.json.bak)"),
        ("F12", "save the rig under another name (asks before replacing a file)"),
        ("F3", "open another rig file (asks first when there are unsaved edits)"),
        ("F4", "pick a catalog id for the field being edited (rotor, motor, controller, pack, plate, spin; the Shortlist's why-not motor)"),
        ("F5", "recompute the current sheet now (Shortlist: rank again; Stress: run the stress test)"),
        ("F7", "sheet action: sort the parts table by the selected column / arrows or letters in the sketch / Shortlist: rank by the next objective / Stress: histogram of the next figure"),
        ("F8", "stop the computation that is running (a stopped stress run shows the samples finished, marked PARTIAL)"),
        ("F10, Ctrl+Q, Esc", "quit (asks first when there are unsaved edits)"),
        ("Alt+1 .. Alt+9", "jump to sheet 1..9 of the list"),
        ("Ctrl+PageDown/Up", "next / previous sheet"),
        ("Tab, Shift+Tab", "move between fields; cursor keys move in lists and tables"),
        ("Enter", "in the sheet list: open the sheet and move into it; in the Shortlist table: apply the row to the rig (asks first)"),
        ("Typing in a field", "stores the value at once; text that is not a valid value stays, marked '!' with the reason"),
    ];
}
