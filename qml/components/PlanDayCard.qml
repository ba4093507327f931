pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One day of the planner's week: its date, microcycle label and intensity cap, the fixture on
// match days and the drills of the session saved for it. Clicking chooses the day.
Rectangle {
    id: root

    required property string date
    required property string weekday
    required property string dateText
    required property string label
    required property bool congested
    required property int cap
    required property string capText
    required property bool matchDay
    required property string fixtureText
    required property string fixtureDetail
    required property bool hasSession
    required property string sessionText
    required property var drillLines
    required property bool today
    required property bool selected

    signal chosen(string date)

    color: selected ? Theme.accentSoft : Theme.surface
    radius: Theme.radius
    border.color: selected ? Theme.accent : Theme.border
    border.width: selected ? 2 : 1

    component Line: Label {
        Layout.fillWidth: true
        color: Theme.text
        font.pixelSize: Theme.fontSmall
        elide: Text.ElideRight
    }

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.gap
        spacing: 2

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gapSmall
            Label {
                Layout.fillWidth: true
                text: "<b>" + root.weekday + "</b> " + root.dateText
                textFormat: Text.StyledText
                color: Theme.text
                elide: Text.ElideRight
            }
            Label {
                visible: root.today
                text: qsTr("today")
                color: Theme.surface
                font.pixelSize: Theme.fontSmall
                font.bold: true
                leftPadding: 4
                rightPadding: 4
                background: Rectangle {
                    color: Theme.accent
                    radius: 3
                }
            }
        }
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gapSmall
            Label {
                Layout.fillWidth: true
                text: root.label.length > 0 ? root.label : "–"
                font.pixelSize: root.label.length > 8 ? Theme.fontBody : Theme.fontTitle
                font.bold: true
                color: root.matchDay ? Theme.offTarget : Theme.text
                elide: Text.ElideRight
            }
            PlanCapPips {
                cap: root.cap
            }
        }
        Line {
            visible: root.congested
            text: qsTr("≡ congested week")
            color: Theme.textMuted
        }
        Line {
            visible: root.cap >= 0
            text: qsTr("cap %1").arg(root.capText)
        }
        Line {
            visible: root.matchDay
            text: qsTr("Match %1").arg(root.fixtureText)
            font.bold: true
        }
        Line {
            visible: root.matchDay
            text: root.fixtureDetail
        }
        Rectangle {
            Layout.fillWidth: true
            Layout.preferredHeight: 1
            Layout.topMargin: 2
            Layout.bottomMargin: 2
            color: Theme.border
        }
        Line {
            text: root.hasSession ? root.sessionText : qsTr("No session saved")
            color: root.hasSession ? Theme.text : Theme.textMuted
            font.bold: root.hasSession
        }
        Repeater {
            model: root.drillLines
            delegate: Line {
                required property string modelData
                text: modelData
            }
        }
        Item { Layout.fillHeight: true }
    }

    MouseArea {
        id: area
        anchors.fill: parent
        hoverEnabled: true
        cursorShape: Qt.PointingHandCursor
        onClicked: root.chosen(root.date)
        ToolTip.visible: area.containsMouse && root.hasSession
        ToolTip.delay: 500
        ToolTip.text: root.sessionText + "\n" + root.drillLines.join("\n")
    }
}
