using System.Globalization;

namespace RotorDrive.Files;

/// <summary>Every message RotorDrive.Files reports about user input; tests assert against these builders.</summary>
/// <remarks>Messages say what rule was broken and, where it helps, what value was found and what is allowed.</remarks>
public static class Messages
{
    private static string N(double value) => value.ToString("G", CultureInfo.InvariantCulture);

    // ---- files ----

    /// <summary>The file does not exist.</summary>
    public static string FileNotFound() => "file not found";

    /// <summary>The file exists but could not be read.</summary>
    public static string FileUnreadable(string reason) => $"cannot read the file: {reason}";

    /// <summary>The file would be overwritten without permission.</summary>
    public static string FileExists() => "the file already exists; pass --force to overwrite it";

    /// <summary>An output path that names a folder.</summary>
    public static string PathIsFolder() => "this is a folder, not a file; give a file name inside it (e.g. FOLDER/result.csv)";

    /// <summary>Writing a file failed.</summary>
    public static string FileNotWritten(string reason) => $"cannot write the file: {reason}";

    /// <summary>A plot file named with an extension that picks no image format.</summary>
    public static string PlotExtension() => "a plot file must end in .svg or .png (the extension picks the format)";

    // ---- CSV structure ----

    /// <summary>A CSV file with no header row.</summary>
    public static string EmptyCsv() => "the file is empty; expected a header row";

    /// <summary>A required column is absent from the header.</summary>
    public static string MissingColumn(string column) => $"required column '{column}' is missing";

    /// <summary>A header names a column the file type does not have.</summary>
    public static string UnknownColumn(string column, string? suggestion)
        => suggestion is null
            ? $"unknown column '{column}'; extra columns must be named 'note' or start with 'x_'"
            : $"unknown column '{column}' (did you mean '{suggestion}'?); extra columns must be named 'note' or start with 'x_'";

    /// <summary>A header names the same column twice.</summary>
    public static string DuplicateColumn(string column) => $"column '{column}' appears more than once in the header";

    /// <summary>A row's field count differs from the header's.</summary>
    public static string FieldCount(int expected, int actual) => $"the row has {actual} fields but the header has {expected}";

    /// <summary>A row with broken quoting.</summary>
    public static string MalformedRow(string reason) => $"malformed row ({reason}); quote fields with \"...\" and double any quote inside";

    /// <summary>An id used by an earlier row.</summary>
    public static string DuplicateId(string id, int firstLine) => $"duplicate id '{id}' (first used on line {firstLine})";

    // ---- CSV values ----

    /// <summary>A required value is empty.</summary>
    public static string ValueRequired() => "a value is required";

    /// <summary>Text that is not a number.</summary>
    public static string NotANumber(string text) => $"'{text}' is not a number (use a dot as decimal separator, e.g. 12.5)";

    /// <summary>NaN or infinity, or a number too large to represent.</summary>
    public static string NotFinite(string text) => $"'{text}' is not a finite number";

    /// <summary>Text that is not a whole number.</summary>
    public static string NotAnInteger(string text) => $"'{text}' is not a whole number";

    /// <summary>Text that is not a boolean.</summary>
    public static string NotABoolean(string text) => $"'{text}' is not true or false (accepted: true/false, yes/no, 1/0)";

    /// <summary>A value that must be greater than zero.</summary>
    public static string MustBePositive(double value) => $"must be greater than 0; got {N(value)}";

    /// <summary>A value beyond the physical bound of its kind (a typo, or a unit slip).</summary>
    public static string MustBeAtMost(double max, double value)
        => $"must be at most {N(max)} (a larger value is no part of a levitation rig; check the unit); got {N(value)}";

    /// <summary>A value that must not be negative.</summary>
    public static string MustBeNonNegative(double value) => $"must be 0 or more; got {N(value)}";

    /// <summary>A value outside an inclusive range.</summary>
    public static string MustBeBetween(double min, double max, double value) => $"must be between {N(min)} and {N(max)}; got {N(value)}";

    /// <summary>A whole number below its minimum.</summary>
    public static string MustBeAtLeast(int min, int value) => $"must be at least {min}; got {value}";

    /// <summary>A motor pole count that is not an even number of at least 2.</summary>
    public static string PolesMustBeEven(int value) => $"must be an even number of at least 2 (magnet poles, not pole pairs); got {value}";

    /// <summary>Inner radius not below outer radius.</summary>
    public static string InnerRadiusNotBelowOuter(double innerMm, double outerMm)
        => $"inner radius {N(innerMm)} mm must be less than outer_radius_mm {N(outerMm)} mm";

