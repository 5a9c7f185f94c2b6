#:project ../src/RotorDrive.Core/RotorDrive.Core.csproj
#:project ../src/RotorDrive.Files/RotorDrive.Files.csproj
// Regenerates the INVENTED demo bench data in catalogs/bench (hx130-load-cell.csv and hx130-spin-down.csv) from
// RotorDrive's own load model with the factors catalogs/bench/README.md states, plus seeded Gaussian noise. Run it
// after a change of the load model, then re-run `rotordrive calibrate` for hx130-calibration.csv (the README there
// names the command). Usage, from the repository root: dotnet run tools/make-demo-bench.cs
using System.Globalization;
using System.Text;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Files;
using RotorDrive.Files.Bench;

var loaded = RigLoader.Load("catalogs/demo-rig.json");
var rig = loaded.Rig ?? throw new InvalidOperationException("the demo rig does not load");
RotorDesign rotor = loaded.Catalog!.Rotors.First(r => r.Id == "hx130-p4");
double plateC = rig.PlateTemperatureC;
// The invented truth: conductivity factor 0.88, field factor 0.97, bearing drag 0.035 N m, damping 0.006 N m/krpm.
var truth = new LoadCalibration(0.88, 0.97, 0.035, 0.006 / CalibrationFile.RadPerSPerKrpm);
var load = new PhysicsRotorLoad(rotor, rig.Plate, new LoadModelOptions { Calibration = truth });
var random = new Random(20261203);
double Noise(double sd) => sd * Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
var inv = CultureInfo.InvariantCulture;

var cell = new StringBuilder("speed_rpm,gap_mm,torque_nm,lift_n,plate_temp_c\n");
foreach (double gapMm in new[] { 8.0, 10.0, 12.0 })
{
    foreach (double rpm in new[] { 250.0, 500, 750, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 4500, 5000, 5500 })
    {
        LoadPoint p = load.Evaluate(rpm * Math.PI / 30, gapMm / 1000, plateC, rig.AmbientC);
        cell.Append(inv, $"{rpm:0},{gapMm:0},{p.TotalTorqueNm + Noise(0.02):F4},{p.LiftN + Noise(2):F2},{plateC:0.#}\n");
    }
}
File.WriteAllText("catalogs/bench/hx130-load-cell.csv", cell.ToString());

// Spin-down at the design gap: J dw/dt = -T(w), classical Runge-Kutta at 1 ms, sampled every 20 ms, until it stops.
double inertia = rotor.InertiaKgM2, gap = rig.DesignGapM, w = 5000 * Math.PI / 30, dt = 0.001;
double Decel(double speed) => speed <= 0 ? 0 : -load.Evaluate(speed, gap, plateC, rig.AmbientC).TotalTorqueNm / inertia;
var spin = new StringBuilder("time_s,speed_rpm\n");
for (int step = 0; ; step++)
{
    if (step % 20 == 0)
    {
        double rpm = w * 30 / Math.PI;
        spin.Append(inv, $"{step * dt:F2},{(w > 0 ? Math.Max(rpm + Noise(3), 0) : 0):F1}\n");
        if (w <= 0)
        {
            break;
        }
    }
    double k1 = Decel(w), k2 = Decel(w + 0.5 * dt * k1), k3 = Decel(w + 0.5 * dt * k2), k4 = Decel(w + dt * k3);
    w = Math.Max(w + dt / 6 * (k1 + 2 * k2 + 2 * k3 + k4), 0);
}
File.WriteAllText("catalogs/bench/hx130-spin-down.csv", spin.ToString());
Console.WriteLine("wrote catalogs/bench/hx130-load-cell.csv and hx130-spin-down.csv (invented)");
