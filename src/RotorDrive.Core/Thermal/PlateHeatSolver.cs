using System.Numerics;
using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Thermal;

/// <summary>The temperature field of a plate heated by rotors that may move with their craft: the sheet equation
/// (<see cref="PlateSheet"/>) solved spectrally on a periodic square domain, exact in time for powers held constant over
/// a step and a craft moving at constant velocity.</summary>
/// <remarks>
/// <para>Fourier series on the periodic domain: each mode obeys dT_k/dt = -lambda_k T_k + q_k / (rho c d) with
/// lambda_k = alpha |k|^2 + H / (rho c d), integrated exactly over a step (exponential integration of a linear ODE with a
/// constant forcing: the variation-of-constants formula; e.g. M. Hochbruck &amp; A. Ostermann, "Exponential
/// integrators", Acta Numerica 19, 2010, section 2.1). The state is kept in the craft frame, A_k = T_k e^(i k.c), where a
/// craft moving at velocity v gives dA_k/dt = -(lambda_k - i k.v) A_k + q_k / (rho c d), still exact per step.</para>
/// <para>Sources: each rotor's rings of power uniform in angle have the transform P f_s J0(|k| r_s) e^(-i k.s) (Hankel
/// transform of a ring: I. N. Sneddon, "Fourier Transforms", 1951, ch. 2), computed analytically for every mode, so no
/// source is rasterised. The mean over a magnet annulus has the transform 2 (r_o J1(|k| r_o) - r_i J1(|k| r_i)) /
/// (|k| (r_o^2 - r_i^2)). The Nyquist modes are left out so the field stays real.</para>
/// <para>The domain must be large enough that heat does not wrap round within the run: <see cref="Create"/> sizes it as
/// the area the rotors cover plus a margin of diffusion lengths sqrt(4 alpha t) or loss lengths sqrt(k d / H), whichever is
/// shorter. Not thread-safe (one instance per run).</para>
/// </remarks>
internal sealed class PlateHeatSolver
{
    private readonly int _n;
    private readonly PlateSheet _sheet;
    private readonly double _capacity;
    private readonly double _beta;
    private readonly double _alpha;
    private readonly double[] _k;
    private readonly Complex[][] _sources;
    private readonly Complex[][] _weights;
    private readonly Complex[] _a;
    private readonly Complex[] _e;
    private readonly Complex[] _f;
    private readonly Complex[] _s;
    private readonly Complex[] _work;
    private readonly Complex[] _column;
    private readonly Fft _fft;
    private double _cacheH = double.NaN, _cacheVx, _cacheVy;

    /// <summary>Builds the solver on a given domain.</summary>
    /// <param name="sheet">The plate sheet.</param>
    /// <param name="sources">The rotors' sources (craft frame).</param>
    /// <param name="originXM">World x of the domain's first column, m.</param>
    /// <param name="originYM">World y of the domain's first row, m.</param>
    /// <param name="lengthM">Domain side, m.</param>
    /// <param name="count">Points per side, a power of two.</param>
    /// <param name="ambientC">Ambient temperature, C; the plate starts there.</param>
    public PlateHeatSolver(PlateSheet sheet, IReadOnlyList<AnnularSource> sources, double originXM, double originYM, double lengthM, int count, double ambientC)
    {
        _sheet = Preconditions.NotNull(sheet, nameof(sheet));
        Preconditions.NotNull(sources, nameof(sources));
        CheckSheet(sheet);
        _fft = new Fft(count);
        _n = count;
        OriginXM = Preconditions.Finite(originXM, nameof(originXM));
        OriginYM = Preconditions.Finite(originYM, nameof(originYM));
        LengthM = Preconditions.Positive(lengthM, nameof(lengthM));
        AmbientC = Preconditions.Finite(ambientC, nameof(ambientC));
        _capacity = sheet.HeatCapacityJPerM2K;
        _beta = sheet.LossRatePerS;
        _alpha = sheet.DiffusivityM2PerS;
        _k = Wavenumbers(count, lengthM);
        int modes = count * count;
        _a = new Complex[modes];
        _e = new Complex[modes];
        _f = new Complex[modes];
        _s = new Complex[modes];
        _work = new Complex[modes];
        _column = new Complex[count];
        _sources = new Complex[sources.Count][];
        _weights = new Complex[sources.Count][];
        var ringTables = new Dictionary<double[], double[]>(ReferenceEqualityComparer.Instance);
        for (int j = 0; j < sources.Count; j++)
        {
            var src = sources[j];
            if (!ringTables.TryGetValue(src.RingRadiiM, out var ringTable))
            {
                ringTable = RingTable(src);
                ringTables[src.RingRadiiM] = ringTable;
            }
            (_sources[j], _weights[j]) = SourceModes(src, ringTable, AnnulusMeanTable(src));
        }
    }

