namespace RotorDrive.Cli;

/// <summary>The process exit codes every subcommand uses.</summary>
public static class ExitCodes
{
    /// <summary>The command ran and every limit holds.</summary>
    public const int Ok = 0;

    /// <summary>The analysis finished but found results that break a limit.</summary>
    public const int LimitFindings = 1;

    /// <summary>Bad input: a missing or invalid file, value or option. Nothing was computed.</summary>
    public const int BadInput = 2;

    /// <summary>A failure inside RotorDrive itself (a bug): reported in one line, without a stack trace.</summary>
    public const int InternalError = 3;
}
