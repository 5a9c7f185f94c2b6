using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Sheets;

/// <summary>Picks a catalog id for a field from the ids the catalog holds.</summary>
internal static class Pick
{
    /// <summary>Asks for one of the field's choices and types it into the field (which stores it).</summary>
    public static void Into(WorkbenchContext context, FieldBinding field)
    {
        if (field.Spec.Choices is null)
        {
            context.Tell($"{field.Spec.Label}: type a value (nothing to pick from)");
            return;
        }
        if (context.Session.Catalog is not { } catalog)
        {
            context.Tell("The catalogs could not be read; nothing to pick from.");
            return;
        }
        var choices = field.Spec.Choices(catalog);
        string? chosen = context.Prompts.Choose($"Pick {field.Spec.Label}", choices, field.Field.Text, choices.Select(id => PartSummary.Of(catalog, id)).ToList());
        if (chosen is not null)
        {
            field.Field.Text = chosen;
        }
    }
}
