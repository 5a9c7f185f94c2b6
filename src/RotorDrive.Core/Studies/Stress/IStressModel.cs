using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>What a stress study runs on: the nominal rig (around which parts are drawn) and a source of per-thread
/// evaluators sharing immutable, thread-safe data (load tables).</summary>
public interface IStressModel
{
    /// <summary>The nominal rig.</summary>
    Rig Rig { get; }

    /// <summary>A new evaluator for one worker thread.</summary>
    IStressEvaluator CreateEvaluator();
}
