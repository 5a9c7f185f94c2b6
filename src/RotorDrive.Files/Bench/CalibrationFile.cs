using System.Globalization;
using CsvHelper;
using RotorDrive.Core;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Studies.Calibration;

namespace RotorDrive.Files.Bench;

/// <summary>The calibration file: one CSV with a header and one row per entry, written by <c>rotordrive calibrate --out</c>
/// and named per rotor by the rig's "calibrations" key.</summary>
/// <remarks>
/// <para>Columns: key, value, lower, upper, standard_error, fitted, undetermined, and the covariance row
/// cov_conductivity_factor, cov_field_factor, cov_bearing_drag_nm, cov_bearing_damping_nm_per_krpm. Rows: rotor,
/// kind (steady_points or spin_down), data_file, data_sha256, rotor_row_sha256, confidence_level (text in the value column),
/// then conductivity_factor, field_factor, bearing_drag_nm and bearing_damping_nm_per_krpm with their interval,
/// standard error, flags and covariance row in the file's units (bearing damping in N m per 1000 rpm).</para>
/// <para>Hashes are SHA-256 (FIPS 180-4): of the bench file's text, and of the rotor's catalog row in a canonical form
/// (<see cref="RotorRowHash"/>), so a changed rotor row is caught when the rig loads.</para>
/// </remarks>
public static class CalibrationFile
{
    private static readonly string[] Header =
    [
        "key", "value", "lower", "upper", "standard_error", "fitted", "undetermined",
        "cov_conductivity_factor", "cov_field_factor", "cov_bearing_drag_nm", "cov_bearing_damping_nm_per_krpm",
    ];

    /// <summary>N m per rad/s in one N m per 1000 rpm: a damping in N m/krpm is the SI value times this.</summary>
    public const double RadPerSPerKrpm = 1000.0 * Units.RadPerSPerRpm;

    private static readonly string[] QuantityKeys = ["conductivity_factor", "field_factor", "bearing_drag_nm", "bearing_damping_nm_per_krpm"];

    /// <summary>Canonical SHA-256 of a rotor row: its id and every value, invariant round-trip formatting, comma separated.</summary>
    /// <param name="rotor">The rotor design.</param>
    public static string RotorRowHash(RotorDesign rotor)
    {
        ArgumentNullException.ThrowIfNull(rotor);
        static string F(double? v) => v is { } x ? x.ToString("R", CultureInfo.InvariantCulture) : "";
        string canonical = string.Join(",", rotor.Id, rotor.Segments.ToString(CultureInfo.InvariantCulture),
            rotor.SegmentsPerWavelength.ToString(CultureInfo.InvariantCulture), F(rotor.InnerRadiusM), F(rotor.OuterRadiusM), F(rotor.MagnetThicknessM),
            F(rotor.RemanenceT), F(rotor.RemanenceTempCoeffPerK), F(rotor.MagnetDensityKgM3), F(rotor.RotorMassKg), F(rotor.InertiaKgM2),
            F(rotor.MaxSpeedRadPerS), F(rotor.BearingDragNm), F(rotor.BearingDampingNmPerRadPerS), F(rotor.RetainerThicknessM), F(rotor.RetainerAllowablePa));
        return Hashes.Sha256(canonical);
    }