    private static void CheckSheet(PlateSheet sheet)
    {
        Preconditions.Positive(sheet.ThicknessM, "plate thickness");
        Preconditions.Positive(sheet.ConductivityWPerMK, "plate thermal conductivity");
        Preconditions.Positive(sheet.HeatCapacityJPerM2K, "plate heat capacity");
        Preconditions.NonNegative(sheet.LossWPerM2K, "plate face loss coefficient");
    }

    // The wavenumbers of a periodic grid of n points on a side of lengthM: 2 pi / L times 0..n/2, then -(n/2 - 1)..-1.
    private static double[] Wavenumbers(int n, double lengthM)
    {
        int half = n / 2;
        var k = new double[n];
        for (int i = 0; i < n; i++)
        {
            k[i] = 2 * Math.PI / lengthM * (i <= half ? i : i - n);
        }
        return k;
    }

    // The transform of a source's rings about its centre, sum_r f_r J0(|k| r_r), over one quadrant of |k|.
    private double[] RingTable(AnnularSource src) => Quadrant(kappa =>
    {
        double sum = 0;
        for (int r = 0; r < src.RingRadiiM.Length; r++)
        {
            sum += src.RingFractions[r] * Bessel.J0(kappa * src.RingRadiiM[r]);
        }
        return sum;
    });

    // The transform of the mean over a source's magnet annulus about its centre, over one quadrant of |k|.
    private double[] AnnulusMeanTable(AnnularSource src)
    {
        double ri = src.InnerRadiusM, ro = src.OuterRadiusM;
        return Quadrant(kappa => kappa == 0 ? 1.0 : 2 * (ro * Bessel.J1(kappa * ro) - ri * Bessel.J1(kappa * ri)) / (kappa * (ro * ro - ri * ri)));
    }

    // A source's modes on the grid: its deposit (ring transform shifted to the source's centre, e^(-i k.s)) and its
    // annulus-mean weights (the conjugate shift); the Nyquist modes stay zero.
    private (Complex[] Deposit, Complex[] Weights) SourceModes(AnnularSource src, double[] ringTable, double[] meanTable)
    {
        int n = _n, half = n / 2;
        var px = new Complex[n];
        var py = new Complex[n];
        for (int i = 0; i < n; i++)
        {
            px[i] = Complex.FromPolarCoordinates(1, -_k[i] * src.XM);
            py[i] = Complex.FromPolarCoordinates(1, -_k[i] * src.YM);
        }
        var g = new Complex[n * n];
        var w = new Complex[n * n];
        for (int iy = 0; iy < n; iy++)
        {
            if (iy == half && n > 1)
            {
                continue;
            }
            int ay = Math.Abs(iy <= half ? iy : iy - n);
            for (int ix = 0; ix < n; ix++)
            {
                if (ix == half && n > 1)
                {
                    continue;
                }
                int ax = Math.Abs(ix <= half ? ix : ix - n);
                int q = ax * (half + 1) + ay;
                Complex phase = px[ix] * py[iy];
                g[iy * n + ix] = ringTable[q] * phase;
                w[iy * n + ix] = meanTable[q] * Complex.Conjugate(phase);
            }
        }
        return (g, w);
    }

