using RotorDrive.Cli;

return await CliApp.RunAsync(args);
