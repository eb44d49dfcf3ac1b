namespace DescentOps.Mission.Messages;

/// <summary>A command the ground team hands to the shared link for one lander, to go up at that lander's turn.</summary>
public sealed record UplinkBound(string Lander, Telecommand Command);