    /// <summary>Segment count not a multiple of segments per wavelength.</summary>
    public static string SegmentsNotMultiple(int segments, int perWavelength)
        => $"segments ({segments}) must be a whole multiple of segments_per_wavelength ({perWavelength})";

    /// <summary>Burst rating below continuous rating.</summary>
    public static string BurstBelowContinuous(string continuousColumn, double burst, double continuous)
        => $"must be at least {continuousColumn} ({N(continuous)}); got {N(burst)}";

    /// <summary>Largest cell count below the smallest.</summary>
    public static string MaxCellsBelowMin(int max, int min) => $"must be at least min_cells ({min}); got {max}";

    /// <summary>One retainer column given without the other.</summary>
    public static string RetainerPairIncomplete(string missingColumn)
        => $"give {missingColumn} too: the retaining ring needs both thickness and allowable stress";

    /// <summary>A cell curve whose state of charge does not strictly increase.</summary>
    public static string SocNotIncreasing(string chemistry, double previous, double value)
        => $"soc_pct of chemistry '{chemistry}' must increase row by row; {N(value)} follows {N(previous)}";

    /// <summary>A cell curve whose voltage falls as the state of charge rises.</summary>
    public static string OcvDecreasing(string chemistry, double previous, double value)
        => $"ocv_v of chemistry '{chemistry}' must not fall as soc_pct rises; {N(value)} follows {N(previous)}";

    /// <summary>A cell curve with too few points.</summary>
    public static string CurveTooShort(string chemistry, int points)
        => $"the curve of chemistry '{chemistry}' has {points} point(s); at least 2 are needed";

    /// <summary>A curve whose points are split by another chemistry's rows.</summary>
    public static string CurveNotContiguous(string chemistry)
        => $"the rows of chemistry '{chemistry}' must be together, one block per chemistry";

    /// <summary>A pack chemistry with no voltage curve.</summary>
    public static string NoCurveForChemistry(string chemistry, string curveFile)
        => $"chemistry '{chemistry}' has no open-circuit voltage curve in {curveFile}";

    // ---- bench data and calibration files ----

    /// <summary>A spin-down whose times do not increase.</summary>
    public static string TimeNotIncreasing(double previous, double value) => $"time_s must increase row by row; {N(value)} follows {N(previous)}";

    /// <summary>Too few rows of bench data.</summary>
    public static string TooFewBenchRows(int rows, int needed) => $"the bench file has {rows} usable row(s); at least {needed} are needed";

    /// <summary>A bench file whose header names neither shape.</summary>
    public static string BenchHeaderUnknown()
        => "the header must name either a spin-down (time_s, speed_rpm, optional gap_mm) or steady points (speed_rpm, gap_mm, torque_nm, optional lift_n, plate_temp_c)";

    /// <summary>A calibration file row or key that is missing.</summary>
    public static string CalibrationMissing(string key) => $"the calibration file has no '{key}' row";

    /// <summary>A calibration made for another rotor.</summary>
    public static string CalibrationRotorMismatch(string fileRotor, string rigRotor)
        => $"this calibration was made for rotor '{fileRotor}', not '{rigRotor}'";

    /// <summary>A rotor row that changed since its calibration.</summary>
    public static string CalibrationRotorChanged(string rotor)
        => $"the catalog row of rotor '{rotor}' changed since this calibration (rotor_row_sha256 differs); run 'rotordrive calibrate' again";

    /// <summary>A calibration entry for a rotor no station uses.</summary>
    public static string CalibrationUnusedRotor(string rotor) => $"no station uses rotor '{rotor}'";

    /// <summary>A calibration factor that no load model accepts.</summary>
    public static string CalibrationFactorInvalid(string key, double value) => $"{key} must be greater than 0; got {N(value)}";

    // ---- rig file (JSON) ----

    /// <summary>The rig file is not valid JSON.</summary>
    public static string JsonSyntax(string detail) => $"not valid JSON: {detail}";

    /// <summary>A number in the rig file written with a decimal comma.</summary>
    /// <param name="number">The number as written ("12,5").</param>
    public static string JsonDecimalComma(string number)
        => $"'{number}' has a decimal comma; JSON numbers take a dot as decimal separator: write {number.Replace(',', '.')}";

    /// <summary>A catalog exported with semicolons between fields (a spreadsheet in a locale with decimal commas).</summary>
    /// <param name="separator">The separator found, in words ("semicolons").</param>
    public static string CsvWrongSeparator(string separator)
        => $"this file has {separator} between its fields (a spreadsheet export in a locale that writes decimal commas); catalogs are "
            + "comma-separated with a dot as decimal separator: export again as CSV with commas (for example with the spreadsheet's "
            + "language set to English, or \"CSV (comma delimited)\" with a dot as decimal separator), or replace the separators";