    /// <summary>Points per side.</summary>
    public int Count => _n;

    /// <summary>Domain side, m.</summary>
    public double LengthM { get; }

    /// <summary>Grid spacing, m.</summary>
    public double SpacingM => LengthM / _n;

    /// <summary>World x of the first column, m.</summary>
    public double OriginXM { get; }

    /// <summary>World y of the first row, m.</summary>
    public double OriginYM { get; }

    /// <summary>Ambient temperature, C.</summary>
    public double AmbientC { get; }

    /// <summary>The sheet.</summary>
    public PlateSheet Sheet => _sheet;

    /// <summary>World position of the craft origin, m.</summary>
    public double CraftXM { get; private set; }

    /// <summary>World position of the craft origin, m.</summary>
    public double CraftYM { get; private set; }

    /// <summary>Time advanced, s.</summary>
    public double TimeS { get; private set; }

    /// <summary>Heat deposited by the sources so far, J.</summary>
    public double DepositedJ { get; private set; }

    /// <summary>Heat lost through the faces so far, J (the exact time integral of H times the mean excess).</summary>
    public double LostJ { get; private set; }

    /// <summary>Number of sources.</summary>
    public int SourceCount => _sources.Length;

    /// <summary>Sizes a domain and builds the solver.</summary>
    /// <param name="sheet">The plate sheet.</param>
    /// <param name="sources">The rotors' sources, craft frame.</param>
    /// <param name="craftBox">The box the craft origin stays in (world): min x, max x, min y, max y, m.</param>
    /// <param name="horizonS">Longest time the run is expected to last, s.</param>
    /// <param name="marginLengths">Margin in diffusion lengths sqrt(4 alpha t) (or 2.5 x as many loss lengths, when
    /// shorter); 2 keeps the wrapped-round heat below about 0.3 % of the local rise.</param>
    /// <param name="cellM">Largest grid spacing, m, or null for a third of the narrowest magnet annulus.</param>
    /// <param name="maxCount">Largest number of points per side (power of two).</param>
    /// <param name="ambientC">Ambient temperature, C.</param>
    public static PlateHeatSolver Create(PlateSheet sheet, IReadOnlyList<AnnularSource> sources, (double MinX, double MaxX, double MinY, double MaxY) craftBox,
        double horizonS, double marginLengths, double? cellM, int maxCount, double ambientC)
    {
        Preconditions.NotNull(sources, nameof(sources));
        if (sources.Count == 0)
        {
            throw new ArgumentException("the plate heat solver needs at least one source.", nameof(sources));
        }
        Preconditions.Positive(horizonS, nameof(horizonS));
        Preconditions.Positive(marginLengths, nameof(marginLengths));
        double sx0 = sources.Min(s => s.XM - s.OuterRadiusM), sx1 = sources.Max(s => s.XM + s.OuterRadiusM);
        double sy0 = sources.Min(s => s.YM - s.OuterRadiusM), sy1 = sources.Max(s => s.YM + s.OuterRadiusM);
        double x0 = craftBox.MinX + sx0, x1 = craftBox.MaxX + sx1, y0 = craftBox.MinY + sy0, y1 = craftBox.MaxY + sy1;
        double diffusion = Math.Sqrt(4 * sheet.DiffusivityM2PerS * horizonS);
        double margin = Math.Min(marginLengths * diffusion, 2.5 * marginLengths * sheet.LossLengthM);
        double length = Math.Max(x1 - x0, y1 - y0) + margin;
        double cell = cellM ?? sources.Min(s => s.OuterRadiusM - s.InnerRadiusM) / 3;
        Preconditions.Positive(cell, nameof(cellM));
        int count = 16;
        while (count < maxCount && length / count > cell)
        {
            count *= 2;
        }
        return new PlateHeatSolver(sheet, sources, 0.5 * (x0 + x1) - 0.5 * length, 0.5 * (y0 + y1) - 0.5 * length, length, count, ambientC);
    }

