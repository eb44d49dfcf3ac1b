using System.Collections.Immutable;
using DescentOps.Physics.Power;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's bus as committed: the battery's state of charge, the allocation in force since the last event, the
/// loads switched off by telecommand, the energy moved so far, and whether an emptied battery is kept off the bus
/// until it has recharged (<see cref="ProbePowerSystem.ReconnectStateOfCharge"/>).
/// </summary>
public sealed record ProbeBusState(
    double StateOfCharge,
    BusAllocation Allocation,
    ImmutableSortedSet<string> SwitchedOff,
    BusEnergy Energy,
    bool BatteryLockedOut);
