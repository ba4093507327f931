pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The fields of one drill: title, purpose, set-up, coaching points, minutes, intensity, players,
// area, equipment, tags, the metrics and zones it works on, its author and who saves this
// version. The text lives in the page controller's form, so nothing typed is lost when a save is
// refused; a field's problem shows right under it.
ColumnLayout {
    id: root

    required property DrillBookView view
    required property ClubSession session
    readonly property DrillForm form: view.form
    property alias titleField: titleField

    spacing: Theme.gap

    component FieldLabel: Label {
        color: Theme.textMuted
        Layout.alignment: Qt.AlignTop | Qt.AlignRight
        Layout.topMargin: 6
    }
    // A one-line field that shows the start of its text until it is edited.
    component LineField: TextField {
        onTextChanged: if (!activeFocus) cursorPosition = 0
    }

    // A field's controls with its problems (one or two form fields) right under them.
    component Field: ColumnLayout {
        id: field
        property string name
        property string otherName
        default property alias content: inner.data
        // A modest preferred width, so long wrapped texts never widen the form beyond its card.
        Layout.preferredWidth: 200
        readonly property string first: root.view.fieldErrors[name] ?? ""
        readonly property string second: otherName.length > 0 ? (root.view.fieldErrors[otherName] ?? "") : ""
        Layout.fillWidth: true
        spacing: 2
        ColumnLayout {
            id: inner
            Layout.fillWidth: true
            spacing: 2
        }
        Label {
            visible: field.first.length > 0 || field.second.length > 0
            Layout.fillWidth: true
            text: (field.first.length > 0 ? "▲ " + field.first : "")
                  + (field.first.length > 0 && field.second.length > 0 ? "\n" : "")
                  + (field.second.length > 0 ? "▲ " + field.second : "")
            color: Theme.error
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
    }

    GridLayout {
        Layout.fillWidth: true
        columns: 2
        columnSpacing: Theme.gap
        rowSpacing: Theme.gapSmall + 1

        FieldLabel { text: qsTr("Title *") }
        Field {
            name: "title"
            LineField {
                id: titleField
                objectName: "drillTitle"
                Layout.fillWidth: true
                text: root.form.title
                placeholderText: qsTr("what the drill is, in a line")
                onTextEdited: root.form.title = text
            }
        }

        FieldLabel { text: qsTr("Purpose") }
        Field {
            name: "purpose"
            LineField {
                Layout.fillWidth: true
                text: root.form.purpose
                placeholderText: qsTr("what it is for")
                onTextEdited: root.form.purpose = text
            }
        }

        FieldLabel { text: qsTr("Set-up and rules") }
        Field {
            name: "organisation"
            TextArea {
                Layout.fillWidth: true
                Layout.minimumHeight: 58
                wrapMode: TextEdit.Wrap
                text: root.form.organisation
                placeholderText: qsTr("area, teams, rules, scoring, rotations")
                onTextChanged: if (text !== root.form.organisation) root.form.organisation = text
            }
        }

        FieldLabel { text: qsTr("Coaching points") }
        Field {
            name: "coachingPoints"
            TextArea {
                Layout.fillWidth: true
                Layout.minimumHeight: 58
                wrapMode: TextEdit.Wrap
                text: root.form.coachingPoints
                placeholderText: qsTr("one a line, in order")
                onTextChanged: if (text !== root.form.coachingPoints) root.form.coachingPoints = text
            }
        }

        FieldLabel { text: qsTr("Minutes *") }
        Field {
            name: "minutes"
            otherName: "intensity"
            RowLayout {
                spacing: Theme.gap
                LineField {
                    objectName: "drillMinutes"
                    Layout.preferredWidth: 64
                    text: root.form.minutes
                    placeholderText: "1–180"
                    inputMethodHints: Qt.ImhDigitsOnly
                    onTextEdited: root.form.minutes = text
                }
                Label {
                    text: qsTr("Intensity *")
                    color: Theme.textMuted
                }
                ComboBox {
                    Layout.fillWidth: true
                    model: root.view.intensityLevels
                    textRole: "text"
                    valueRole: "value"
                    currentIndex: root.form.intensity - 1
                    onActivated: root.form.intensity = currentValue
                }
            }
        }

        FieldLabel { text: qsTr("Players *") }
        Field {
            name: "playersMin"
            otherName: "playersMax"
            RowLayout {
                spacing: Theme.gap
                LineField {
                    Layout.preferredWidth: 64
                    text: root.form.playersMin
                    placeholderText: qsTr("fewest")
                    onTextEdited: root.form.playersMin = text
                }
                Label { text: "–"; color: Theme.textMuted }
                LineField {
                    Layout.preferredWidth: 64
                    text: root.form.playersMax
                    placeholderText: qsTr("most")
                    onTextEdited: root.form.playersMax = text
                }
                Label { text: qsTr("players (1–40)"); color: Theme.textMuted }
            }
        }

        FieldLabel { text: qsTr("Area") }
        Field {
            name: "areaLength"
            otherName: "areaWidth"
            RowLayout {
                spacing: Theme.gap
                LineField {
                    Layout.preferredWidth: 64
                    text: root.form.areaLength
                    placeholderText: qsTr("length")
                    onTextEdited: root.form.areaLength = text
                }
                Label { text: "×"; color: Theme.textMuted }
                LineField {
                    Layout.preferredWidth: 64
                    text: root.form.areaWidth
                    placeholderText: qsTr("width")
                    onTextEdited: root.form.areaWidth = text
                }
                Label { text: qsTr("m (optional)"); color: Theme.textMuted }
            }
        }

        FieldLabel { text: qsTr("Equipment") }
        Field {
            name: "equipment"
            LineField {
                Layout.fillWidth: true
                text: root.form.equipment
                placeholderText: qsTr("cones, bibs, mini goals")
                onTextEdited: root.form.equipment = text
            }
        }

        FieldLabel { text: qsTr("Tags") }
        Field {
            name: "tags"
            LineField {
                Layout.fillWidth: true
                text: root.form.tags
                placeholderText: qsTr("pressing, warm_up, … (commas between)")
                onTextEdited: root.form.tags = text
            }
        }

        FieldLabel { text: qsTr("Role in a session") }
        Field {
            name: "role"
            ComboBox {
                objectName: "drillRole"
                Layout.preferredWidth: 220
                model: [qsTr("From the tags"), qsTr("Warm-up"), qsTr("Main drill"), qsTr("Cool-down")]
                currentIndex: root.form.role
                onActivated: index => root.form.role = index
            }
        }

        FieldLabel { text: qsTr("Works on") }
        Field {
            name: "metrics"
            Flow {
                Layout.fillWidth: true
                spacing: 0
                Repeater {
                    model: root.session.metrics
                    delegate: CheckBox {
                        required property string metricId
                        required property string name
                        text: name
                        font.pixelSize: Theme.fontSmall + 1
                        checked: root.form.metrics.indexOf(metricId) >= 0
                        onToggled: root.form.toggleMetric(metricId)
                    }
                }
            }
        }

        FieldLabel { text: qsTr("Zones") }
        Field {
            name: "zones"
            ColumnLayout {
                spacing: 2
                DrillZonePicker {
                    Layout.preferredWidth: 300
                    Layout.preferredHeight: 196
                    geometry: root.view.geometry
                    chosen: root.form.zones
                    onZoneToggled: (band, lane) => root.form.toggleZone(band, lane)
                }
                Label {
                    Layout.fillWidth: true
                    text: root.form.zonesText.length > 0 ? root.form.zonesText
                                                          : qsTr("Click zones to choose them; click again to drop one.")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
            }
        }

        FieldLabel { text: qsTr("Author *") }
        Field {
            name: "author"
            LineField {
                Layout.fillWidth: true
                text: root.form.author
                placeholderText: qsTr("whose drill it is")
                onTextEdited: root.form.author = text
            }
        }

        FieldLabel { text: qsTr("Saved by") }
        Field {
            name: "savedBy"
            LineField {
                objectName: "drillSavedBy"
                Layout.fillWidth: true
                text: root.form.savedBy
                placeholderText: root.view.selectedId > 0 ? qsTr("your name (needed for an edit)")
                                                           : qsTr("your name (else the author)")
                onTextEdited: root.form.savedBy = text
            }
        }

    }
}
