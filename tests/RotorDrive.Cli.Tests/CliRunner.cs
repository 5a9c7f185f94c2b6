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
}
