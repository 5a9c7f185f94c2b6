namespace RotorDrive.Cli.Tests;

/// <summary>Runs the rotordrive command line in-process with captured stdout and stderr.</summary>
internal static class CliRunner
{
    public static async Task<(int ExitCode, string Output, string Error)> RunAsync(params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        int code = await CliApp.RunAsync(args, output, error).WaitAsync(TimeSpan.FromMinutes(1));
        return (code, output.ToString(), error.ToString());
    }

    /// <summary>Runs with a fixed clock (the date stamped on plots and reports) and a longer time limit.</summary>
    public static async Task<(int ExitCode, string Output, string Error)> RunAtAsync(DateTimeOffset now, TimeSpan limit, params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        int code = await CliApp.RunAsync(args, output, error, new FixedClock(now)).WaitAsync(limit);
        return (code, output.ToString(), error.ToString());
    }

    private sealed class FixedClock(DateTimeOffset now) : TimeProvider
    {
        public override DateTimeOffset GetUtcNow() => now.ToUniversalTime();

        public override TimeZoneInfo LocalTimeZone => TimeZoneInfo.Utc;
    }
}
