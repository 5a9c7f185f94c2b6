namespace RotorDrive.Core.Studies.Ranking;

/// <summary>The numbers one evaluation of a combination produces, before they become a <see cref="RankEvaluation"/>.
/// Mutable scratch, one per worker.</summary>
internal sealed class RankOutcome(int stations)
{
    public uint Reasons;
    public bool CautionNotReversible;
    public bool Trimmed;
    public bool HoverReached;
    public double MassKg;
    public double[] Speeds { get; } = new double[stations];
    public double[] Torques { get; } = new double[stations];
    public double[] EddyPowers { get; } = new double[stations];
    public double[] Currents { get; } = new double[stations];
    public double[] Duties { get; } = new double[stations];
    public int FastestStation;
    public double MaxCurrentA;
    public double MaxMotorPowerW;
    public double NeededDuty;
    public double BusVoltageV;
    public double PackCurrentA;
    public double CutoffV;
    public double RuntimeS;
    public string RuntimeLimit = "";
    public double PeakPackCurrentA;
    public double CurrentMargin;
    public double PeakTorqueRatio = double.PositiveInfinity;
    public int PeakStation = -1;
    public double PeakMotorTorqueNm;

    public void Clear()
    {
        Reasons = 0;
        CautionNotReversible = false;
        Trimmed = false;
        HoverReached = false;
        MassKg = 0;
        FastestStation = 0;
        MaxCurrentA = 0;
        MaxMotorPowerW = 0;
        NeededDuty = 0;
        BusVoltageV = 0;
        PackCurrentA = 0;
        CutoffV = 0;
        RuntimeS = 0;
        RuntimeLimit = "";
        PeakPackCurrentA = 0;
        CurrentMargin = double.NegativeInfinity;
        PeakTorqueRatio = double.PositiveInfinity;
        PeakStation = -1;
        PeakMotorTorqueNm = 0;
    }

    public void Reject(RankRejectionKind kind) => Reasons |= 1u << (int)kind;

    public bool Has(RankRejectionKind kind) => (Reasons & (1u << (int)kind)) != 0;
}
