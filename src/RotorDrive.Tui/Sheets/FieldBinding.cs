using Terminal.Gui.Configuration;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>One editable value on a sheet: label, text field, unit and the message beside it. Typed text goes into the
/// rig document when it reads as a value; otherwise it stays in the field with the reason shown beside it.</summary>
/// <remarks>Only the text field is a view. The label, unit and message are drawn by the view that holds the field, on its
/// row, in that view's own drawing pass (<see cref="RowText"/>): three label views per field made the Rig sheet about 170
/// views, and a sheet switch during a long run spent most of its time drawing them (issue 15 item 1).</remarks>
internal sealed class FieldBinding
{
    /// <summary>Width of the text field.</summary>
    public const int FieldWidth = 13;

    private readonly WorkbenchContext _context;
    private readonly View _parent;
    private readonly int _labelX;
    private readonly int _labelWidth;
    private readonly int _unitX;
    private readonly int _unitWidth;
    private readonly int _messageX;
    private bool _updating;

    public FieldBinding(View parent, Pos y, FieldSpec spec, WorkbenchContext context, int x = 0, int labelWidth = 16, int unitWidth = 6,
        int fieldWidth = FieldWidth)
    {
        Spec = spec;
        _context = context;
        _parent = parent;
        _labelX = x;
        _labelWidth = labelWidth;
        _unitX = x + labelWidth + 1 + fieldWidth + 1;
        _unitWidth = unitWidth;
        _messageX = _unitX + unitWidth + 1;
        Label = new RowText(parent, spec.Label);
        Field = new TextField { X = x + labelWidth + 1, Y = y, Width = fieldWidth, Text = "" };
        Unit = new RowText(parent, spec.Unit);
        Message = new RowText(parent, "");
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
        parent.Add(Field);
        parent.DrawingContent += (_, _) => DrawRow();
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

    /// <summary>The label left of the field.</summary>
    public RowText Label { get; }

    public TextField Field { get; }

    /// <summary>The unit right of the field.</summary>
    public RowText Unit { get; }

    /// <summary>The message right of the unit: a problem (marked "!" and drawn in the error colours) or a hint.</summary>
    public RowText Message { get; }

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
        Message.IsError = message is not null;
    }

    // Draws the label, unit and message on the field's row of the parent's viewport (the field itself is a view).
    private void DrawRow()
    {
        var viewport = _parent.Viewport;
        int row = Field.Frame.Y - viewport.Y;
        if (!Field.Visible || row < 0 || row >= viewport.Height)
        {
            return;
        }
        var normal = _parent.GetAttributeForRole(VisualRole.Normal);
        _parent.SetAttribute(normal);
        Put(_labelX, row, Label.Text, _labelWidth, viewport);
        Put(_unitX, row, Unit.Text, _unitWidth, viewport);
        if (Message.IsError)
        {
            _parent.SetAttribute(SchemeManager.GetScheme("Error").Normal);
        }
        Put(_messageX, row, Message.Text, viewport.Width - (_messageX - viewport.X), viewport);
        _parent.SetAttribute(normal);
    }

    private void Put(int x, int row, string text, int width, System.Drawing.Rectangle viewport)
    {
        int column = x - viewport.X;
        width = Math.Min(width, viewport.Width - column);
        if (text.Length == 0 || width <= 0 || column < 0)
        {
            return;
        }
        _parent.Move(column, row);
        _parent.AddStr(text.Length > width ? text[..width] : text);
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