    /// <summary>A key the rig file format does not have.</summary>
    public static string UnknownKey(string key, string? suggestion)
        => suggestion is null ? $"unknown key '{key}'" : $"unknown key '{key}' (did you mean '{suggestion}'?)";

    /// <summary>A key given twice in one object.</summary>
    public static string DuplicateKey(string key) => $"key '{key}' appears more than once";

    /// <summary>A required key is absent.</summary>
    public static string MissingKey(string key) => $"required key '{key}' is missing";

    /// <summary>A value of the wrong JSON type.</summary>
    public static string WrongType(string expected, string found) => $"expected {expected}, found {found}";

    /// <summary>A spin direction that is neither cw nor ccw.</summary>
    public static string BadSpin(string text) => $"'{text}' is not a spin direction; use \"cw\" or \"ccw\"";

    /// <summary>An unknown load model name.</summary>
    public static string BadLoadModel(string text) => $"'{text}' is not a load model; use \"3d\" (the default) or \"2d\"";

    /// <summary>An unknown rotor array name.</summary>
    public static string BadArray(string text) => $"'{text}' is not a rotor array; use \"halbach\" or \"alternating\"";

    /// <summary>An alternating-pole rotor whose segments per wavelength is not 2.</summary>
    public static string AlternatingNeedsTwoPerWavelength(int m) => $"an alternating-pole rotor has two magnets per wavelength; segments_per_wavelength must be 2, got {m}";

    /// <summary>A magnet arc fraction given for a Halbach array.</summary>
    public static string ArcFractionOnlyForAlternating() => "magnet_arc_fraction applies to alternating-pole rotors only (a Halbach array is full)";

    /// <summary>A rig with no stations.</summary>
    public static string NoStations() => "the rig needs at least one station";

    /// <summary>An id not found in the named catalog.</summary>
    public static string UnknownId(string kind, string id, string catalogFile)
        => $"no {kind} with id '{id}' in {catalogFile}";

    /// <summary>A landed gap larger than the design gap.</summary>
    public static string LandedAboveDesign(double landedMm, double designMm)
        => $"landed gap {N(landedMm)} mm must not exceed the design gap {N(designMm)} mm";

    /// <summary>Two stations whose rotors overlap.</summary>
    /// <param name="other">The other station as outputs name it ("station 2 (front left)").</param>
    /// <param name="distanceMm">Distance between the axes, mm.</param>
    /// <param name="neededMm">The sum of the two outer radii, mm.</param>
    public static string StationsOverlap(string other, double distanceMm, double neededMm)
        => $"this rotor overlaps the rotor of {other}: axes {N(distanceMm)} mm apart, at least {N(neededMm)} mm needed";

    /// <summary>An unknown mount.</summary>
    public static string BadMount(string text) => $"'{text}' is not a mount; use \"free\" (the default), \"guided\" or \"bench\"";

    /// <summary>A whole-craft analysis asked of a rig that is not a free craft.</summary>
    /// <param name="command">The command.</param>
    /// <param name="mount">The rig's mount ("bench").</param>
    public static string NotForMount(string command, string mount) => mount == "bench"
        ? $"'{command}' is not for a bench rig (mount \"bench\": each rotor on a stand at a fixed gap, no hover); use 'spinup' or 'endurance' for the stations on their stands, or 'load' or 'operate' for each station"
        : $"'{command}' is not for a guided rig (mount \"guided\": rails carry pitch, roll and yaw, which this analysis balances for a free craft); use 'hover', 'spinup' or 'endurance' for the sled, or 'load' or 'operate' for each station";

    /// <summary>A bench-only option (the stands' gap or duty) given for a rig that is not a bench.</summary>
    /// <param name="option">The option ("--gap-mm").</param>
    /// <param name="mount">The rig's mount.</param>
    public static string StandsOptionsNeedBench(string option, string mount)
        => $"{option} sets the stands of a bench rig (mount \"bench\"); this rig's mount is \"{mount}\"";

    /// <summary>A station's set duty above the rig's max duty.</summary>
    public static string DutyAboveMax(double duty, double maxDuty)
        => $"duty {N(duty)} is above limits.max_duty ({N(maxDuty)}); lower it or raise the limit";

    /// <summary>A set duty on a free craft, whose trim finds every duty itself.</summary>
    public static string DutyOnFreeCraft()
        => "a free craft's trim sets every station's duty: stations[].duty is for a guided or bench rig (set \"mount\") or leave it out";

    /// <summary>A guided rig with set duties on some stations but not all.</summary>
    /// <param name="withDuty">A station number (from 1) that has a duty.</param>
    public static string GuidedDutiesPartial(int withDuty)
        => $"a guided rig's duties are set on every station or on none: this station has none while station {withDuty} has one "
            + "(leave all out to hover at one common duty)";

