using RotorDrive.Files.Json;

namespace RotorDrive.Files.Rigs;

/// <summary>Reads rig-file JSON (comments and trailing commas allowed) into a <see cref="RigDocument"/>, reporting
/// syntax errors, unknown keys and wrong value types with their JSON path, line and column.</summary>
/// <remarks>Values are not range-checked here; <see cref="RigResolver"/> does that, so an edited document gets the
/// same checks as a file.</remarks>
public static class RigDocumentReader
{
    /// <summary>Reads rig JSON text; never throws on bad input.</summary>
    /// <param name="text">The whole file.</param>
    /// <param name="file">The file name used in problems.</param>
    public static RigDocumentReadResult Read(string text, string file)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(file);
        var problems = new List<InputProblem>();
        var map = new RigSourceMap();
        var root = JsonTreeParser.Parse(text, file, problems);
        if (root is null)
        {
            return new RigDocumentReadResult(null, map, problems);
        }
        Index(root, "$", map);
        var top = JsonObjectScope.Open(root, "$", file, problems);
        if (top is null)
        {
            return new RigDocumentReadResult(null, map, problems);
        }

        var doc = new RigDocument
        {
            Name = top.String("name"),
            AmbientC = top.Number("ambient_c"),
            GearYawFrictionNm = top.Number("gear_yaw_friction_nm"),
            LoadModel = top.String("load_model"),
        };

        if (JsonObjectScope.Open(top.Take("catalogs"), "$.catalogs", file, problems) is { } c)
        {
            doc.Catalogs = new RigCatalogsSection
            {
                Motors = c.String("motors"),
                Controllers = c.String("controllers"),
                Packs = c.String("packs"),
                CellCurves = c.String("cell_curves"),
                Rotors = c.String("rotors"),
                Plates = c.String("plates"),
            };
            c.ReportUnknownKeys();
        }

        if (JsonObjectScope.Open(top.Take("plate"), "$.plate", file, problems) is { } p)
        {
            doc.Plate = new RigPlateSection
            {
                Material = p.String("material"),
                ThicknessMm = p.Number("thickness_mm"),
                TemperatureC = p.Number("temperature_c"),
                ConvectionWPerM2K = p.Number("convection_w_per_m2k"),
                SpreadingFactor = p.Number("spreading_factor"),
                ConvectionTopWPerM2K = p.Number("convection_top_w_per_m2k"),
                ConvectionBottomWPerM2K = p.Number("convection_bottom_w_per_m2k"),
                Emissivity = p.Number("emissivity"),
                BackIronMm = p.Number("back_iron_mm"),
            };
            p.ReportUnknownKeys();
        }

        if (JsonObjectScope.Open(top.Take("craft"), "$.craft", file, problems) is { } k)
        {
            doc.Craft = new RigCraftSection
            {
                EmptyMassKg = k.Number("empty_mass_kg"),
                PayloadKg = k.Number("payload_kg"),
                CgXMm = k.Number("cg_x_mm"),
                CgYMm = k.Number("cg_y_mm"),
                YawInertiaKgM2 = k.Number("yaw_inertia_kg_m2"),
                HeaveDampingRatio = k.Number("heave_damping_ratio"),
            };
            k.ReportUnknownKeys();
        }

        if (JsonObjectScope.Open(top.Take("gap"), "$.gap", file, problems) is { } g)
        {
            doc.Gap = new RigGapSection { DesignMm = g.Number("design_mm"), LandedMm = g.Number("landed_mm") };
            g.ReportUnknownKeys();
        }

        var stationsNode = top.Take("stations");
        if (stationsNode is JsonArrayNode array)
        {
            doc.Stations = [];
            for (int i = 0; i < array.Items.Count; i++)
            {
                string path = $"$.stations[{i}]";
                var s = JsonObjectScope.Open(array.Items[i], path, file, problems);
                if (s is null)
                {
                    doc.Stations.Add(new RigStationSection());
                    continue;
                }
                doc.Stations.Add(new RigStationSection
                {
                    XMm = s.Number("x_mm"),
                    YMm = s.Number("y_mm"),
                    Spin = s.String("spin"),
                    Rotor = s.String("rotor"),
                    Motor = s.String("motor"),
                    Controller = s.String("controller"),
                });
                s.ReportUnknownKeys();
            }
        }
        else if (stationsNode is not null)
        {
            problems.Add(new InputProblem(file, stationsNode.Line, stationsNode.Column, "$.stations",
                Messages.WrongType("an array", stationsNode.Describe())));
        }

        if (JsonObjectScope.Open(top.Take("pack"), "$.pack", file, problems) is { } pk)
        {
            doc.Pack = new RigPackSection { Id = pk.String("id"), Count = pk.Integer("count") };
            pk.ReportUnknownKeys();
        }

        if (JsonObjectScope.Open(top.Take("limits"), "$.limits", file, problems) is { } l)
        {
            doc.Limits = new RigLimitsSection
            {
                YawTorqueNm = l.Number("yaw_torque_nm"),
                PlateTempC = l.Number("plate_temp_c"),
                CellCutoffV = l.Number("cell_cutoff_v"),
                UsableCapacityPct = l.Number("usable_capacity_pct"),
                MaxDuty = l.Number("max_duty"),
                LiftoffTimeS = l.Number("liftoff_time_s"),
            };
            l.ReportUnknownKeys();
        }

