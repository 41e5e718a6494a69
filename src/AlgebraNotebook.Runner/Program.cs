using AlgebraNotebook.Runner;

return await RunnerApp.RunAsync(args, Console.Out, Console.Error);
