namespace AlgebraNotebook.Kernel.Server;

/// <summary>The sockets of a Jupyter kernel that carry signed messages.</summary>
public enum KernelChannel
{
    /// <summary>Requests and replies for execution, completion, inspection (ROUTER).</summary>
    Shell,

    /// <summary>Interrupt, shutdown and kernel information, served even while a cell runs (ROUTER).</summary>
    Control,

    /// <summary>Broadcast of status, inputs, outputs and errors (PUB).</summary>
    IOPub,

    /// <summary>Input requests from the kernel to the front end (ROUTER; this kernel never asks for input).</summary>
    Stdin,
}