    /// <summary>A station name that is empty or a number (which --station would read as a station number).</summary>
    public static string BadStationName(string name)
        => $"'{name}' cannot name a station: use words (e.g. \"front left\"), not an empty text or a number";

    /// <summary>Two stations with the same name.</summary>
    public static string DuplicateStationName(string name, int firstNumber)
        => $"station name '{name}' is already used by station {firstNumber} (names must differ, ignoring case)";

    /// <summary>A whole-number JSON value that has a fraction.</summary>
    public static string JsonNotAnInteger(double value) => $"must be a whole number; got {N(value)}";

    // ---- tolerances ----

    /// <summary>A tolerance entry without exactly one spread.</summary>
    public static string ToleranceNeedsOneSpread(int found)
        => found == 0
            ? "give one spread: normal_sd_pct, normal_sd, uniform_pct or uniform"
            : $"give only one spread (found {found}): normal_sd_pct, normal_sd, uniform_pct or uniform";

    /// <summary>A percentage spread for a quantity whose nominal is zero or on an interval scale.</summary>
    public static string ToleranceAbsoluteOnly(string key)
        => $"'{key}' takes only absolute spreads (normal_sd or uniform, in the unit the key names); a percentage of its nominal means nothing";

    /// <summary>Uniform bounds out of order.</summary>
    public static string ToleranceBoundsOrder(double low, double high) => $"the low bound ({N(low)}) must not exceed the high bound ({N(high)})";

    /// <summary>A tolerance whose spread can carry a positive quantity to zero or below (see
    /// <see cref="Core.Studies.Stress.StressSpreadRule"/>).</summary>
    /// <param name="what">What must stay in range, in words.</param>
    /// <param name="station">The first station where it fails, or null for a rig-wide quantity.</param>
    /// <param name="nominal">The nominal value, in the key's unit.</param>
    /// <param name="lowest">The lowest value the spread reaches, in the key's unit.</param>
    /// <param name="unit">The key's unit.</param>
    /// <param name="zeroAllowed">True when the quantity may reach zero but not go below it.</param>
    /// <param name="normal">True for a normal spread, false for a uniform one.</param>
    /// <remarks><paramref name="station"/> is the station's index, 0-based; the message counts from 1.</remarks>
    public static string ToleranceReachesZero(string what, int? station, double nominal, double lowest, string unit, bool zeroAllowed, bool normal)
    {
        string where = station is { } s ? $" at station {s + 1}" : "";
        string how = normal
            ? $"{G(nominal)} {unit} minus {G(Core.Studies.Stress.StressSpreadRule.NormalReachSd)} standard deviations"
            : $"{G(nominal)} {unit} plus the lower bound";
        string bound = zeroAllowed ? "at or above 0" : "above 0";
        return $"this spread can make the {what}{where} {(zeroAllowed ? "negative" : "zero or negative")}: it reaches {G(lowest)} {unit} ({how}); "
            + $"rule: a uniform spread's lower bound, or {G(Core.Studies.Stress.StressSpreadRule.NormalReachSd)} standard deviations below nominal for a normal spread, must stay {bound}";
    }

    /// <summary>A temperature spread reaching outside the range the rig file accepts for that temperature.</summary>
    /// <param name="what">The temperature, in words.</param>
    /// <param name="low">Lowest value the spread reaches, C.</param>
    /// <param name="high">Highest value the spread reaches, C.</param>
    /// <param name="min">Lowest accepted, C.</param>
    /// <param name="max">Highest accepted, C.</param>
    public static string ToleranceTemperatureRange(string what, double low, double high, double min, double max)
        => $"this spread takes the {what} to {G(low)} .. {G(high)} C, outside the {G(min)} .. {G(max)} C the rig file accepts for it; "
            + $"rule: a uniform spread's bounds, or {G(Core.Studies.Stress.StressSpreadRule.NormalReachSd)} standard deviations either side of nominal for a normal spread, must stay within that range";

    private static string G(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    // ---- command line ----

    /// <summary>A route leg that is neither a dwell nor a move.</summary>
    public static string RouteLegShape() => "a route leg is either a dwell {\"dwell_s\": ...} or a move {\"x_mm\": ..., \"y_mm\": ..., \"speed_m_per_s\": ...}, not a mix";

    /// <summary>An empty route.</summary>
    public static string RouteEmpty() => "the route needs at least one leg (leave the key out to hover in place)";

    /// <summary>An unexpected failure reported in one line.</summary>
    public static string Unexpected(string detail) => $"unexpected error: {detail}";
}
