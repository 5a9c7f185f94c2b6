namespace RotorDrive.Core.Loads;

/// <summary>How a drag-peak search ended.</summary>
public enum DragPeakStatus
{
    /// <summary>An interior maximum of the eddy torque was bracketed and refined.</summary>
    Converged,

    /// <summary>The eddy torque still rises at the top of the searched speed range: the peak lies above it, and the
    /// reported point is the top speed.</summary>
    AboveSearchRange,

    /// <summary>The maximum was bracketed, but the refinement found no sign change of the slope (a flat or noisy top);
    /// the reported point is the best scanned speed.</summary>
    ScanOnly,

    /// <summary>The eddy torque is zero over the whole range (no conductivity or no field).</summary>
    NoDrag,
}
