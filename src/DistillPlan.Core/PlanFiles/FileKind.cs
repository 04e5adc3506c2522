using System.Runtime.InteropServices;

namespace DistillPlan.Core.PlanFiles;

/// <summary>
/// Whether a path is a regular file. .NET reports FIFOs and devices as ordinary files on Unix,
/// and opening a FIFO to look blocks for ever, so this asks the C library's stat(2) for the file type.
/// </summary>
internal static partial class FileKind
{
    private const int TypeMask = 0xF000;     // S_IFMT
    private const int RegularFile = 0x8000;  // S_IFREG

    [LibraryImport("libc", EntryPoint = "stat", StringMarshalling = StringMarshalling.Utf8, SetLastError = true)]
    private static partial int Stat(string path, byte[] buffer);

    /// <summary>True for a regular file (links followed); on Windows every existing file counts.</summary>
    public static bool IsRegularFile(string path)
    {
        if (!File.Exists(path)) return false;
        if (!OperatingSystem.IsLinux()) return true;
        // struct stat: st_mode follows st_dev, st_ino (and st_nlink on x86-64) in the Linux ABIs.
        int offset = RuntimeInformation.ProcessArchitecture switch
        {
            Architecture.X64 => 24,
            Architecture.Arm64 => 16,
            _ => -1,
        };
        if (offset < 0) return true;
        var buffer = new byte[256];
        if (Stat(path, buffer) != 0) return false;
        int mode = BitConverter.ToInt32(buffer, offset);
        return (mode & TypeMask) == RegularFile;
    }
}
