namespace RotorDrive.Tui.Charts;

/// <summary>A chart drawn into character cells: each cell's character and what drew it (a series index, or one of the
/// <c>Axis</c>/<c>Text</c>/<c>Cursor</c>/<c>Blank</c> codes), so a view can colour it and a test can read it.</summary>
public sealed class ChartPicture
{
    /// <summary>An empty cell.</summary>
    public const int Blank = -1;

    /// <summary>An axis line or tick.</summary>
    public const int Axis = -2;

    /// <summary>A label or axis name.</summary>
    public const int Text = -3;

    /// <summary>The readout cursor.</summary>
    public const int Cursor = -4;

    private readonly char[,] _chars;
    private readonly int[,] _owners;

    /// <summary>Creates a blank picture.</summary>
    /// <param name="width">Columns, at least 1.</param>
    /// <param name="height">Rows, at least 1.</param>
    public ChartPicture(int width, int height)
    {
        Width = Math.Max(1, width);
        Height = Math.Max(1, height);
        _chars = new char[Height, Width];
        _owners = new int[Height, Width];
        for (int r = 0; r < Height; r++)
        {
            for (int c = 0; c < Width; c++)
            {
                _chars[r, c] = ' ';
                _owners[r, c] = Blank;
            }
        }
    }

    /// <summary>Columns.</summary>
    public int Width { get; }

    /// <summary>Rows.</summary>
    public int Height { get; }

    /// <summary>The plot area's first column (right of the vertical axis).</summary>
    public int PlotLeft { get; internal set; }

    /// <summary>The plot area's first row.</summary>
    public int PlotTop { get; internal set; }

    /// <summary>The plot area's width in cells.</summary>
    public int PlotWidth { get; internal set; }

    /// <summary>The plot area's height in cells.</summary>
    public int PlotHeight { get; internal set; }

    /// <summary>The character in a cell.</summary>
    public char CharAt(int column, int row) => _chars[row, column];

    /// <summary>What drew a cell: a series index (0 or more) or a code.</summary>
    public int OwnerAt(int column, int row) => _owners[row, column];

    /// <summary>One row as text.</summary>
    public string Row(int row)
    {
        var chars = new char[Width];
        for (int c = 0; c < Width; c++)
        {
            chars[c] = _chars[row, c];
        }
        return new string(chars);
    }

    /// <summary>The whole picture, rows joined by newlines.</summary>
    public override string ToString() => string.Join("\n", Enumerable.Range(0, Height).Select(Row));

    internal void Set(int column, int row, char ch, int owner)
    {
        if (column >= 0 && column < Width && row >= 0 && row < Height)
        {
            _chars[row, column] = ch;
            _owners[row, column] = owner;
        }
    }

    internal void Write(int column, int row, string text, int owner)
    {
        for (int i = 0; i < text.Length; i++)
        {
            Set(column + i, row, text[i], owner);
        }
    }
}
