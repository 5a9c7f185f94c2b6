using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Per-thread scratch of a ranking sweep: the trim's workspace and warm start, its exact-mass cache, the
/// drivetrain of the current motor and controller, and the bus solver's buffers. Reset at the start of every chunk so
/// that results do not depend on which thread ran which chunk.</summary>
internal sealed class RankWorker
{
    public RankWorker(int stations)
    {
        TrimSpace = new HoverTrimWorkspace(stations);
        TrimSpeeds = new double[stations];
        Outcome = new RankOutcome(stations);
        Inputs = new DriveInput[stations];
        Points = new DrivePoint[stations];
    }

    public HoverTrimWorkspace TrimSpace { get; }

    /// <summary>The last trim's speeds, rad/s (the workspace keeps its own copy for the next warm start).</summary>
    public double[] TrimSpeeds { get; }

    public RankOutcome Outcome { get; }

    public DriveInput[] Inputs { get; }

    public DrivePoint[] Points { get; }

    public bool TrimCached;

    public bool TrimOk;

    public double LastDrivetrainKg;

    public double LastPacksKg;

    public int DrivetrainMotor = -1;

    public int DrivetrainController = -1;

    public Drivetrain? Drivetrain;

    public void Reset()
    {
        TrimSpace.Solved = false;
        TrimCached = false;
        DrivetrainMotor = -1;
        DrivetrainController = -1;
        Drivetrain = null;
    }
}
