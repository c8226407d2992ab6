namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>Range checks on atom properties shared by the V2000 properties block and V3000 atom lines.</summary>
/// <remarks>Charges: CTfile formats (BIOVIA), M  CHG and CHG= take -15 to +15 (from memory of the CTfile
/// document). Mass numbers: no known nuclide has one above 300 (from memory of nuclide tables), and 0 or less
/// is no mass number; 999 leaves room without letting a value overflow what the SMILES writer and reader
/// exchange (found by fuzzing).</remarks>
internal static class MolfileAtomCheck
{
    /// <summary>The charge, or 0 after an error when it is out of range.</summary>
    public static int Charge(MolfileLines lines, int i, int column, int value)
    {
        if (value is >= -15 and <= 15)
        {
            return value;
        }

        lines.Error(i, column, MolfileMessages.Format(MolfileMessages.BadCharge, value));
        return 0;
    }

    /// <summary>The mass number, or 0 (natural abundance) after an error when it is out of range; 0 stays 0.</summary>
    public static int MassNumber(MolfileLines lines, int i, int column, int value)
    {
        if (value is 0 or (>= 1 and <= 999))
        {
            return value;
        }

        lines.Error(i, column, MolfileMessages.Format(MolfileMessages.BadMassNumber, value));
        return 0;
    }
}
