using AlgebraNotebook.Kernel;

return await KernelApp.RunAsync(args, Console.Out, Console.Error);
