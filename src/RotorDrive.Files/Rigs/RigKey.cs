using System.Collections;
using System.Globalization;
using RotorDrive.Files.Catalogs;

namespace RotorDrive.Files.Rigs;

/// <summary>One key of the rig file: where it sits, what it holds, its unit, valid range, default and help text, and
/// how to get and set it on the <see cref="RigDocument"/> section that holds it. <see cref="RigSchema"/> lists them all.</summary>
public sealed class RigKey
{
    private readonly Func<object, object?> _get;
    private readonly Action<object, object?> _set;
    private readonly Func<object>? _create;
    private readonly Func<object>? _createItem;

    internal RigKey(string path, RigValueKind kind, string unit, bool required, string label, string help,
        Func<object, object?> get, Action<object, object?> set)
    {
        int dot = path.LastIndexOf('.');
        Section = dot < 0 ? "" : path[..dot];
        Key = dot < 0 ? path : path[(dot + 1)..];
        Kind = kind;
        Unit = unit;
        Required = required;
        Label = label;
        Help = help;
        _get = get;
        _set = set;
    }

    internal RigKey(string path, RigValueKind kind, bool required, string help, Func<object, object?> get, Action<object, object?> set,
        Func<object>? create, Func<object>? createItem = null)
        : this(path, kind, "", required, path, help, get, set)
    {
        _create = create;
        _createItem = createItem;
    }

    /// <summary>The section path that holds the key: "" for the top level, "plate", "stations[]".</summary>
    public string Section { get; }

    /// <summary>The key itself ("thickness_mm").</summary>
    public string Key { get; }

    /// <summary>The key with its section, as the README writes it ("plate.thickness_mm", "stations[].x_mm").</summary>
    public string Name => Section.Length == 0 ? Key : Section + "." + Key;

    /// <summary>What the key holds.</summary>
    public RigValueKind Kind { get; }

    /// <summary>The unit of a number as people write it ("mm", "W/(m^2 K)"), "1" for a plain ratio, "" otherwise.</summary>
    public string Unit { get; }

    /// <summary>True when the section holding the key needs it.</summary>
    public bool Required { get; }

    /// <summary>A short label for a form field ("thickness").</summary>
    public string Label { get; }

    /// <summary>One or two sentences on what the key means.</summary>
    public string Help { get; }

    /// <summary>The range a number or whole number must lie in; null for other kinds.</summary>
    public ValueRule? Rule { get; init; }

    /// <summary>The value an optional number takes when the key is left out; null when there is none or it depends on
    /// another key (<see cref="DefaultNote"/> says which).</summary>
    public double? Default { get; init; }

    /// <summary>The default in words when it is not one fixed number ("plate.convection_w_per_m2k", "3d").</summary>
    public string? DefaultNote { get; init; }

    /// <summary>A rule beyond the range, in words ("at most gap.design_mm").</summary>
    public string? RangeNote { get; init; }

    /// <summary>For a choice: the words accepted (case-insensitive).</summary>
    public IReadOnlyList<string> Choices { get; init; } = [];

    /// <summary>For a catalog id: the catalog's usual file name ("plates.csv").</summary>
    public string? CatalogFile { get; init; }

    /// <summary>For a section list: the fewest elements a rig may have (0 when any number will do).</summary>
    public int MinItems { get; init; }

    /// <summary>The JSON path problems name: "$.plate.thickness_mm", or "$.stations[2].x_mm" with an element index.</summary>
    /// <param name="index">The element of a section list the key belongs to (0-based, as JSON counts).</param>
    public string JsonPath(int index = 0)
    {
        string section = Section.Replace("[]", "[" + index.ToString(CultureInfo.InvariantCulture) + "]", StringComparison.Ordinal);
        return section.Length == 0 ? "$." + Key : "$." + section + "." + Key;
    }

    /// <summary>The valid range in words ("0.01 to 200", "an id of plates.csv", "\"cw\" or \"ccw\"").</summary>
    public string RangeText()
    {
        string range = Kind switch
        {
            RigValueKind.Number or RigValueKind.Integer when Rule is { } rule => rule.Describe(),
            RigValueKind.CatalogId => "an id of " + CatalogFile,
            RigValueKind.Choice => string.Join(" or ", Choices.Select(c => "\"" + c + "\"")),
            RigValueKind.Text when Required => "not empty",
            RigValueKind.SectionList when MinItems > 0 => $"at least {MinItems.ToString(CultureInfo.InvariantCulture)}",
            _ => "",
        };
        return RangeNote is null ? range : range.Length == 0 ? RangeNote : range + ", " + RangeNote;
    }

    /// <summary>The default in words ("12", "plate.convection_w_per_m2k"), or null when there is none.</summary>
    public string? DefaultText()
        => Default is { } d ? d.ToString("R", CultureInfo.InvariantCulture) : DefaultNote;

    /// <summary>The key's value on the section object that holds it (null when absent).</summary>
    /// <param name="section">The <see cref="RigDocument"/> for a top-level key, otherwise the section object.</param>
    public object? Get(object section) => _get(section);

    /// <summary>Sets the key's value on the section object that holds it (null removes it).</summary>
    /// <param name="section">The <see cref="RigDocument"/> for a top-level key, otherwise the section object.</param>
    /// <param name="value">A string, double?, int?, section object or list, as the kind says.</param>
    public void Set(object section, object? value) => _set(section, value);

    /// <summary>A new, empty section object (or list) for a section key.</summary>
    internal object CreateSection() => (_create ?? throw new InvalidOperationException($"{Name} is not a section"))();

    /// <summary>A new, empty element of a section list.</summary>
    internal object CreateItem() => (_createItem ?? throw new InvalidOperationException($"{Name} is not a section list"))();

    /// <summary>The key's value in a whole document (null when it or its section is absent).</summary>
    /// <param name="document">The document.</param>
    /// <param name="index">The element of a section list the key belongs to.</param>
    public object? ValueIn(RigDocument document, int index = 0)
        => HolderIn(document, index, create: false) is { } holder ? Get(holder) : null;

    /// <summary>Stores a value in a whole document, making the section when it is absent. An element of a section list
    /// that does not exist is not made (the document is left unchanged).</summary>
    /// <param name="document">The document.</param>
    /// <param name="value">The value (null removes the key).</param>
    /// <param name="index">The element of a section list the key belongs to.</param>
    public void StoreIn(RigDocument document, object? value, int index = 0)
    {
        if (HolderIn(document, index, create: true) is { } holder)
        {
            Set(holder, value);
        }
    }

    private object? HolderIn(RigDocument document, int index, bool create)
    {
        ArgumentNullException.ThrowIfNull(document);
        if (Section.Length == 0)
        {
            return document;
        }
        bool list = Section.EndsWith("[]", StringComparison.Ordinal);
        var owner = RigSchema.Find(list ? Section[..^2] : Section);
        object? value = owner.Get(document);
        if (list)
        {
            return value is IList items && index >= 0 && index < items.Count ? items[index] : null;
        }
        if (value is null && create)
        {
            value = owner.CreateSection();
            owner.Set(document, value);
        }
        return value;
    }
}
