/** Mentorship: who mentors whom in a club, members asking for a mentor, and how many mentees a mentor takes on. */
export { MentorAssignment } from './mentor-assignment.entity';
export { MentorRequest } from './mentor-request.entity';
export { assignmentRouter } from './assignment.router';
export { mentorCapacityRouter } from './mentor-capacity.router';
export { mentorRequestRouter } from './mentor-request.router';
export { currentMentorsOf } from './mentorship.queries';
