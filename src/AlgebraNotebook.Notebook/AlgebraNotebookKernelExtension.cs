using Microsoft.DotNet.Interactive;

namespace AlgebraNotebook.Notebook;

/// <summary>
/// The kernel extension a .NET Interactive kernel finds in this package (interactive-extensions/dotnet/): loading the
/// package registers AlgebraNotebook's text/html and text/plain formatters. Cells still need their own using
/// directives (see <see cref="AlgebraNotebookNamespaces.ToUsingDirectives"/>).
/// </summary>
public sealed class AlgebraNotebookKernelExtension : IKernelExtension
{
    /// <summary>Registers the formatters when the kernel loads the extension.</summary>
    /// <param name="kernel">The loading kernel; not modified.</param>
    /// <returns>A completed task.</returns>
    public Task OnLoadAsync(Kernel kernel)
    {
        ArgumentNullException.ThrowIfNull(kernel);
        AlgebraNotebookFormatters.Register();
        return Task.CompletedTask;
    }
}
