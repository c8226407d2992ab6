namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>What a predicted shift window was built from; the window's width follows the method's known error.</summary>
public enum ShiftBasis
{
    /// <summary>A base value plus additive substituent increments (Shoolery/Pretsch type, Grant–Paul, benzene, alkene).</summary>
    Increments = 1,

    /// <summary>A tabulated value for the whole environment (a heteroaromatic ring position, a carbonyl type).</summary>
    TabulatedEnvironment = 2,

    /// <summary>A wide window for the environment type, used where no increment system applies.</summary>
    EnvironmentFallback = 3,

    /// <summary>An exchangeable proton (O–H, N–H, S–H): wide and solvent dependent.</summary>
    Exchangeable = 4,
}
