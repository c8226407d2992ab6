namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

/// <summary>Short names of the groups as reasons print them ("α-OH", "ortho-OMe").</summary>
internal static class GroupNames
{
    private static readonly string[] Names = Build();

    /// <summary>The printed name of <paramref name="group"/>.</summary>
    public static string Of(Group group) => Names[(int)group];

    /// <summary>Labels "prefix-name" for every group, built once so that reasons never format in the hot path.</summary>
    public static string[] Prefixed(string prefix)
    {
        var labels = new string[Names.Length];
        for (var i = 0; i < Names.Length; i++)
        {
            labels[i] = prefix + "-" + Names[i];
        }

        return labels;
    }

    private static string[] Build()
    {
        var names = new string[(int)Group.Other + 1];
        names[(int)Group.Alkyl] = "C";
        names[(int)Group.Trifluoromethyl] = "CF3";
        names[(int)Group.Aryl] = "aryl";
        names[(int)Group.Vinyl] = "vinyl";
        names[(int)Group.Alkynyl] = "alkynyl";
        names[(int)Group.Formyl] = "CHO";
        names[(int)Group.Acyl] = "C(O)R";
        names[(int)Group.CarboxylicAcid] = "COOH";
        names[(int)Group.Carboxylate] = "COO⁻";
        names[(int)Group.Ester] = "COOR";
        names[(int)Group.Amide] = "C(O)N";
        names[(int)Group.AcylHalide] = "COX";
        names[(int)Group.Nitrile] = "CN";
        names[(int)Group.Imidoyl] = "C=N";
        names[(int)Group.Thioacyl] = "C=S";
        names[(int)Group.Hydroxy] = "OH";
        names[(int)Group.Alkoxide] = "O⁻";
        names[(int)Group.Alkoxy] = "OR";
        names[(int)Group.Aryloxy] = "OAr";
        names[(int)Group.Acyloxy] = "OC(O)R";
        names[(int)Group.Sulfonyloxy] = "OSO2R";
        names[(int)Group.Silyloxy] = "OSiR3";
        names[(int)Group.Amino] = "NH2";
        names[(int)Group.AlkylAmino] = "NHR";
        names[(int)Group.DialkylAmino] = "NR2";
        names[(int)Group.Ammonium] = "N⁺";
        names[(int)Group.Amido] = "NHC(O)";
        names[(int)Group.DialkylAmido] = "NRC(O)";
        names[(int)Group.Sulfonamido] = "NSO2R";
        names[(int)Group.AzoleNitrogen] = "N(aromatic)";
        names[(int)Group.IminoNitrogen] = "N=C";
        names[(int)Group.Nitro] = "NO2";
        names[(int)Group.Azido] = "N3";
        names[(int)Group.Thiol] = "SH";
        names[(int)Group.Sulfide] = "SR";
        names[(int)Group.Sulfinyl] = "S(O)R";
        names[(int)Group.Sulfonyl] = "SO2R";
        names[(int)Group.Fluoro] = "F";
        names[(int)Group.Chloro] = "Cl";
        names[(int)Group.Bromo] = "Br";
        names[(int)Group.Iodo] = "I";
        names[(int)Group.Silyl] = "SiR3";
        names[(int)Group.Phosphorus] = "P";
        names[(int)Group.Boron] = "B";
        names[(int)Group.Other] = "other";
        return names;
    }
}
