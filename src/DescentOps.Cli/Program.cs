return await DescentOps.Cli.CliApp.RunAsync(args).ConfigureAwait(false);