    /// <summary>The file's text for a fit.</summary>
    /// <param name="result">An accepted fit.</param>
    /// <param name="rotor">The rotor it was fitted for.</param>
    /// <param name="dataFile">The bench file's name as the user gave it.</param>
    /// <param name="dataSha256">SHA-256 of the bench file's text.</param>
    public static string Write(CalibrationResult result, RotorDesign rotor, string dataFile, string dataSha256)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(rotor);
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        using (var writer = CsvWriter.Create(text, CsvWriterOptions.Default with { NewLine = "\n", Separator = ',' }, leaveOpen: true))
        {
            writer.WriteHeader(Header);
            string?[] Meta(string key, string value) => [key, value, null, null, null, null, null, null, null, null, null];
            writer.WriteRecord(Meta("rotor", rotor.Id));
            writer.WriteRecord(Meta("kind", result.Kind == CalibrationKind.SpinDown ? "spin_down" : "steady_points"));
            writer.WriteRecord(Meta("data_file", Path.GetFileName(dataFile)));
            writer.WriteRecord(Meta("data_sha256", dataSha256));
            writer.WriteRecord(Meta("rotor_row_sha256", RotorRowHash(rotor)));
            writer.WriteRecord(Meta("confidence_level", R(result.ConfidenceLevelFraction)));
            for (int k = 0; k < 4; k++)
            {
                var e = result.Estimates[k];
                double unit = UnitScale(k);
                var row = new string?[Header.Length];
                row[0] = QuantityKeys[k];
                row[1] = R(e.Value * unit);
                row[2] = e.Fitted ? R(e.Lower * unit) : null;
                row[3] = e.Fitted ? R(e.Upper * unit) : null;
                row[4] = e.Fitted ? R(e.StandardError * unit) : null;
                row[5] = e.Fitted ? "true" : "false";
                row[6] = e.Undetermined ? "true" : "false";
                for (int c = 0; c < 4; c++)
                {
                    row[7 + c] = R(result.Covariance[k][c] * unit * UnitScale(c));
                }
                writer.WriteRecord(row);
            }
            writer.Flush();
        }
        return text.ToString();
    }

    /// <summary>Reads a calibration file's text; never throws on bad input.</summary>
    /// <param name="text">The whole file.</param>
    /// <param name="file">The file name for problems.</param>
    /// <param name="problems">Where every problem is reported.</param>
    /// <returns>The calibration with its rotor-row hash and its data file's name and hash, or null when the file has problems.</returns>
    public static (RotorCalibration Calibration, string RotorRowSha256, string? DataFile, string? DataSha256)? Read(string text, string file, List<InputProblem> problems)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(problems);
        int before = problems.Count;
        if (ReadRows(text, file, problems) is not { } rows)
        {
            return null;
        }
        string? rotor = Meta(rows, "rotor", file, problems);
        string? rotorHash = Meta(rows, "rotor_row_sha256", file, problems);
        var (values, fitted, covariance) = ReadQuantities(rows, file, problems);
        if (problems.Count > before || rotor is null || rotorHash is null)
        {
            return null;
        }
        var factors = new LoadCalibration(values[0], values[1], fitted[2] ? values[2] : null, fitted[3] ? values[3] : null);
        string? dataFile = rows.TryGetValue("data_file", out var d) && d.Fields[1].Length > 0 ? d.Fields[1] : null;
        string? dataHash = rows.TryGetValue("data_sha256", out var h) && h.Fields[1].Length > 0 ? h.Fields[1] : null;
        return (new RotorCalibration(rotor, factors, covariance, Path.GetFileName(file)), rotorHash, dataFile, dataHash);
    }

    // The rows by key, after checking the header; null when the header or the CSV itself is broken (rows with the wrong
    // number of fields are reported and skipped).
    private static Dictionary<string, (string[] Fields, int Line)>? ReadRows(string text, string file, List<InputProblem> problems)
    {
        int before = problems.Count;
        var rows = new Dictionary<string, (string[] Fields, int Line)>(StringComparer.OrdinalIgnoreCase);
        var options = CsvReaderOptions.Default with { TrackLineNumbers = true, Separator = ',' };
        try
        {
            using var reader = CsvReader.FromText(text.TrimStart('\uFEFF'), options);
            reader.ReadHeader();
            var headers = reader.Headers.Select(h => h.Trim()).ToArray();
            int headerLine = (int)reader.LineNumber;
            for (int i = 0; i < Header.Length; i++)
            {
                if (i >= headers.Length || !string.Equals(headers[i], Header[i], StringComparison.OrdinalIgnoreCase))
                {
                    problems.Add(new InputProblem(file, headerLine, i + 1, Header[i], Messages.MissingColumn(Header[i])));
                }
            }
            if (problems.Count > before)
            {
                return null;
            }
            while (reader.Read())
            {
                var fields = new string[reader.FieldCount];
                for (int i = 0; i < fields.Length; i++)
                {
                    fields[i] = reader.GetString(i).Trim();
                }
                int line = (int)reader.LineNumber;
                if (fields.Length != Header.Length)
                {
                    problems.Add(new InputProblem(file, line, 0, "", Messages.FieldCount(Header.Length, fields.Length)));
                    continue;
                }
                rows[fields[0]] = (fields, line);
            }
        }
        catch (CsvFormatException e)
        {
            problems.Add(new InputProblem(file, (int)Math.Max(0, e.LineNumber), 0, "", Messages.MalformedRow(e.Message)));
            return null;
        }
        return rows;
    }

    // The four quantities in SI: value, whether it was fitted, and its covariance row.
    private static (double[] Values, bool[] Fitted, double[][] Covariance) ReadQuantities(Dictionary<string, (string[] Fields, int Line)> rows,
        string file, List<InputProblem> problems)
    {
        var values = new double[4];
        var fitted = new bool[4];
        var covariance = new double[4][];
        for (int k = 0; k < 4; k++)
        {
            covariance[k] = new double[4];
            if (!rows.TryGetValue(QuantityKeys[k], out var row))
            {
                problems.Add(new InputProblem(file, 0, 0, QuantityKeys[k], Messages.CalibrationMissing(QuantityKeys[k])));
                continue;
            }
            values[k] = Number(QuantityKeys[k], 1, row, k < 2, file, problems) / UnitScale(k);
            fitted[k] = string.Equals(row.Fields[5], "true", StringComparison.OrdinalIgnoreCase);
            if (k >= 2 && values[k] < 0)
            {
                problems.Add(new InputProblem(file, row.Line, 2, "value", Messages.MustBeNonNegative(values[k] * UnitScale(k))));
            }
            for (int c = 0; c < 4; c++)
            {
                covariance[k][c] = Number(QuantityKeys[k], 7 + c, row, false, file, problems) / (UnitScale(k) * UnitScale(c));
            }
        }
        return (values, fitted, covariance);
    }

    // A text entry from the value column, or null (reported) when the row is missing or empty.
    private static string? Meta(Dictionary<string, (string[] Fields, int Line)> rows, string key, string file, List<InputProblem> problems)
    {
        if (!rows.TryGetValue(key, out var row) || row.Fields[1].Length == 0)
        {
            problems.Add(new InputProblem(file, 0, 0, key, Messages.CalibrationMissing(key)));
            return null;
        }
        return row.Fields[1];
    }

    // A number from one column of a quantity's row; NaN (reported) when it is not a finite number, and reported when it
    // must be positive and is not.
    private static double Number(string key, int column, (string[] Fields, int Line) row, bool positive, string file, List<InputProblem> problems)
    {
        string t = row.Fields[column];
        if (!double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
        {
            problems.Add(new InputProblem(file, row.Line, column + 1, Header[column], Messages.NotANumber(t)));
            return double.NaN;
        }
        if (positive && !(v > 0))
        {
            problems.Add(new InputProblem(file, row.Line, column + 1, Header[column], Messages.CalibrationFactorInvalid(key, v)));
        }
        return v;
    }

    // File units per SI unit: bearing damping is written per 1000 rpm.
    private static double UnitScale(int k) => k == 3 ? RadPerSPerKrpm : 1.0;

    private static string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
