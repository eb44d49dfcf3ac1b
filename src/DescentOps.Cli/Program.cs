using DescentOps.Cli;

return await CliApp.RunAsync(args);