    /// <summary>Places the craft origin at a world position (before the first step).</summary>
    public void PlaceCraft(double xM, double yM)
    {
        CraftXM = xM;
        CraftYM = yM;
    }

    /// <summary>Raises (or lowers) the whole plate uniformly by an excess over ambient, K (a plate that starts away from
    /// ambient).</summary>
    public void SetUniformExcess(double kelvin)
    {
        _a[0] = new Complex(Preconditions.Finite(kelvin, nameof(kelvin)) * LengthM * LengthM, 0);
    }

    /// <summary>Mean temperature over each source's magnet annulus now, C.</summary>
    /// <param name="means">One value per source, written.</param>
    public void Means(Span<double> means)
    {
        int modes = _n * _n;
        double scale = 1.0 / (LengthM * LengthM);
        for (int j = 0; j < _weights.Length; j++)
        {
            var w = _weights[j];
            double sum = 0;
            for (int i = 0; i < modes; i++)
            {
                sum += _a[i].Real * w[i].Real - _a[i].Imaginary * w[i].Imaginary;
            }
            means[j] = AmbientC + scale * sum;
        }
    }

    /// <summary>The means each annulus would have after a step, without taking it, C.</summary>
    /// <param name="powersW">Power per source over the step, W.</param>
    /// <param name="stepS">Step, s.</param>
    /// <param name="vxMPerS">Craft velocity x, m/s.</param>
    /// <param name="vyMPerS">Craft velocity y, m/s.</param>
    /// <param name="means">One value per source, written.</param>
    public void MeansAfter(ReadOnlySpan<double> powersW, double stepS, double vxMPerS, double vyMPerS, Span<double> means)
    {
        Prepare(stepS, vxMPerS, vyMPerS);
        Forcing(powersW);
        int modes = _n * _n;
        for (int i = 0; i < modes; i++)
        {
            _work[i] = _e[i] * _a[i] + _f[i] * _s[i];
        }
        double scale = 1.0 / (LengthM * LengthM);
        for (int j = 0; j < _weights.Length; j++)
        {
            var w = _weights[j];
            double sum = 0;
            for (int i = 0; i < modes; i++)
            {
                sum += _work[i].Real * w[i].Real - _work[i].Imaginary * w[i].Imaginary;
            }
            means[j] = AmbientC + scale * sum;
        }
    }

    /// <summary>Advances the field by a step with each source's power held and the craft moving at a constant
    /// velocity.</summary>
    /// <param name="powersW">Power per source, W (&gt;= 0).</param>
    /// <param name="stepS">Step, s (&gt; 0).</param>
    /// <param name="vxMPerS">Craft velocity x, m/s.</param>
    /// <param name="vyMPerS">Craft velocity y, m/s.</param>
    public void Advance(ReadOnlySpan<double> powersW, double stepS, double vxMPerS, double vyMPerS)
    {
        Preconditions.Positive(stepS, nameof(stepS));
        Prepare(stepS, vxMPerS, vyMPerS);
        double total = Forcing(powersW);
        double a0 = _a[0].Real;
        int modes = _n * _n;
        for (int i = 0; i < modes; i++)
        {
            _a[i] = _e[i] * _a[i] + _f[i] * _s[i];
        }
        // Face loss over the step: H times the exact integral of the mode-0 excess (variation of constants).
        double x = _beta * stepS;
        LostJ += _beta * _capacity * (a0 * stepS * Phi1(x) + total / _capacity * stepS * stepS * Phi2(x));
        DepositedJ += total * stepS;
        CraftXM += vxMPerS * stepS;
        CraftYM += vyMPerS * stepS;
        TimeS += stepS;
    }

    /// <summary>Heat stored in the plate above ambient now, J (rho c d times the integral of the excess).</summary>
    public double StoredJ => _capacity * _a[0].Real;

