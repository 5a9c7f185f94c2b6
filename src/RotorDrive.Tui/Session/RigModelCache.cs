using RotorDrive.Core.Craft;

namespace RotorDrive.Tui.Session;

/// <summary>The prepared rig (<see cref="RigModel"/>, with its load tables) of the rig being edited, built once per
/// resolved rig and shared by every sheet that needs it (hover, spin-up, endurance): switching between them after an edit
/// builds the tables once, not once per sheet.</summary>
/// <remarks>Thread-safe: sheets ask for it on their worker threads; the first caller builds, the others wait for that
/// build. A new resolved rig (every edit makes one) replaces the cached model.</remarks>
public sealed class RigModelCache
{
    private readonly object _gate = new();
    private Rig? _rig;
    private Lazy<RigModel>? _model;

    /// <summary>The model of a rig whose every station has a motor and a controller and which has a pack (check
    /// <see cref="RigModel.MissingParts"/> first).</summary>
    /// <param name="rig">The resolved rig.</param>
    public RigModel For(Rig rig)
    {
        ArgumentNullException.ThrowIfNull(rig);
        Lazy<RigModel> model;
        lock (_gate)
        {
            if (!ReferenceEquals(rig, _rig) || _model is null)
            {
                _rig = rig;
                _model = new Lazy<RigModel>(() => RigModel.Build(rig), LazyThreadSafetyMode.ExecutionAndPublication);
            }
            model = _model;
        }
        return model.Value;
    }
}
