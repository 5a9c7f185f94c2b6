using RotorDrive.Core;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Craft;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>Generates large invented catalogs of physically consistent parts for the ranking benchmark, seeded.</summary>
/// <remarks>Scaling laws (common practice, no source) calibrated on the invented demo catalog: a motor of mass m and
/// Kv has winding resistance R ~ (1/Kv^2) m^-1.5 (same copper volume wound for another Kv), no-load current ~ Kv^0.5 m,
/// current rating ~ Kv m, power rating ~ m; a controller's on-resistance falls and its mass rises with its current rating;
/// a pack's capacity, resistance, ratings and mass follow from its cells (mass 24 g per cell-Ah for lithium polymer,
/// 21 g for lithium-ion).</remarks>
public static class CatalogGenerator
{
    /// <summary>Makes motors, controllers and packs; rotors, plates and cell curves are taken from a base catalog.</summary>
    public static PartsCatalog Generate(PartsCatalog baseCatalog, int motors, int controllers, int packs, int seed)
    {
        var random = new Random(seed);
        double U(double lo, double hi) => lo + (hi - lo) * random.NextDouble();
        double LogU(double lo, double hi) => Math.Exp(U(Math.Log(lo), Math.Log(hi)));

        var motorList = new List<Motor>(motors);
        for (int i = 0; i < motors; i++)
        {
            double kv = LogU(40, 160);
            double mass = U(0.6, 1.6);
            double size = mass / 1.08;
            motorList.Add(new Motor(
                $"gm{i:D4}-kv{kv:0}",
                Units.RpmToRadPerS(kv),
                0.0214 * Math.Pow(90 / kv, 2) * Math.Pow(size, -1.5) * U(0.85, 1.15),
                1.8 * Math.Sqrt(kv / 90) * size * U(0.8, 1.2),
                20,
                94 * (kv / 90) * size * U(0.85, 1.15),
                4200 * size * U(0.85, 1.15),
                2 * random.Next(7, 15),
                mass,
                null,
                null,
                null));
        }

        int[] minCells = [3, 4, 6, 6];
        int[] maxCells = [6, 8, 12, 12, 14];
        var controllerList = new List<SpeedController>(controllers);
        for (int i = 0; i < controllers; i++)
        {
            double continuous = LogU(40, 160);
            int lo = minCells[random.Next(minCells.Length)];
            int hi = Math.Max(lo, maxCells[random.Next(maxCells.Length)]);
            controllerList.Add(new SpeedController(
                $"gc{i:D3}-{continuous:0}a",
                continuous,
                continuous * U(1.2, 1.45),
                U(3, 10),
                lo,
                hi,
                0.0013 * 120 / continuous * U(0.8, 1.2),
                U(0.05, 0.15),
                U(100000, 200000),
                0.17 * continuous / 120 * U(0.85, 1.15),
                random.NextDouble() < 0.7));
        }

        int[] series = [8, 10, 12, 12, 14];
        var packList = new List<BatteryPack>(packs);
        for (int i = 0; i < packs; i++)
        {
            bool lipo = random.NextDouble() < 0.6;
            int s = series[random.Next(series.Length)];
            int p = random.Next(1, 4);
            double cellAh = lipo ? U(5, 10) : U(3, 5);
            double c = lipo ? U(15, 45) : U(5, 10);
            packList.Add(new BatteryPack(
                $"gp{i:D3}-{s}s{p}p",
                lipo ? "lipo" : "liion",
                s,
                p,
                cellAh,
                c,
                2 * c,
                lipo ? 0.0022 * 8 / cellAh * U(0.8, 1.2) : 0.015 * 3 / cellAh * U(0.8, 1.2),
                s * p * cellAh * (lipo ? 0.024 : 0.021) * U(0.95, 1.05)));
        }
        return baseCatalog with { Motors = motorList, Controllers = controllerList, Packs = packList };
    }
}
