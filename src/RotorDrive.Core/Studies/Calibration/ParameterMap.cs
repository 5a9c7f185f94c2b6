using MathNet.Numerics.LinearAlgebra;

namespace RotorDrive.Core.Studies.Calibration;

/// <summary>Maps the fit's internal parameters to the physical ones: the log of each factor, the bearing terms scaled by
/// the data's torque and speed, the spin-down start speed scaled by the top speed; held parameters keep their start.</summary>
internal sealed class ParameterMap
{
    private readonly double[] _start;
    private readonly double _torqueRef;
    private readonly double _speedRef;

    public ParameterMap(IReadOnlyList<int> free, double[] start, double torqueRef, double speedRef)
    {
        Free = free;
        _start = (double[])start.Clone();
        _torqueRef = torqueRef;
        _speedRef = speedRef;
    }

    /// <summary>Indices of the free physical parameters, in internal order.</summary>
    public IReadOnlyList<int> Free { get; }

    /// <summary>Reference torque the bearing drag is scaled by, N m.</summary>
    public double TorqueRef => _torqueRef;

    /// <summary>Reference speed, rad/s.</summary>
    public double SpeedRef => _speedRef;

    /// <summary>The start values of the physical parameters.</summary>
    public IReadOnlyList<double> StartPhysical => _start;

    /// <summary>The internal start vector.</summary>
    public Vector<double> Start()
        => Vector<double>.Build.Dense(Free.Count, j => Inverse(Free[j], _start[Free[j]]));

    /// <summary>The physical parameters for an internal vector.</summary>
    public double[] Physical(Vector<double> theta)
    {
        var p = (double[])_start.Clone();
        for (int j = 0; j < Free.Count; j++)
        {
            p[Free[j]] = Forward(Free[j], theta[j]);
        }
        return p;
    }

    /// <summary>One physical parameter from its internal value.</summary>
    public double Forward(int k, double theta) => k switch
    {
        0 or 1 => Math.Exp(theta),
        2 => theta * _torqueRef,
        3 => theta * _torqueRef / _speedRef,
        _ => theta * _speedRef,
    };

    /// <summary>d(physical)/d(internal) at an internal value.</summary>
    public double Slope(int k, double theta) => k switch
    {
        0 or 1 => Math.Exp(theta),
        2 => _torqueRef,
        3 => _torqueRef / _speedRef,
        _ => _speedRef,
    };

    private double Inverse(int k, double value) => k switch
    {
        0 or 1 => Math.Log(Math.Max(value, 1e-6)),
        2 => value / _torqueRef,
        3 => value * _speedRef / _torqueRef,
        _ => value / _speedRef,
    };
}
