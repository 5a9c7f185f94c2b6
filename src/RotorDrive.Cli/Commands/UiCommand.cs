using System.CommandLine;
using RotorDrive.Tui;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive ui [RIG.json]</c>: the terminal workbench; opens the demo rig when no rig is given.</summary>
public static class UiCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var rig = new Argument<string?>("rig")
        {
            Description = "Optional: the rig file to open; without it, catalogs/demo-rig.json from the current folder or the program's repository.",
            Arity = ArgumentArity.ZeroOrOne,
        };
        var ascii = new Option<bool>("--ascii")
        {
            Description = "Draw charts and the station sketch with plain characters and no colour (for terminals without Unicode or colour; NO_COLOR=1 drops colour only).",
        };
        var command = new Command("ui", "Open the terminal workbench: edit the rig, browse the catalogs, run the analyses and see their charts.");
        command.Arguments.Add(rig);
        command.Options.Add(ascii);
        command.SetAction(parse => Run(parse.GetValue(rig), parse.InvocationConfiguration.Error, parse.GetValue(ascii)));
        return command;
    }

    /// <summary>Runs the workbench; returns 0 after a normal quit, 2 when the rig cannot be found or opened.</summary>
    public static int Run(string? rigPath, TextWriter error, bool ascii = false)
    {
        string? path = rigPath ?? Workbench.FindDemoRig(Directory.GetCurrentDirectory(), AppContext.BaseDirectory);
        if (path is null)
        {
            error.WriteLine($"rotordrive ui: no rig given and {Workbench.DemoRigRelativePath} was not found in the current folder "
                + "or the program's repository; pass a rig file: rotordrive ui RIG.json");
            return ExitCodes.BadInput;
        }
        // A rig that cannot be opened is reported before the terminal is taken over (and without one).
        if (Workbench.CheckOpens(path) is { } failure)
        {
            error.WriteLine($"rotordrive ui: cannot open the rig: {failure}");
            return ExitCodes.BadInput;
        }
        if (Console.IsInputRedirected || Console.IsOutputRedirected)
        {
            error.WriteLine("rotordrive ui: needs an interactive terminal (standard input and output must not be redirected).");
            return ExitCodes.BadInput;
        }
        return Workbench.Run(path, error, ascii);
    }
}
