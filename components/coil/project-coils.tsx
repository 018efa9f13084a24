/**
 * The coils of one project, shown on the project page. (Initial version: the coil workspace engineer replaces
 * it with the coil list, create-from-starting-point and the rest.)
 */
import { Text, View } from 'react-native';

export function ProjectCoils({ projectId }: { projectId: string }) {
  return (
    <View accessibilityLabel="Coils in this project" testID={`project-coils-${projectId}`}>
      <Text>No coils yet. A project holds the coils you circuit and rate.</Text>
    </View>
  );
}
