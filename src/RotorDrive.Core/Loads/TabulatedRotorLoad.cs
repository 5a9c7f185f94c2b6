using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Loads;

/// <summary>The rotor load read from a table precomputed from the physics model over (sigma omega, gap), with bicubic
/// Hermite interpolation; the load analyses use.</summary>
/// <remarks>
/// <para>Why one table serves every plate temperature: the eddy forces depend on the plate conductivity sigma and the
/// speed omega only through sigma omega (../DESIGN.md §4.3), so the table stores eddy lift and torque at the rotor's
/// 20 C remanence over x = sigma omega and the gap g; a plate temperature only moves the query along x, and a magnet
/// temperature scales both by (Br(T)/Br20)^2. Torque is odd in speed and lift even, so only x &gt;= 0 is stored.</para>
/// <para>Grid and interpolation: x nodes equally spaced in ln x over the decades of <see cref="LoadTableRange"/>, gap nodes
/// equally spaced. Each node holds the value and the exact derivatives d/d ln x, d/dg and d^2/(d ln x dg) of lift and
/// torque (the plate's reflection and its derivative are computed once per speed node and radius, since the plate's
/// response does not depend on the gap; the gap enters as e^(-2 k g)), and a cell is interpolated by the tensor-product
/// cubic Hermite form, whose error falls as the fourth power of the node spacing. Lift and torque are interpolated
/// directly (not their logarithms): in ln x they behave like e^(2 ln x) and e^(ln x) at low speed and level off or decay
/// gently above the drag peak, and in g like sums of e^(-2 k g), all of which a cubic on this grid follows closely.
/// Below the first x node the exact low-speed laws are used (lift ~ x^2, torque ~ x, from the analytic expansion of the
/// layer response in eps); queries beyond the table (larger x, gaps outside) go to the direct model.</para>
/// <para>Lookups allocate nothing; the table is immutable and thread-safe.</para>
/// </remarks>
public sealed class TabulatedRotorLoad : IRotorLoad
{
    private const int Stride = 8;
    private readonly PhysicsRotorLoad _direct;
    private readonly double[][] _rows;
    private readonly int _speedPoints;
    private readonly int _gapPoints;
    private readonly double _lnXMin;
    private readonly double _invLnStep;
    private readonly double _xMin;
    private readonly double _xMax;
    private readonly double _gapMin;
    private readonly double _gapMax;
    private readonly double _invGapStep;
    private readonly double[]? _staticLift;

    internal TabulatedRotorLoad(PhysicsRotorLoad direct, LoadTableRange range)
    {
        _direct = direct;
        Range = range;
        double sigmaHigh = Math.Max(direct.ConductivityAt(range.MinPlateTempC), direct.ConductivityAt(range.MaxPlateTempC));
        _speedPoints = range.SpeedPoints;
        _gapPoints = range.GapPoints;
        _xMax = sigmaHigh * range.MaxSpeedRadPerS;
        _xMin = _xMax * Math.Pow(10.0, -range.SpeedDecades);
        _lnXMin = Math.Log(_xMin);
        double lnStep = (Math.Log(_xMax) - _lnXMin) / (_speedPoints - 1);
        _invLnStep = 1.0 / lnStep;
        _gapMin = range.MinGapM;
        _gapMax = range.MaxGapM;
        double gapStep = (_gapMax - _gapMin) / (_gapPoints - 1);
        _invGapStep = 1.0 / gapStep;
        // One array per speed node (gap nodes x 8 values): small arrays stay off the large-object heap, whose collections
        // would otherwise dominate the cost of building a table.
        _rows = new double[_speedPoints][];
        for (int i = 0; i < _speedPoints; i++)
        {
            _rows[i] = new double[_gapPoints * Stride];
        }
        if (direct.Eddy.BackIronDecay.Length > 0)
        {
            FillWithRotorIron(direct.Eddy, lnStep, gapStep);
        }
        else
        {
            Fill(direct.Eddy, lnStep, gapStep);
        }
        if (direct.Eddy.PlateBackIron)
        {
            _staticLift = StaticLift(direct.Eddy, gapStep);
        }
        (LargestLiftN, LargestTorqueNm) = Largest();
    }

    /// <summary>What the table covers.</summary>
    public LoadTableRange Range { get; }

