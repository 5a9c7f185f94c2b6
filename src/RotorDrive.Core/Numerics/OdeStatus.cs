namespace RotorDrive.Core.Numerics;

/// <summary>Why an integration stopped.</summary>
public enum OdeStatus
{
    /// <summary>The end time was reached.</summary>
    Completed,

    /// <summary>An event function changed sign; the state is at the located crossing.</summary>
    EventHit,

    /// <summary>The step budget (<see cref="DormandPrince45Options.MaxSteps"/>, accepted plus rejected) ran out.</summary>
    MaxStepsExceeded,

    /// <summary>The error control asked for a step below the minimum step (stiffness or a singularity).</summary>
    StepTooSmall,

    /// <summary>The right-hand side returned NaN or infinity and smaller steps did not cure it (or a fixed step was
    /// asked for); the state is the last finite accepted one.</summary>
    NonFinite,
}
