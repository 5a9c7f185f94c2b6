using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>One editable value on a sheet: label, text field, unit and the message beside it. Typed text goes into the
/// rig document when it reads as a value; otherwise it stays in the field with the reason shown beside it.</summary>
internal sealed class FieldBinding
{
    /// <summary>Width of the text field.</summary>
    public const int FieldWidth = 13;

    private readonly WorkbenchContext _context;
    private bool _updating;

    public FieldBinding(View parent, Pos y, FieldSpec spec, WorkbenchContext context, int x = 0, int labelWidth = 16, int unitWidth = 6,
        int fieldWidth = FieldWidth)
    {
        Spec = spec;
        _context = context;
        Label = new Label { X = x, Y = y, Width = labelWidth, Text = spec.Label };
        Field = new TextField { X = x + labelWidth + 1, Y = y, Width = fieldWidth, Text = "" };
        Unit = new Label { X = x + labelWidth + 1 + fieldWidth + 1, Y = y, Width = unitWidth, Text = spec.Unit };
        Message = new Label { X = x + labelWidth + 1 + fieldWidth + 1 + unitWidth + 1, Y = y, Width = Dim.Fill(), Height = 1, Text = "" };
        Field.TextChanged += (_, _) => Typed();
        // Esc in a field holding text that is not a value puts the rig's value back (Esc never quits).
        Field.KeyDown += (_, key) =>
        {
            if (key == Key.Esc && _context.Session.UntypedFields.ContainsKey(Spec.JsonPath))
            {
                _context.Session.DiscardTyped(Spec.JsonPath);
                if (_context.Session.Document is { } doc)
                {
                    _updating = true;
                    Field.Text = Spec.Show(doc);
                    _updating = false;
                }
                Refresh();
                key.Handled = true;
            }
        };
        parent.Add(Label, Field, Unit, Message);
    }

    public FieldSpec Spec { get; private set; }

    /// <summary>Points the field at another value (e.g. the same field of another station) and shows it.</summary>
    public void Retarget(FieldSpec spec)
    {
        Spec = spec;
        Label.Text = spec.Label;
        Unit.Text = spec.Unit;
        if (_context.Session.Document is { } doc && !_context.Session.UntypedFields.ContainsKey(spec.JsonPath))
        {
            _updating = true;
            Field.Text = spec.Show(doc);
            _updating = false;
        }
        Refresh();
    }

    public Label Label { get; }

    public TextField Field { get; }

    public Label Unit { get; }

    public Label Message { get; }

    /// <summary>The message currently shown ("" when the value is fine).</summary>
    public string CurrentMessage { get; private set; } = "";

    /// <summary>Shows the document's value (unless the user's own text is pending there) and the field's message.</summary>
    public void Refresh()
    {
        var session = _context.Session;
        if (session.Document is { } doc && !session.UntypedFields.ContainsKey(Spec.JsonPath))
        {
            string shown = Spec.Show(doc);
            if (!Field.HasFocus && Field.Text != shown)
            {
                _updating = true;
                Field.Text = shown;
                _updating = false;
            }
        }
        string? message = session.MessageFor(Spec.JsonPath);
        CurrentMessage = message ?? "";
        // An empty optional field says what it stands for (the schema's default).
        Message.Text = message is not null ? "! " + message
            : Field.Text.Trim().Length == 0 && Spec.DefaultText is { } d ? "blank: default " + d + (Spec.Unit.Length > 0 ? " " + Spec.Unit : "") : "";
        // Colour as well as the "!" mark, never colour alone.
        Message.SchemeName = message is null ? null : "Error";
    }

    private void Typed()
    {
        if (_updating || _context.Session.Document is null)
        {
            return;
        }
        string text = Field.Text;
        string? why = null;
        // Store changes the document only when the text reads as a value; otherwise the text stays in the field.
        _context.Session.Edit(Spec.JsonPath, d => why = Spec.Store(d, text), () => why);
    }
}
