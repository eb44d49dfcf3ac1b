using DescentOps.Cli;

return await CliApp.InvokeAsync(args);