    /// <summary>The field now on the grid, world frame.</summary>
    public PlateTemperatureMap Field()
    {
        int n = _n;
        var px = new Complex[n];
        var py = new Complex[n];
        for (int i = 0; i < n; i++)
        {
            px[i] = Complex.FromPolarCoordinates(1, -_k[i] * (CraftXM - OriginXM));
            py[i] = Complex.FromPolarCoordinates(1, -_k[i] * (CraftYM - OriginYM));
        }
        for (int iy = 0; iy < n; iy++)
        {
            for (int ix = 0; ix < n; ix++)
            {
                _work[iy * n + ix] = _a[iy * n + ix] * px[ix] * py[iy];
            }
        }
        _fft.Transform2D(_work, inverse: true, _column);
        double scale = 1.0 / (LengthM * LengthM);
        var t = new double[n * n];
        for (int i = 0; i < t.Length; i++)
        {
            t[i] = AmbientC + scale * _work[i].Real;
        }
        return new PlateTemperatureMap(OriginXM, OriginYM, SpacingM, n, t, TimeS);
    }

    /// <summary>The hottest point of the field now, refined between grid points by a parabola through the hottest point and
    /// its neighbours along each axis.</summary>
    public PlateHotspot Hottest() => Refine(Field());

    /// <summary>Refines the hottest grid point of a map by a parabola along each axis (periodic neighbours).</summary>
    public static PlateHotspot Refine(PlateTemperatureMap map)
    {
        int n = map.Count;
        var coarse = map.Hottest();
        int ix = (int)Math.Round((coarse.XM - map.OriginXM) / map.SpacingM), iy = (int)Math.Round((coarse.YM - map.OriginYM) / map.SpacingM);
        double t0 = map.At(ix, iy);
        static (double Offset, double Rise) Parabola(double minus, double centre, double plus)
        {
            double curvature = minus - 2 * centre + plus;
            if (!(curvature < 0))
            {
                return (0, 0);
            }
            double offset = Math.Clamp(0.5 * (minus - plus) / curvature, -0.5, 0.5);
            return (offset, -0.125 * (minus - plus) * (minus - plus) / curvature);
        }
        var (ox, rx) = Parabola(map.At((ix + n - 1) % n, iy), t0, map.At((ix + 1) % n, iy));
        var (oy, ry) = Parabola(map.At(ix, (iy + n - 1) % n), t0, map.At(ix, (iy + 1) % n));
        return new PlateHotspot(map.XM(ix) + ox * map.SpacingM, map.YM(iy) + oy * map.SpacingM, t0 + rx + ry);
    }

    /// <summary>Temperature at one world point now, by the full Fourier sum, C (slow: for checks).</summary>
    public double PointC(double xM, double yM)
    {
        int n = _n;
        double sum = 0;
        for (int iy = 0; iy < n; iy++)
        {
            Complex py = Complex.FromPolarCoordinates(1, _k[iy] * (yM - CraftYM));
            for (int ix = 0; ix < n; ix++)
            {
                Complex px = Complex.FromPolarCoordinates(1, _k[ix] * (xM - CraftXM));
                sum += (_a[iy * n + ix] * px * py).Real;
            }
        }
        return AmbientC + sum / (LengthM * LengthM);
    }

    /// <summary>Copies the state (field, craft position, time, energy books) into a snapshot.</summary>
    public Snapshot Save(Snapshot? into = null)
    {
        into ??= new Snapshot(_a.Length);
        Array.Copy(_a, into.Spectrum, _a.Length);
        into.CraftXM = CraftXM;
        into.CraftYM = CraftYM;
        into.TimeS = TimeS;
        into.DepositedJ = DepositedJ;
        into.LostJ = LostJ;
        return into;
    }

    /// <summary>Restores a snapshot taken from this solver.</summary>
    public void Restore(Snapshot snapshot)
    {
        Array.Copy(snapshot.Spectrum, _a, _a.Length);
        CraftXM = snapshot.CraftXM;
        CraftYM = snapshot.CraftYM;
        TimeS = snapshot.TimeS;
        DepositedJ = snapshot.DepositedJ;
        LostJ = snapshot.LostJ;
    }