        doc.Tolerances = ReadTolerances(top.Take("tolerances"), file, problems);

        var routeNode = top.Take("route");
        if (routeNode is JsonArrayNode legs)
        {
            doc.Route = [];
            for (int i = 0; i < legs.Items.Count; i++)
            {
                var r = JsonObjectScope.Open(legs.Items[i], $"$.route[{i}]", file, problems);
                if (r is null)
                {
                    doc.Route.Add(new RigRouteLegSection());
                    continue;
                }
                doc.Route.Add(new RigRouteLegSection
                {
                    XMm = r.Number("x_mm"),
                    YMm = r.Number("y_mm"),
                    SpeedMPerS = r.Number("speed_m_per_s"),
                    DwellS = r.Number("dwell_s"),
                });
                r.ReportUnknownKeys();
            }
        }
        else if (routeNode is not null)
        {
            problems.Add(new InputProblem(file, routeNode.Line, routeNode.Column, "$.route", Messages.WrongType("an array", routeNode.Describe())));
        }

        if (top.Take("calibrations") is { } calibrationsNode)
        {
            if (calibrationsNode is JsonObjectNode calibrations)
            {
                doc.Calibrations = new Dictionary<string, string>(StringComparer.Ordinal);
                foreach (var member in calibrations.Members)
                {
                    if (member.Value is JsonScalarNode { Kind: JsonScalarKind.String, Text: { } fileName })
                    {
                        doc.Calibrations[member.Key] = fileName;
                    }
                    else
                    {
                        problems.Add(new InputProblem(file, member.Value.Line, member.Value.Column, "$.calibrations." + member.Key,
                            Messages.WrongType("a file name (string)", member.Value.Describe())));
                    }
                }
            }
            else
            {
                problems.Add(new InputProblem(file, calibrationsNode.Line, calibrationsNode.Column, "$.calibrations",
                    Messages.WrongType("an object {rotor id: calibration file}", calibrationsNode.Describe())));
            }
        }

        top.ReportUnknownKeys();
        var ordered = problems.OrderBy(x => x.Line).ThenBy(x => x.Column).ToList();
        return new RigDocumentReadResult(doc, map, ordered);
    }

    /// <summary>Reads a rig file from disk; a missing or unreadable file is a problem, not an exception.</summary>
    public static RigDocumentReadResult ReadFile(string path)
    {
        var problems = new List<InputProblem>();
        string? text = TextFiles.TryRead(path, problems);
        return text is null ? new RigDocumentReadResult(null, RigSourceMap.Empty, problems) : Read(text, path);
    }

    private static RigTolerancesSection? ReadTolerances(JsonNode? node, string file, List<InputProblem> problems)
    {
        if (node is not JsonObjectNode obj)
        {
            JsonObjectScope.Open(node, "$.tolerances", file, problems);
            return null;
        }
        var section = new RigTolerancesSection();
        foreach (var member in obj.Members)
        {
            string path = "$.tolerances." + member.Key;
            if (!RigToleranceKeys.Keys.Contains(member.Key))
            {
                problems.Add(new InputProblem(file, member.KeyLine, member.KeyColumn, path,
                    Messages.UnknownKey(member.Key, Suggestions.Closest(member.Key, RigToleranceKeys.Keys))));
                continue;
            }
            if (JsonObjectScope.Open(member.Value, path, file, problems) is not { } e)
            {
                continue;
            }
            section.Entries[member.Key] = new RigToleranceEntry
            {
                NormalSdPct = e.Number("normal_sd_pct"),
                NormalSd = e.Number("normal_sd"),
                UniformPct = Pair(e.Take("uniform_pct"), path + ".uniform_pct", file, problems),
                Uniform = Pair(e.Take("uniform"), path + ".uniform", file, problems),
            };
            e.ReportUnknownKeys();
        }
        return section;
    }

    // [low, high]: an array of exactly two finite numbers.
    private static double[]? Pair(JsonNode? node, string path, string file, List<InputProblem> problems)
    {
        if (node is null)
        {
            return null;
        }
        if (node is JsonArrayNode { Items.Count: 2 } array
            && array.Items[0] is JsonScalarNode { Kind: JsonScalarKind.Number, Number: { } low }
            && array.Items[1] is JsonScalarNode { Kind: JsonScalarKind.Number, Number: { } high })
        {
            return [low, high];
        }
        problems.Add(new InputProblem(file, node.Line, node.Column, path, Messages.WrongType("an array of two finite numbers [low, high]", node.Describe())));
        return null;
    }

    private static void Index(JsonNode node, string path, RigSourceMap map)
    {
        map.Add(path, node.Line, node.Column);
        switch (node)
        {
            case JsonObjectNode obj:
                foreach (var m in obj.Members)
                {
                    Index(m.Value, path + "." + m.Key, map);
                }
                break;
            case JsonArrayNode arr:
                for (int i = 0; i < arr.Items.Count; i++)
                {
                    Index(arr.Items[i], $"{path}[{i}]", map);
                }
                break;
        }
    }
}
