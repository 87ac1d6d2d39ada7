namespace LevelDesign.Ui.Session;

public enum BoardNodeKind
{
    Device,
    Group,
    Element,
    Coupler,
    Bias,
    Point,
}