    /// <summary>A saved solver state.</summary>
    internal sealed class Snapshot(int modes)
    {
        public Complex[] Spectrum { get; } = new Complex[modes];

        public double CraftXM { get; set; }

        public double CraftYM { get; set; }

        public double TimeS { get; set; }

        public double DepositedJ { get; set; }

        public double LostJ { get; set; }
    }

    // Sum of the sources' transforms weighted by their powers into _s; returns the total power.
    private double Forcing(ReadOnlySpan<double> powersW)
    {
        if (powersW.Length != _sources.Length)
        {
            throw new ArgumentException($"expected {_sources.Length} powers; got {powersW.Length}.", nameof(powersW));
        }
        int modes = _n * _n;
        Array.Clear(_s);
        double total = 0;
        for (int j = 0; j < _sources.Length; j++)
        {
            double p = Preconditions.Finite(powersW[j], "source power");
            total += p;
            if (p == 0)
            {
                continue;
            }
            var g = _sources[j];
            for (int i = 0; i < modes; i++)
            {
                _s[i] += p * g[i];
            }
        }
        return total;
    }

    // The step's coefficients E = e^(-mu h), F = (1 - E) / (mu rho c d) per mode, mu = lambda - i k.v; cached.
    private void Prepare(double h, double vx, double vy)
    {
        if (h == _cacheH && vx == _cacheVx && vy == _cacheVy)
        {
            return;
        }
        int n = _n;
        var ex = new Complex[n];
        var ey = new Complex[n];
        for (int i = 0; i < n; i++)
        {
            ex[i] = Complex.FromPolarCoordinates(Math.Exp(-_alpha * _k[i] * _k[i] * h), _k[i] * vx * h);
            ey[i] = Complex.FromPolarCoordinates(Math.Exp(-_alpha * _k[i] * _k[i] * h), _k[i] * vy * h);
        }
        double decay = Math.Exp(-_beta * h);
        for (int iy = 0; iy < n; iy++)
        {
            for (int ix = 0; ix < n; ix++)
            {
                int i = iy * n + ix;
                var mu = new Complex(_alpha * (_k[ix] * _k[ix] + _k[iy] * _k[iy]) + _beta, -(_k[ix] * vx + _k[iy] * vy));
                Complex e = decay * ex[ix] * ey[iy];
                Complex z = mu * h;
                // (1 - e^(-z)) / z by its series where the subtraction would cancel.
                Complex phi = z.Magnitude < 1e-3 ? 1 - z / 2 + z * z / 6 - z * z * z / 24 : (1 - e) / z;
                _e[i] = e;
                _f[i] = phi * (h / _capacity);
            }
        }
        _cacheH = h;
        _cacheVx = vx;
        _cacheVy = vy;
    }

    // A table over |kx index|, |ky index| in 0..n/2 of a function of |k| (symmetric, computed once per pair).
    private double[] Quadrant(Func<double, double> ofKappa)
    {
        int half = _n / 2, m = half + 1;
        var table = new double[m * m];
        double dk = 2 * Math.PI / LengthM;
        for (int ax = 0; ax < m; ax++)
        {
            for (int ay = 0; ay <= ax; ay++)
            {
                double v = ofKappa(dk * Math.Sqrt((double)ax * ax + (double)ay * ay));
                table[ax * m + ay] = v;
                table[ay * m + ax] = v;
            }
        }
        return table;
    }

    // phi1(-x) = (1 - e^-x) / x and phi2(-x) = (e^-x - 1 + x) / x^2, by their series for small x.
    private static double Phi1(double x) => x < 1e-4 ? 1 - x / 2 + x * x / 6 : -double.ExpM1(-x) / x;

    private static double Phi2(double x) => x < 1e-3 ? 0.5 - x / 6 + x * x / 24 : (Math.Exp(-x) - 1 + x) / (x * x);
}
