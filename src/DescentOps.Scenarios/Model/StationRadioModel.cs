namespace DescentOps.Scenarios.Model;

/// <summary>The station's transmitter and the ground antenna, for the link equation; levels in dB as written.</summary>
public sealed record StationRadioModel(
    double TransmitPowerW,
    double DishDiameterM,
    double DishEfficiency,
    double GroundDishDiameterM,
    double GroundDishEfficiency,
    double FrequencyHz,
    double SystemNoiseTemperatureK,
    double LineLossDb,
    double RequiredEbN0Db,
    double MarginDb,
    long FrameBits);
