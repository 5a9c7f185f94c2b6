namespace RotorDrive.Core.Studies.Stress;

/// <summary>Evaluates stress samples: runs the analyses with a sample's drawn parts and checks every criterion.</summary>
/// <remarks>An evaluator may keep scratch state (integrator buffers, tables for a plate thickness), so it is used by one
/// thread at a time; <see cref="IStressModel.CreateEvaluator"/> makes one per worker. Its result must depend only on the
/// parts, never on the samples it evaluated before.</remarks>
public interface IStressEvaluator
{
    /// <summary>Evaluates one sample.</summary>
    /// <param name="parts">The sample's drawn parts.</param>
    /// <param name="recordTrace">True to return the spin-up trace in <see cref="StressOutcome.Trace"/>.</param>
    StressOutcome Evaluate(StressParts parts, bool recordTrace);
}
