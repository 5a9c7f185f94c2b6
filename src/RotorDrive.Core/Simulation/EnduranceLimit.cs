namespace RotorDrive.Core.Simulation;

/// <summary>The limit that ended an endurance run.</summary>
public enum EnduranceLimit
{
    /// <summary>None: the run reached its time limit.</summary>
    TimeLimit,

    /// <summary>The pack's terminal voltage fell to its cutoff (cells x cell cutoff voltage).</summary>
    PackCutoff,

    /// <summary>The state of charge fell to 1 - the usable fraction (the usable capacity is spent).</summary>
    UsableCapacity,

    /// <summary>No trimmed hover exists any more (the rotors cannot carry the weight at the design gap below their
    /// rated speed, or the controllers cannot deliver the hover current at their max duty).</summary>
    TrimLost,

    /// <summary>A winding reached its maximum temperature.</summary>
    WindingTemperature,

    /// <summary>A motor's current exceeds its max continuous current.</summary>
    MotorCurrent,

    /// <summary>A controller's current exceeds its continuous rating.</summary>
    ControllerCurrent,

    /// <summary>The pack current exceeds its continuous C-rating.</summary>
    PackCurrent,

    /// <summary>A plate patch reached the rig's plate temperature limit.</summary>
    PlateTemperature,
}
