using System.Text;
using System.Text.Json;

namespace RotorDrive.Files.Rigs;

/// <summary>Writes a <see cref="RigDocument"/> as indented JSON with the rig file's keys; absent values are left out.</summary>
public static class RigDocumentWriter
{
    /// <summary>The document as JSON text (UTF-8 content, "\n" line ends, 2-space indent).</summary>
    public static string Write(RigDocument document)
    {
        ArgumentNullException.ThrowIfNull(document);
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            Str(w, "name", document.Name);
            if (document.Catalogs is { } c)
            {
                w.WriteStartObject("catalogs");
                Str(w, "motors", c.Motors);
                Str(w, "controllers", c.Controllers);
                Str(w, "packs", c.Packs);
                Str(w, "cell_curves", c.CellCurves);
                Str(w, "rotors", c.Rotors);
                Str(w, "plates", c.Plates);
                w.WriteEndObject();
            }
            if (document.Plate is { } p)
            {
                w.WriteStartObject("plate");
                Str(w, "material", p.Material);
                Num(w, "thickness_mm", p.ThicknessMm);
                Num(w, "temperature_c", p.TemperatureC);
                Num(w, "convection_w_per_m2k", p.ConvectionWPerM2K);
                Num(w, "spreading_factor", p.SpreadingFactor);
                Num(w, "convection_top_w_per_m2k", p.ConvectionTopWPerM2K);
                Num(w, "convection_bottom_w_per_m2k", p.ConvectionBottomWPerM2K);
                Num(w, "emissivity", p.Emissivity);
                Num(w, "back_iron_mm", p.BackIronMm);
                w.WriteEndObject();
            }
            if (document.Craft is { } k)
            {
                w.WriteStartObject("craft");
                Num(w, "empty_mass_kg", k.EmptyMassKg);
                Num(w, "payload_kg", k.PayloadKg);
                Num(w, "cg_x_mm", k.CgXMm);
                Num(w, "cg_y_mm", k.CgYMm);
                Num(w, "yaw_inertia_kg_m2", k.YawInertiaKgM2);
                Num(w, "heave_damping_ratio", k.HeaveDampingRatio);
                w.WriteEndObject();
            }
            if (document.Gap is { } g)
            {
                w.WriteStartObject("gap");
                Num(w, "design_mm", g.DesignMm);
                Num(w, "landed_mm", g.LandedMm);
                w.WriteEndObject();
            }
            Num(w, "ambient_c", document.AmbientC);
            Num(w, "gear_yaw_friction_nm", document.GearYawFrictionNm);
            Str(w, "load_model", document.LoadModel);
            if (document.Stations is { } stations)
            {
                w.WriteStartArray("stations");
                foreach (var s in stations)
                {
                    w.WriteStartObject();
                    Num(w, "x_mm", s.XMm);
                    Num(w, "y_mm", s.YMm);
                    Str(w, "spin", s.Spin);
                    Str(w, "rotor", s.Rotor);
                    Str(w, "motor", s.Motor);
                    Str(w, "controller", s.Controller);
                    w.WriteEndObject();
                }
                w.WriteEndArray();
            }
            if (document.Pack is { } pk)
            {
                w.WriteStartObject("pack");
                Str(w, "id", pk.Id);
                if (pk.Count is { } count)
                {
                    w.WriteNumber("count", count);
                }
                w.WriteEndObject();
            }
            if (document.Limits is { } l)
            {
                w.WriteStartObject("limits");
                Num(w, "yaw_torque_nm", l.YawTorqueNm);
                Num(w, "plate_temp_c", l.PlateTempC);
                Num(w, "cell_cutoff_v", l.CellCutoffV);
                Num(w, "usable_capacity_pct", l.UsableCapacityPct);
                Num(w, "max_duty", l.MaxDuty);
                Num(w, "liftoff_time_s", l.LiftoffTimeS);
                w.WriteEndObject();
            }
            if (document.Tolerances is { } t)
            {
                w.WriteStartObject("tolerances");
                var order = RigToleranceKeys.Keys.Concat(t.Entries.Keys.Where(k => !RigToleranceKeys.Keys.Contains(k)).Order(StringComparer.Ordinal));
                foreach (string key in order)
                {
                    if (!t.Entries.TryGetValue(key, out var e))
                    {
                        continue;
                    }
                    w.WriteStartObject(key);
                    Num(w, "normal_sd_pct", e.NormalSdPct);
                    Num(w, "normal_sd", e.NormalSd);
                    Pair(w, "uniform_pct", e.UniformPct);
                    Pair(w, "uniform", e.Uniform);
                    w.WriteEndObject();
                }
                w.WriteEndObject();
            }
            if (document.Route is { } route)
            {
                w.WriteStartArray("route");
                foreach (var leg in route)
                {
                    w.WriteStartObject();
                    Num(w, "x_mm", leg.XMm);
                    Num(w, "y_mm", leg.YMm);
                    Num(w, "speed_m_per_s", leg.SpeedMPerS);
                    Num(w, "dwell_s", leg.DwellS);
                    w.WriteEndObject();
                }
                w.WriteEndArray();
            }
            if (document.Calibrations is { Count: > 0 } calibrations)
            {
                w.WriteStartObject("calibrations");
                foreach (var (rotor, fileName) in calibrations)
                {
                    w.WriteString(rotor, fileName);
                }
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>Saves the document atomically; refuses to replace an existing file unless <paramref name="overwrite"/>.</summary>
    /// <returns>Null on success, otherwise the problem.</returns>
    public static InputProblem? Save(RigDocument document, string path, bool overwrite)
        => AtomicFile.WriteAllText(path, Write(document), overwrite);

    // A pair with a non-finite value is left out, like a non-finite number (the resolver then reports the entry).
    private static void Pair(Utf8JsonWriter w, string key, double[]? values)
    {
        if (values is { Length: > 0 } && values.All(double.IsFinite))
        {
            w.WriteStartArray(key);
            foreach (double v in values)
            {
                w.WriteNumberValue(v);
            }
            w.WriteEndArray();
        }
    }

    private static void Str(Utf8JsonWriter w, string key, string? value)
    {
        if (value is not null)
        {
            w.WriteString(key, value);
        }
    }

    // Non-finite numbers cannot be written as JSON; an edited document holding one leaves the key out, and the
    // resolver then reports it as missing rather than the file silently holding a wrong number.
    private static void Num(Utf8JsonWriter w, string key, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            w.WriteNumber(key, v);
        }
    }
}
