namespace RotorDrive.Core.Thermal;

/// <summary>A plate temperature field sampled on a square grid of equal spacing.</summary>
/// <param name="OriginXM">x of the first column, m.</param>
/// <param name="OriginYM">y of the first row, m.</param>
/// <param name="SpacingM">Grid spacing, m.</param>
/// <param name="Count">Points per side.</param>
/// <param name="TemperaturesC">Temperatures, C, row by row: index = row x Count + column (row = y, column = x).</param>
/// <param name="TimeS">Time of the field, s.</param>
public sealed record PlateTemperatureMap(double OriginXM, double OriginYM, double SpacingM, int Count, IReadOnlyList<double> TemperaturesC, double TimeS)
{
    /// <summary>x of a column, m.</summary>
    /// <param name="column">Column index.</param>
    public double XM(int column) => OriginXM + column * SpacingM;

    /// <summary>y of a row, m.</summary>
    /// <param name="row">Row index.</param>
    public double YM(int row) => OriginYM + row * SpacingM;

    /// <summary>Temperature at a grid point, C.</summary>
    /// <param name="column">Column (x) index.</param>
    /// <param name="row">Row (y) index.</param>
    public double At(int column, int row) => TemperaturesC[row * Count + column];

    /// <summary>The hottest grid point.</summary>
    public PlateHotspot Hottest()
    {
        int best = 0;
        for (int i = 1; i < TemperaturesC.Count; i++)
        {
            if (TemperaturesC[i] > TemperaturesC[best])
            {
                best = i;
            }
        }
        return new PlateHotspot(XM(best % Count), YM(best / Count), TemperaturesC[best]);
    }
}
