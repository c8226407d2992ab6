namespace ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

/// <summary>The kind of a coupling between a hydrogen and a neighbouring nucleus; <see cref="JTable"/> gives its size.</summary>
public enum CouplingType
{
    /// <summary>2J between diastereotopic protons of an sp3 CH2.</summary>
    GeminalSp3,
    /// <summary>2J between the two protons of a =CH2.</summary>
    GeminalVinyl,
    /// <summary>3J H–C–C–H across a freely rotating sp3–sp3 (or sp2–sp3) single bond.</summary>
    VicinalFreelyRotating,
    /// <summary>3J H–C–C–H across a ring single bond (depends on the dihedral angle).</summary>
    VicinalRing,
    /// <summary>3J between an aldehyde proton and an α proton.</summary>
    VicinalAldehyde,
    /// <summary>3J H–C–X–H to an O–H or N–H, resolved only when exchange is slow (dry DMSO-d6).</summary>
    VicinalExchangeable,
    /// <summary>3J across a double bond, protons cis.</summary>
    VinylCis,
    /// <summary>3J across a double bond, protons trans.</summary>
    VinylTrans,
    /// <summary>3J across a double bond whose configuration is not drawn (or a =CH2 whose protons are not told apart).</summary>
    VinylCisOrTrans,
    /// <summary>3J across a double bond in a ring of at most seven atoms (always cis).</summary>
    VinylCisInSmallRing,
    /// <summary>3J between ortho protons of a benzene-type six-membered aromatic ring.</summary>
    AromaticOrtho,
    /// <summary>3J between ortho protons when one carbon is next to a ring nitrogen (pyridine H2–H3).</summary>
    AromaticOrthoNextToNitrogen,
    /// <summary>3J between neighbouring protons of a five-membered aromatic ring (furan, thiophene, pyrrole).</summary>
    AromaticFiveRing,
    /// <summary>4J between meta protons of a six-membered aromatic ring.</summary>
    AromaticMeta,
    /// <summary>4J H–C=C–C–H (allylic) or another long-range 4J.</summary>
    LongRange,
    /// <summary>19F two bonds away (H–C–F).</summary>
    HF2J,
    /// <summary>19F three bonds away (H–C–C–F).</summary>
    HF3J,
    /// <summary>19F four or more bonds away.</summary>
    HF4J,
    /// <summary>31P one bond away (P–H).</summary>
    HP1J,
    /// <summary>31P two bonds away.</summary>
    HP2J,
    /// <summary>31P three bonds away.</summary>
    HP3J,
    /// <summary>31P four or more bonds away.</summary>
    HP4J,
    /// <summary>A carbon bonded to fluorine (13C–19F 1J).</summary>
    CF1J,
    /// <summary>13C–19F 2J.</summary>
    CF2J,
    /// <summary>13C–19F 3J.</summary>
    CF3J,
    /// <summary>13C–19F 4J.</summary>
    CF4J,
    /// <summary>
    /// 3J between two ring CH2 groups whose two protons are each one class (a six-membered or larger ring that is
    /// not fused and inverts fast: morpholine, piperazine, cyclohexanone): the axial and equatorial values average.
    /// </summary>
    VicinalRingAveraged,
    /// <summary>19F on the neighbouring carbon of an aromatic ring (H ortho to F): 3J that is always resolved.</summary>
    HF3JAromaticOrtho,
}
