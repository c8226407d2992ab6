using System.Runtime.InteropServices;

namespace ConsistencyHost.Engine.Plugins.Safety;

/// <summary>Owner and mode of a file or folder (symbolic links followed), read with statx(2).</summary>
/// <param name="OwnerId">The owner's user id.</param>
/// <param name="Mode">Permission bits with set-id and sticky bits (the low 12 bits of st_mode).</param>
internal readonly partial record struct UnixFileStatus(uint OwnerId, int Mode)
{
    private const int AtFdCwd = -100;
    private const uint StatxType = 0x1, StatxMode = 0x2, StatxUid = 0x8;

    /// <summary>Others may write (S_IWOTH).</summary>
    public bool WorldWritable => (Mode & 0x2) != 0;

    /// <summary>The group may write (S_IWGRP).</summary>
    public bool GroupWritable => (Mode & 0x10) != 0;

    /// <summary>Only an entry's owner may delete or rename it (S_ISVTX), as in /tmp.</summary>
    public bool Sticky => (Mode & 0x200) != 0;

    /// <summary>The mode as chmod writes it, e.g. 0755.</summary>
    public string Octal => Convert.ToString(Mode, 8).PadLeft(4, '0');

    /// <summary>The effective user id of this process (geteuid(2)).</summary>
    public static uint EffectiveUserId => Native.GetEffectiveUserId();

    /// <summary>Reads <paramref name="path"/>; null with the system's reason when it cannot be read.</summary>
    public static UnixFileStatus? Read(string path, out string? error)
    {
        // statx rather than stat: struct statx has the same layout on every Linux architecture, struct stat does not.
        if (Native.Statx(AtFdCwd, path, 0, StatxType | StatxMode | StatxUid, out var buffer) != 0)
        {
            error = Marshal.GetPInvokeErrorMessage(Marshal.GetLastPInvokeError());
            return null;
        }

        error = null;
        return new UnixFileStatus(buffer.Uid, buffer.Mode & 0xFFF);
    }

    /// <summary>The head of struct statx (linux/stat.h); the kernel writes all 256 bytes.</summary>
    [StructLayout(LayoutKind.Sequential, Size = 256)]
    private struct StatxBuffer
    {
        public uint Mask;
        public uint BlockSize;
        public ulong Attributes;
        public uint LinkCount;
        public uint Uid;
        public uint Gid;
        public ushort Mode;
    }

    private static partial class Native
    {
        [LibraryImport("libc", EntryPoint = "statx", SetLastError = true, StringMarshalling = StringMarshalling.Utf8)]
        public static partial int Statx(int directory, string path, int flags, uint mask, out StatxBuffer buffer);

        [LibraryImport("libc", EntryPoint = "geteuid")]
        public static partial uint GetEffectiveUserId();
    }
}
