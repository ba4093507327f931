import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One stored version of a target: the rule (or "Retired"), from when, who wrote it and why, and
// when it was written down; the version in force is marked with a word and a disc.
Rectangle {
    id: root

    required property string recordedText
    required property string effectiveText
    required property string author
    required property string ruleText
    required property string rationale
    required property bool retired
    required property bool inForce

    implicitHeight: column.implicitHeight + 2 * Theme.gap
    color: inForce ? Theme.accentSoft : "transparent"

    Rectangle {
        anchors.bottom: parent.bottom
        width: parent.width
        height: 1
        color: Theme.border
    }

    ColumnLayout {
        id: column
        anchors.left: parent.left
        anchors.right: parent.right
        anchors.verticalCenter: parent.verticalCenter
        anchors.leftMargin: Theme.gap
        anchors.rightMargin: Theme.gap
        spacing: 1

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                text: root.ruleText
                font.bold: true
                font.strikeout: root.retired
                color: root.retired ? Theme.textMuted : Theme.text
                Layout.fillWidth: true
                elide: Text.ElideRight
            }
            Row {
                visible: root.inForce
                spacing: 4
                StateMarker {
                    anchors.verticalCenter: parent.verticalCenter
                    zoneState: ZoneState.OnTarget
                    size: 11
                }
                Label {
                    text: qsTr("in force")
                    color: Theme.accent
                    font.pixelSize: Theme.fontSmall
                    font.bold: true
                }
            }
        }
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                Layout.fillWidth: true
                text: root.effectiveText + " · " + root.author
                color: Theme.text
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
            Label {
                text: qsTr("written %1").arg(root.recordedText)
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
            }
        }
        Label {
            Layout.fillWidth: true
            visible: root.rationale.length > 0
            text: "“" + root.rationale + "”"
            color: Theme.text
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
    }
}
