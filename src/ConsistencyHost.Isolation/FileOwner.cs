using System.Runtime.InteropServices;

namespace ConsistencyHost.Isolation;

/// <summary>
/// chown(2) for the worker's private folder: a worker that runs as another user must own the folder its
/// socket is created in, and nobody else may enter it. .NET has no managed API for changing owners.
/// </summary>
internal static partial class FileOwner
{
    public static void Change(string path, int userAndGroup)
    {
        if (Chown(path, userAndGroup, userAndGroup) != 0)
        {
            throw new WorkerStartException($"could not hand the worker folder '{path}' to user {userAndGroup} (errno {Marshal.GetLastPInvokeError()})");
        }
    }

    [LibraryImport("libc", EntryPoint = "chown", SetLastError = true, StringMarshalling = StringMarshalling.Utf8)]
    private static partial int Chown(string path, int owner, int group);
}