    /// <summary>The direct physics model the table was built from (and which answers queries outside it).</summary>
    public PhysicsRotorLoad Direct => _direct;

    /// <summary>Smallest tabulated sigma omega, S rad/(m s); below it the low-speed laws apply.</summary>
    public double SigmaOmegaMin => _xMin;

    /// <summary>Largest tabulated sigma omega, S rad/(m s).</summary>
    public double SigmaOmegaMax => _xMax;

    /// <summary>Largest eddy lift on the table's nodes (20 C remanence, before any calibration field factor), N.</summary>
    public double LargestLiftN { get; }

    /// <summary>Largest eddy torque on the table's nodes (20 C remanence, before any calibration field factor), N m.</summary>
    public double LargestTorqueNm { get; }

    /// <summary>Evaluates lift, eddy torque, windage, bearing drag and eddy power at a speed, gap and temperatures.</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s (signed; negative is the reversed spin: torques flip, lift stays).</param>
    /// <param name="gapM">Air gap between magnet face and plate, m, at least 0.</param>
    /// <param name="plateTempC">Plate temperature, C.</param>
    /// <param name="magnetTempC">Magnet temperature, C.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.NonNegative(gapM, nameof(gapM));
        double sigma = _direct.ConductivityAt(plateTempC);
        double scale = _direct.ForceScale(magnetTempC);
        (double lift, double torque) = EddyAtSigmaOmega(sigma * Math.Abs(speedRadPerS), gapM);
        lift *= scale;
        torque *= scale;
        if (speedRadPerS < 0)
        {
            torque = -torque;
        }
        (double windage, double bearing) = _direct.MechanicalTorques(speedRadPerS);
        return new LoadPoint(lift, torque, windage, bearing, torque * speedRadPerS);
    }

    /// <summary>Eddy lift and torque at 20 C remanence for sigma omega &gt;= 0 and a gap: the table inside its range, the
    /// low-speed laws below it, the direct model outside.</summary>
    internal (double LiftN, double TorqueNm) EddyAtSigmaOmega(double sigmaOmega, double gapM)
    {
        // Written so that NaN also takes the direct path: the unchecked reads below rely on in-range cell indices.
        if (!Covers(sigmaOmega, gapM))
        {
            return _direct.EddyAtSigmaOmega(sigmaOmega, gapM);
        }
        if (sigmaOmega >= _xMin)
        {
            return Interpolate(Math.Log(sigmaOmega), gapM);
        }
        // Low-speed laws: Re R is even and Im R odd in eps, so lift - lift(0) ~ x^2 and torque ~ x; relative error
        // ~ (x/x_peak)^2. Lift at standstill is 0 over a plate in air and the steel's attraction over a steel-backed plate.
        (double liftMin, double torqueMin) = Interpolate(_lnXMin, gapM);
        double ratio = sigmaOmega / _xMin;
        double still = _staticLift is null ? 0.0 : StaticLiftAt(gapM);
        return (still + (liftMin - still) * ratio * ratio, torqueMin * ratio);
    }

    /// <summary>True when a query is answered from the table rather than the direct model.</summary>
    internal bool Covers(double sigmaOmega, double gapM) => gapM >= _gapMin && gapM <= _gapMax && sigmaOmega >= 0 && sigmaOmega <= _xMax;

    private (double LiftN, double TorqueNm) Interpolate(double lnX, double gapM)
    {
        double u = (lnX - _lnXMin) * _invLnStep;
        int i = (int)u;
        if (i > _speedPoints - 2)
        {
            i = _speedPoints - 2;
        }
        else if (i < 0)
        {
            i = 0;
        }
        double s = u - i;
        double v = (gapM - _gapMin) * _invGapStep;
        int l = (int)v;
        if (l > _gapPoints - 2)
        {
            l = _gapPoints - 2;
        }
        double t = v - l;

        // Cubic Hermite basis in each direction: values (h0, h1) and scaled slopes (d0, d1) at the cell's two ends.
        double s2 = s * s, s3 = s2 * s;
        double h1s = 3 * s2 - 2 * s3, h0s = 1 - h1s, d0s = s3 - 2 * s2 + s, d1s = s3 - s2;
        double t2 = t * t, t3 = t2 * t;
        double h1t = 3 * t2 - 2 * t3, h0t = 1 - h1t, d0t = t3 - 2 * t2 + t, d1t = t3 - t2;

        // Bounds were established above (0 <= i <= speed points - 2, 0 <= l <= gap points - 2), so the 4 nodes of the cell
        // are read without further checks: a = (i, l), b = (i + 1, l), c = (i, l + 1), d = (i + 1, l + 1).
        ref double a = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_rows[i]), l * Stride);
        ref double b = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_rows[i + 1]), l * Stride);
        ref double c = ref Unsafe.Add(ref a, Stride);
        ref double d = ref Unsafe.Add(ref b, Stride);
        double lift =
            h0t * (h0s * a + d0s * At(ref a, 1) + h1s * b + d1s * At(ref b, 1))
            + d0t * (h0s * At(ref a, 2) + d0s * At(ref a, 3) + h1s * At(ref b, 2) + d1s * At(ref b, 3))
            + h1t * (h0s * c + d0s * At(ref c, 1) + h1s * d + d1s * At(ref d, 1))
            + d1t * (h0s * At(ref c, 2) + d0s * At(ref c, 3) + h1s * At(ref d, 2) + d1s * At(ref d, 3));
        double torque =
            h0t * (h0s * At(ref a, 4) + d0s * At(ref a, 5) + h1s * At(ref b, 4) + d1s * At(ref b, 5))
            + d0t * (h0s * At(ref a, 6) + d0s * At(ref a, 7) + h1s * At(ref b, 6) + d1s * At(ref b, 7))
            + h1t * (h0s * At(ref c, 4) + d0s * At(ref c, 5) + h1s * At(ref d, 4) + d1s * At(ref d, 5))
            + d1t * (h0s * At(ref c, 6) + d0s * At(ref c, 7) + h1s * At(ref d, 6) + d1s * At(ref d, 7));
        return (lift, torque);
    }

    private static double At(ref double node, int offset) => Unsafe.Add(ref node, offset);

    // Node layout (8 doubles, one cache line): lift, d lift/du * hu, d lift/dg * hg, d2 lift/du dg * hu hg, then the same
    // for torque, with u = ln x; slopes are stored pre-multiplied by the cell sizes so the lookup needs no scaling.
    // Compiled optimised at its first call: its 256-bit vectors keep it out of the ahead-of-time image (compiled for the
    // baseline x64 instruction set), and without this the first table of a process (every command's) was built in the
    // JIT's unoptimised first tier until on-stack replacement swapped the loop (issue 19 item 5).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void Fill(RotorEddyModel eddy, double lnStep, double gapStep)
    {
        int radii = eddy.ModeCount;
        bool plateIron = eddy.PlateBackIron;
        ReadOnlySpan<double> k = eddy.WavenumberPerM;
        ReadOnlySpan<double> kd = eddy.ThicknessTimesWavenumber;
        ReadOnlySpan<double> epsPerX = eddy.EpsPerSigmaOmega;
        ReadOnlySpan<double> liftWeight = eddy.LiftWeightN;
        ReadOnlySpan<double> torqueWeight = eddy.TorqueWeightNm;

        // Source factors e^(-2 k g) and their gap slopes (times the gap step) per gap node, radii padded with zeros to whole
        // 4-wide vectors. The plate response does not depend on the gap, so per speed node only the radial coefficients
        // change and each table node is 8 dot products over the radii.
        int padded = (radii + 3) / 4 * 4;
        var source = new double[_gapPoints * padded];
        var sourceSlope = new double[_gapPoints * padded];
        for (int l = 0; l < _gapPoints; l++)
        {
            double g = _gapMin + l * gapStep;
            for (int j = 0; j < radii; j++)
            {
                double e = Math.Exp(-2.0 * k[j] * g);
                source[l * padded + j] = e;
                sourceSlope[l * padded + j] = -2.0 * k[j] * e * gapStep;
            }
        }

        // Per speed node: lift, lift slope, torque, torque slope coefficients, each a padded block of the radii.
        var coefficients = new double[4 * padded];
        for (int i = 0; i < _speedPoints; i++)
        {
            double x = Math.Exp(_lnXMin + i * lnStep);
            for (int j = 0; j < radii; j++)
            {
                Complex r = PlateResponse.ReflectionWithSlope(epsPerX[j] * x, kd[j], plateIron, out Complex slope);
                coefficients[j] = -liftWeight[j] * r.Real;
                coefficients[padded + j] = -liftWeight[j] * slope.Real * lnStep;
                coefficients[2 * padded + j] = -torqueWeight[j] * r.Imaginary;
                coefficients[3 * padded + j] = -torqueWeight[j] * slope.Imaginary * lnStep;
            }
            for (int l = 0; l < _gapPoints; l++)
            {
                NodeSums(padded, ref source[l * padded], ref sourceSlope[l * padded], ref coefficients[0], ref _rows[i][l * Stride]);
            }
        }
    }

    // The 8 dot products of one node, 4 radii at a time; fused multiply-adds keep the result the same on every machine.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void NodeSums(int padded, ref double source, ref double sourceSlope, ref double coefficients, ref double node)
    {
        var lift = Vector256<double>.Zero;
        var liftU = Vector256<double>.Zero;
        var liftG = Vector256<double>.Zero;
        var liftUG = Vector256<double>.Zero;
        var torque = Vector256<double>.Zero;
        var torqueU = Vector256<double>.Zero;
        var torqueG = Vector256<double>.Zero;
        var torqueUG = Vector256<double>.Zero;
        for (int j = 0; j < padded; j += 4)
        {
            var e = Vector256.LoadUnsafe(ref source, (nuint)j);
            var eg = Vector256.LoadUnsafe(ref sourceSlope, (nuint)j);
            var cl = Vector256.LoadUnsafe(ref coefficients, (nuint)j);
            var clu = Vector256.LoadUnsafe(ref coefficients, (nuint)(padded + j));
            var ct = Vector256.LoadUnsafe(ref coefficients, (nuint)(2 * padded + j));
            var ctu = Vector256.LoadUnsafe(ref coefficients, (nuint)(3 * padded + j));
            lift = Vector256.FusedMultiplyAdd(cl, e, lift);
            liftU = Vector256.FusedMultiplyAdd(clu, e, liftU);
            liftG = Vector256.FusedMultiplyAdd(cl, eg, liftG);
            liftUG = Vector256.FusedMultiplyAdd(clu, eg, liftUG);
            torque = Vector256.FusedMultiplyAdd(ct, e, torque);
            torqueU = Vector256.FusedMultiplyAdd(ctu, e, torqueU);
            torqueG = Vector256.FusedMultiplyAdd(ct, eg, torqueG);
            torqueUG = Vector256.FusedMultiplyAdd(ctu, eg, torqueUG);
        }
        Unsafe.Add(ref node, 0) = Vector256.Sum(lift);
        Unsafe.Add(ref node, 1) = Vector256.Sum(liftU);
        Unsafe.Add(ref node, 2) = Vector256.Sum(liftG);
        Unsafe.Add(ref node, 3) = Vector256.Sum(liftUG);
        Unsafe.Add(ref node, 4) = Vector256.Sum(torque);
        Unsafe.Add(ref node, 5) = Vector256.Sum(torqueU);
        Unsafe.Add(ref node, 6) = Vector256.Sum(torqueG);
        Unsafe.Add(ref node, 7) = Vector256.Sum(torqueUG);
    }

    // With a steel back disc on the rotor the gap enters also through 1/|1 - R c e|^2 (c = e^(-2 k h), e = e^(-2 k g)), so a
    // node is no longer a dot product of speed and gap factors: each node sums F = e X / Q over the modes, X = Re R or Im R,
    // Q = |1 - R c e|^2, with its exact derivatives in u = ln x (through dR/du) and g (through e).
    private void FillWithRotorIron(RotorEddyModel eddy, double lnStep, double gapStep)
    {
        int modes = eddy.ModeCount;
        bool plateIron = eddy.PlateBackIron;
        double[] k = eddy.WavenumberPerM.ToArray();
        double[] kd = eddy.ThicknessTimesWavenumber.ToArray();
        double[] epsPerX = eddy.EpsPerSigmaOmega.ToArray();
        double[] liftWeight = eddy.LiftWeightN.ToArray();
        double[] torqueWeight = eddy.TorqueWeightNm.ToArray();
        double[] decay = eddy.BackIronDecay.ToArray();
        var gapFactor = new double[_gapPoints * modes];
        for (int l = 0; l < _gapPoints; l++)
        {
            double g = _gapMin + l * gapStep;
            for (int j = 0; j < modes; j++)
            {
                gapFactor[l * modes + j] = Math.Exp(-2.0 * k[j] * g);
            }
        }
        var r = new Complex[modes];
        var dr = new Complex[modes];
        for (int i = 0; i < _speedPoints; i++)
        {
            double x = Math.Exp(_lnXMin + i * lnStep);
            for (int j = 0; j < modes; j++)
            {
                r[j] = PlateResponse.ReflectionWithSlope(epsPerX[j] * x, kd[j], plateIron, out dr[j]);
            }
            for (int l = 0; l < _gapPoints; l++)
            {
                Span<double> node = _rows[i].AsSpan(l * Stride, Stride);
                node.Clear();
                for (int j = 0; j < modes; j++)
                {
                    double e = gapFactor[l * modes + j];
                    double rho = decay[j] * e;
                    double rr = r[j].Real, ri = r[j].Imaginary, sr = dr[j].Real, si = dr[j].Imaginary;
                    double a = 1.0 - rho * rr;
                    double q = a * a + rho * rho * ri * ri;
                    double qu = -2.0 * rho * (a * sr - rho * ri * si);
                    double rhoG = -2.0 * k[j] * rho;
                    double qg = 2.0 * rhoG * (rho * (rr * rr + ri * ri) - rr);
                    double qug = -2.0 * rhoG * (a * sr - rho * ri * si) - 2.0 * rho * (-rhoG * (rr * sr + ri * si));
                    double eg = -2.0 * k[j] * e;
                    AddNode(node, 0, -liftWeight[j], e, eg, rr, sr, q, qu, qg, qug, lnStep, gapStep);
                    AddNode(node, 4, -torqueWeight[j], e, eg, ri, si, q, qu, qg, qug, lnStep, gapStep);
                }
            }
        }
    }

    // Adds w e X / Q and its scaled derivatives d/du, d/dg and d2/du dg to four node slots.
    private static void AddNode(Span<double> node, int at, double w, double e, double eg, double x, double xu, double q, double qu, double qg, double qug,
        double lnStep, double gapStep)
    {
        double inv = 1.0 / q;
        double inv2 = inv * inv;
        double fu = xu * inv - x * qu * inv2;
        node[at] += w * e * x * inv;
        node[at + 1] += w * e * fu * lnStep;
        node[at + 2] += w * (eg * x * inv - e * x * qg * inv2) * gapStep;
        double fug = -xu * qg * inv2 - x * (qug * inv2 - 2.0 * qu * qg * inv2 * inv);
        node[at + 3] += w * (eg * fu + e * fug) * lnStep * gapStep;
    }

    // Lift at standstill over a steel-backed plate (value and gap slope times the gap step per gap node).
    private double[] StaticLift(RotorEddyModel eddy, double gapStep)
    {
        var result = new double[2 * _gapPoints];
        const double h = 1e-7;
        for (int l = 0; l < _gapPoints; l++)
        {
            double g = _gapMin + l * gapStep;
            result[2 * l] = eddy.Evaluate(0.0, 0.0, g).LiftN;
            // Central difference of a smooth sum of exponentials in g; only the Hermite slope, error ~ (k h)^2.
            double up = eddy.Evaluate(0.0, 0.0, g + h).LiftN;
            double down = eddy.Evaluate(0.0, 0.0, Math.Max(0.0, g - h)).LiftN;
            result[2 * l + 1] = (up - down) / (g + h - Math.Max(0.0, g - h)) * gapStep;
        }
        return result;
    }

    private double StaticLiftAt(double gapM)
    {
        double[] s = _staticLift!;
        double v = (gapM - _gapMin) * _invGapStep;
        int l = Math.Clamp((int)v, 0, _gapPoints - 2);
        double t = v - l;
        double t2 = t * t, t3 = t2 * t;
        double h1 = 3 * t2 - 2 * t3, h0 = 1 - h1, d0 = t3 - 2 * t2 + t, d1 = t3 - t2;
        return h0 * s[2 * l] + d0 * s[2 * l + 1] + h1 * s[2 * l + 2] + d1 * s[2 * l + 3];
    }

    private (double Lift, double Torque) Largest()
    {
        double lift = 0, torque = 0;
        foreach (double[] row in _rows)
        {
            for (int n = 0; n < row.Length; n += Stride)
            {
                lift = Math.Max(lift, row[n]);
                torque = Math.Max(torque, row[n + 4]);
            }
        }
        return (lift, torque);
    }
}
